using Microsoft.JSInterop;

namespace Winding.Web.Display;

/// <summary>
/// One of the app's small JavaScript modules in <c>wwwroot/js/</c>, imported on first use (scoped services hold one per
/// circuit). A call that cannot reach the browser (prerendering, a closed tab, storage or scripts unavailable) gives the
/// type's default instead of an exception: these modules serve conveniences, never data.
/// </summary>
public sealed class BrowserModule : IAsyncDisposable
{
    private readonly IJSRuntime _js;
    private readonly string _path;
    private IJSObjectReference? _module;

    /// <summary>Creates the module at <paramref name="path"/> (relative to the app's base address).</summary>
    public BrowserModule(IJSRuntime js, string path)
    {
        ArgumentNullException.ThrowIfNull(js);
        ArgumentException.ThrowIfNullOrWhiteSpace(path);
        _js = js;
        _path = path;
    }

    /// <summary>Calls <paramref name="function"/>; its result, or the default when the browser cannot be reached.</summary>
    public async Task<T?> InvokeAsync<T>(string function, params object?[] arguments)
    {
        try
        {
            _module ??= await _js.InvokeAsync<IJSObjectReference>("import", _path);
            return await _module.InvokeAsync<T?>(function, arguments);
        }
        catch (Exception e) when (IsUnavailable(e))
        {
            return default;
        }
    }

    /// <summary>Calls <paramref name="function"/>; nothing happens when the browser cannot be reached.</summary>
    public async Task InvokeVoidAsync(string function, params object?[] arguments)
    {
        try
        {
            _module ??= await _js.InvokeAsync<IJSObjectReference>("import", _path);
            await _module.InvokeVoidAsync(function, arguments);
        }
        catch (Exception e) when (IsUnavailable(e))
        {
            // Not reached: the convenience is skipped for this visit.
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
