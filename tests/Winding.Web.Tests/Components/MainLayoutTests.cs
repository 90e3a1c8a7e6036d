using Microsoft.AspNetCore.Components;
using Winding.Web.Components.Layout;
using Winding.Web.Components.Pages;
using Winding.Web.Display;

namespace Winding.Web.Tests.Components;

/// <summary>The layout's colour and unit switches (behaviour, no physics).</summary>
public sealed class MainLayoutTests : WindingComponentTestBase
{
    [Fact]
    public void DarkModeButton_SwitchesBothWays()
    {
        JSInterop.Setup<bool>("mudThemeProvider.getSystemDarkMode").SetResult(false);
        var layout = Render<MainLayout>(p => p.Add(l => l.Body, (RenderFragment)(b => b.AddContent(0, "content"))));

        layout.Find("button[data-testid=dark-mode]").Click();
        layout.WaitForAssertion(() => Assert.Equal("true", layout.Find("button[data-testid=dark-mode]").GetAttribute("aria-pressed")));

        layout.Find("button[data-testid=dark-mode]").Click();
        layout.WaitForAssertion(() => Assert.Equal("false", layout.Find("button[data-testid=dark-mode]").GetAttribute("aria-pressed")));
    }

    [Fact]
    public void DarkModeButton_StoresTheChoice_AndAStoredChoiceWinsOverTheSystems()
    {
        JSInterop.Setup<bool>("mudThemeProvider.getSystemDarkMode").SetResult(false);
        var module = JSInterop.SetupModule(BrowserPreferences.ModulePath);
        module.Setup<string?>("read", MainLayout.ColoursKey).SetResult("dark");
        module.SetupVoid("write", _ => true).SetVoidResult();

        var layout = Render<MainLayout>(p => p.Add(l => l.Body, (RenderFragment)(b => b.AddContent(0, "content"))));

        layout.WaitForAssertion(() => Assert.Equal("true", layout.Find("button[data-testid=dark-mode]").GetAttribute("aria-pressed")));
        layout.Find("button[data-testid=dark-mode]").Click();
        layout.WaitForAssertion(() => Assert.Equal("false", layout.Find("button[data-testid=dark-mode]").GetAttribute("aria-pressed")));
        Assert.Equal([MainLayout.ColoursKey, "light"], module.VerifyInvoke("write").Arguments);
    }

    private static RenderFragment Page<TPage>()
        where TPage : IComponent => b =>
    {
        b.OpenComponent<TPage>(0);
        b.CloseComponent();
    };

    [Fact]
    public void UnitSwitch_Click_SwitchesToInchesAndStoresTheChoice()
    {
        var module = JSInterop.SetupModule(BrowserPreferences.ModulePath);
        module.SetupVoid("write", _ => true).SetVoidResult();
        var layout = Render<MainLayout>(p => p.Add(l => l.Body, Page<PlanPage>()));
        Assert.Equal("false", layout.Find("button[data-testid=unit-system]").GetAttribute("aria-pressed"));

        layout.Find("button[data-testid=unit-system]").Click();

        layout.WaitForAssertion(() => Assert.Equal("true", layout.Find("button[data-testid=unit-system]").GetAttribute("aria-pressed")));
        layout.WaitForAssertion(() => Assert.Contains("Conductor (in)", layout.Markup, StringComparison.Ordinal));
        Assert.Equal([DisplayUnits.StorageKey, "imperial"], module.VerifyInvoke("write").Arguments);
    }

    [Fact]
    public void UnitSwitch_StoredChoice_IsRestoredWhenTheAppOpens()
    {
        var module = JSInterop.SetupModule(BrowserPreferences.ModulePath);
        module.Setup<string?>("read", DisplayUnits.StorageKey).SetResult("imperial");

        var layout = Render<MainLayout>(p => p.Add(l => l.Body, Page<PlanPage>()));

        layout.WaitForAssertion(() => Assert.Equal("true", layout.Find("button[data-testid=unit-system]").GetAttribute("aria-pressed")));
        layout.WaitForAssertion(() => Assert.Contains("Conductor (in)", layout.Markup, StringComparison.Ordinal));
    }

    [Fact]
    public async Task UnitSwitch_Choice_SurvivesNavigationToAnotherPage()
    {
        JSInterop.SetupModule(BrowserPreferences.ModulePath).SetupVoid("write", _ => true).SetVoidResult();
        var plan = Render<MainLayout>(p => p.Add(l => l.Body, Page<PlanPage>()));
        plan.Find("button[data-testid=unit-system]").Click();
        plan.WaitForAssertion(() => Assert.Equal("true", plan.Find("button[data-testid=unit-system]").GetAttribute("aria-pressed")));

        // Another page in the same circuit (the same scoped service), as after following a link.
        await DisposeComponentsAsync();
        var catalogue = Render<MainLayout>(p => p.Add(l => l.Body, Page<CataloguePage>()));

        Assert.Equal("true", catalogue.Find("button[data-testid=unit-system]").GetAttribute("aria-pressed"));
        Assert.Contains("Size (in)", catalogue.Markup, StringComparison.Ordinal);
        Assert.Contains("Window (in²)", catalogue.Markup, StringComparison.Ordinal);
    }
}
