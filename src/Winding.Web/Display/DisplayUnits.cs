using Microsoft.AspNetCore.Components;
using Microsoft.JSInterop;

namespace Winding.Web.Display;

/// <summary>
/// The unit system of one browser tab (scoped: one per circuit). Components receive it as a cascading
/// <see cref="UnitSystem"/> (registered by <c>AddWindingViewModels</c> from <see cref="Source"/>), so a change re-renders
/// every component that shows lengths. The choice is kept per browser in localStorage through the small module
/// <c>wwwroot/js/preferences.js</c>; without it (prerendering, storage off) metric stays.
/// </summary>
public sealed class DisplayUnits : IAsyncDisposable
{
    /// <summary>The localStorage key.</summary>
    public const string StorageKey = "winding.units";

    /// <summary>The module path, relative to the app's base address.</summary>
    public const string ModulePath = "./js/preferences.js";

    private readonly IJSRuntime _js;
    private IJSObjectReference? _module;

    /// <summary>Creates the service for one circuit.</summary>
    public DisplayUnits(IJSRuntime js)
    {
        ArgumentNullException.ThrowIfNull(js);
        _js = js;
    }

    /// <summary>The current system.</summary>
    public UnitSystem System { get; private set; } = UnitSystem.Metric;

    /// <summary>The cascading value components receive.</summary>
    public CascadingValueSource<UnitSystem> Source { get; } = new(UnitSystem.Metric, isFixed: false);

    /// <summary>The stored word of a system ("metric" or "imperial").</summary>
    public static string Word(UnitSystem system) => system == UnitSystem.Imperial ? "imperial" : "metric";

    /// <summary>The system of a stored word; null for anything else.</summary>
    public static UnitSystem? Parse(string? word) => word switch
    {
        "imperial" => UnitSystem.Imperial,
        "metric" => UnitSystem.Metric,
        _ => null,
    };

    /// <summary>Reads the browser's stored choice and applies it (once the circuit is interactive).</summary>
    public async Task LoadAsync()
    {
        try
        {
            _module ??= await _js.InvokeAsync<IJSObjectReference>("import", ModulePath);
            var stored = Parse(await _module.InvokeAsync<string?>("read", StorageKey));
            if (stored is { } system && system != System)
            {
                await ApplyAsync(system);
            }
        }
        catch (Exception e) when (e is JSException or JSDisconnectedException or InvalidOperationException or TaskCanceledException)
        {
            // No storage to read (prerendering, a closed tab, storage off): the current system stays.
        }
    }

    /// <summary>Switches to <paramref name="system"/>, re-renders what shows lengths, and stores the choice.</summary>
    public async Task SetAsync(UnitSystem system)
    {
        if (system != System)
        {
            await ApplyAsync(system);
        }

        try
        {
            _module ??= await _js.InvokeAsync<IJSObjectReference>("import", ModulePath);
            await _module.InvokeVoidAsync("write", StorageKey, Word(system));
        }
        catch (Exception e) when (e is JSException or JSDisconnectedException or InvalidOperationException or TaskCanceledException)
        {
            // Not stored: the choice lasts for this visit.
        }
    }

    /// <summary>Switches between metric and imperial.</summary>
    public Task ToggleAsync() => SetAsync(System == UnitSystem.Imperial ? UnitSystem.Metric : UnitSystem.Imperial);

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

    private Task ApplyAsync(UnitSystem system)
    {
        System = system;
        return Source.NotifyChangedAsync(system);
    }
}
