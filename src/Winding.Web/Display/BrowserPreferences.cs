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

    private readonly BrowserModule _module;

    /// <summary>Creates the store for one circuit.</summary>
    public BrowserPreferences(IJSRuntime js) => _module = new BrowserModule(js, ModulePath);

    /// <summary>The stored text of <paramref name="key"/>, or null when there is none or no storage to read.</summary>
    public Task<string?> ReadAsync(string key) => _module.InvokeAsync<string?>("read", key);

    /// <summary>Stores <paramref name="value"/> under <paramref name="key"/>; without storage nothing happens.</summary>
    public Task WriteAsync(string key, string value) => _module.InvokeVoidAsync("write", key, value);

    /// <inheritdoc />
    public ValueTask DisposeAsync() => _module.DisposeAsync();
}
