using Microsoft.JSInterop;

namespace Winding.Web.Display;

/// <summary>
/// Per-browser preferences (unit system, colours) kept in localStorage through the small module
/// <c>wwwroot/js/preferences.js</c>. Scoped: one per circuit. Without storage (prerendering, a closed tab, a private
/// window, storage switched off) reads give null and writes are dropped, so a choice then lasts for the visit only.
/// </summary>
public sealed class BrowserPreferences : IAsyncDisposable
{
    /// <summary>The module path, relative to the app's base address.</summary>
    public const string ModulePath = "./js/preferences.js";

    private readonly IJSRuntime _js;
    private IJSObjectReference? _module;

    /// <summary>Creates the store for one circuit.</summary>
    public BrowserPreferences(IJSRuntime js)
    {
        ArgumentNullException.ThrowIfNull(js);
        _js = js;
    }

    /// <summary>The stored text of <paramref name="key"/>, or null when there is none or no storage to read.</summary>
    public async Task<string?> ReadAsync(string key)
    {
        try
        {
            _module ??= await _js.InvokeAsync<IJSObjectReference>("import", ModulePath);
            return await _module.InvokeAsync<string?>("read", key);
        }
        catch (Exception e) when (IsUnavailable(e))
        {
            return null;
        }
    }

    /// <summary>Stores <paramref name="value"/> under <paramref name="key"/>; without storage nothing happens.</summary>
    public async Task WriteAsync(string key, string value)
    {
        try
        {
            _module ??= await _js.InvokeAsync<IJSObjectReference>("import", ModulePath);
            await _module.InvokeVoidAsync("write", key, value);
        }
        catch (Exception e) when (IsUnavailable(e))
        {
            // Not stored: the choice lasts for this visit.
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

    private static bool IsUnavailable(Exception e) =>
        e is JSException or JSDisconnectedException or InvalidOperationException or TaskCanceledException;
}
