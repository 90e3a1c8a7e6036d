using Microsoft.Extensions.DependencyInjection;
using Winding.Web.Display;

namespace Winding.Web.Tests.Display;

/// <summary>The unit system service: per-browser storage through the JS module (behaviour, no physics).</summary>
public sealed class DisplayUnitsTests : WindingComponentTestBase
{
    private DisplayUnits Units => Services.GetRequiredService<DisplayUnits>();

    [Fact]
    public async Task LoadAsync_StoredImperial_SwitchesToImperial()
    {
        var module = JSInterop.SetupModule(BrowserPreferences.ModulePath);
        module.Setup<string?>("read", DisplayUnits.StorageKey).SetResult("imperial");

        await Units.LoadAsync();

        Assert.Equal(UnitSystem.Imperial, Units.System);
    }

    [Theory]
    [InlineData(null)]
    [InlineData("furlongs")]
    public async Task LoadAsync_NothingUsableStored_StaysMetric(string? stored)
    {
        var module = JSInterop.SetupModule(BrowserPreferences.ModulePath);
        module.Setup<string?>("read", DisplayUnits.StorageKey).SetResult(stored);

        await Units.LoadAsync();

        Assert.Equal(UnitSystem.Metric, Units.System);
    }

    [Fact]
    public async Task LoadAsync_StorageFails_StaysMetric()
    {
        var module = JSInterop.SetupModule(BrowserPreferences.ModulePath);
        module.Setup<string?>("read", DisplayUnits.StorageKey).SetException(new Microsoft.JSInterop.JSException("storage is off"));

        await Units.LoadAsync();

        Assert.Equal(UnitSystem.Metric, Units.System);
    }

    [Fact]
    public async Task ToggleAsync_SwitchesAndWritesTheChoice()
    {
        var module = JSInterop.SetupModule(BrowserPreferences.ModulePath);
        module.SetupVoid("write", _ => true).SetVoidResult();

        await Units.ToggleAsync();

        Assert.Equal(UnitSystem.Imperial, Units.System);
        var write = module.VerifyInvoke("write");
        Assert.Equal([DisplayUnits.StorageKey, "imperial"], write.Arguments);
        await Units.ToggleAsync();
        Assert.Equal(UnitSystem.Metric, Units.System);
    }
}
