using Microsoft.AspNetCore.Components;

namespace Winding.Web.Display;

/// <summary>
/// The unit system of one browser tab (scoped: one per circuit). Components receive it as a cascading
/// <see cref="UnitSystem"/> (registered by <c>AddWindingViewModels</c> from <see cref="Source"/>), so a change re-renders
/// every component that shows lengths. The choice is kept per browser (<see cref="BrowserPreferences"/>); without
/// storage (prerendering, storage off) metric stays.
/// </summary>
public sealed class DisplayUnits
{
    /// <summary>The localStorage key.</summary>
    public const string StorageKey = "winding.units";

    private readonly BrowserPreferences _preferences;

    /// <summary>Creates the service for one circuit.</summary>
    public DisplayUnits(BrowserPreferences preferences)
    {
        ArgumentNullException.ThrowIfNull(preferences);
        _preferences = preferences;
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
        if (Parse(await _preferences.ReadAsync(StorageKey)) is { } system && system != System)
        {
            await ApplyAsync(system);
        }
    }

    /// <summary>Switches to <paramref name="system"/>, re-renders what shows lengths, and stores the choice.</summary>
    public async Task SetAsync(UnitSystem system)
    {
        if (system != System)
        {
            await ApplyAsync(system);
        }

        await _preferences.WriteAsync(StorageKey, Word(system));
    }

    /// <summary>Switches between metric and imperial.</summary>
    public Task ToggleAsync() => SetAsync(System == UnitSystem.Imperial ? UnitSystem.Metric : UnitSystem.Imperial);

    private Task ApplyAsync(UnitSystem system)
    {
        System = system;
        return Source.NotifyChangedAsync(system);
    }
}
