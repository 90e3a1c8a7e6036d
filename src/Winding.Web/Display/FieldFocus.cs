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

    private readonly BrowserModule _module;

    /// <summary>Creates the service for one circuit.</summary>
    public FieldFocus(IJSRuntime js) => _module = new BrowserModule(js, ModulePath);

    /// <summary>Focuses the first of <paramref name="ids"/> that is on the page; returns its id, or null when none is.</summary>
    public Task<string?> FocusFirstAsync(IReadOnlyList<string> ids)
    {
        ArgumentNullException.ThrowIfNull(ids);
        return ids.Count == 0 ? Task.FromResult<string?>(null) : _module.InvokeAsync<string?>("focusFirst", ids);
    }

    /// <inheritdoc />
    public ValueTask DisposeAsync() => _module.DisposeAsync();
}
