using Microsoft.JSInterop;

namespace Winding.Web.Display;

/// <summary>
/// Moves the keyboard focus to a form field by element id (scoped: one per circuit), through the small module
/// <c>wwwroot/js/focus.js</c>. Used by the warnings list to take the user to the field a warning is about.
/// </summary>
public sealed class FieldFocus : IAsyncDisposable
{
    /// <summary>The module path, relative to the app's base address.</summary>
    public const string ModulePath = "./js/focus.js";

    private readonly IJSRuntime _js;
    private IJSObjectReference? _module;

    /// <summary>Creates the service for one circuit.</summary>
    public FieldFocus(IJSRuntime js)
    {
        ArgumentNullException.ThrowIfNull(js);
        _js = js;
    }

    /// <summary>Focuses the first of <paramref name="ids"/> that is on the page; returns its id, or null when none is.</summary>
    public async Task<string?> FocusFirstAsync(IReadOnlyList<string> ids)
    {
        ArgumentNullException.ThrowIfNull(ids);
        if (ids.Count == 0)
        {
            return null;
        }

        try
        {
            _module ??= await _js.InvokeAsync<IJSObjectReference>("import", ModulePath);
            return await _module.InvokeAsync<string?>("focusFirst", ids);
        }
        catch (Exception e) when (e is JSException or JSDisconnectedException or InvalidOperationException or TaskCanceledException)
        {
            return null;
        }
    }

    /// <inheritdoc />
    public async ValueTask DisposeAsync()
    {
        if (_module is not null)
        {
            try
            {
                await _module.DisposeAsync();
            }
            catch (JSDisconnectedException)
            {
                // The circuit is gone; so is the module.
            }
        }
    }
}
