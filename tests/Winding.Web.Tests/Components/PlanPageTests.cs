using Microsoft.Extensions.DependencyInjection;
using Winding.Web.Components.Pages;
using Winding.Web.Planning;

namespace Winding.Web.Tests.Components;

public sealed class PlanPageTests : WindingComponentTestBase
{
    [Fact]
    public void PlanPage_FirstRender_ShowsCoreParametersAndInductance()
    {
        var page = Render<PlanPage>();

        Assert.Equal("true", page.Find("#plan-page").GetAttribute("data-interactive"));
        Assert.Contains("H/turn²", page.Find("[data-testid=value-al]").TextContent, StringComparison.Ordinal);
        Assert.Contains("mm", page.Find("[data-testid=value-le]").TextContent, StringComparison.Ordinal);
        Assert.NotEmpty(page.Find("[data-testid=value-inductance]").TextContent);
    }

    [Fact]
    public void PlanPage_TypingTurns_UpdatesTheInductance()
    {
        var page = Render<PlanPage>();
        var state = Services.GetRequiredService<PlanningState>();
        state.SelectCore("toroid-10x5x4-nizn-850");
        page.Find("input#turns").Input("10");
        page.WaitForAssertion(() => Assert.Equal("10", state.TurnsText));
        var before = page.Find("[data-testid=value-inductance]").TextContent;

        page.Find("input#turns").Input("20");

        // AL of a 10 × 5 × 4 mm ring at μi 850 is 471.34 nH (IEC 60205; physics-sources.md §2.2): 20 turns → 188.5 µH.
        page.WaitForAssertion(() => Assert.Equal("189 µH", page.Find("[data-testid=value-inductance]").TextContent.Trim()));
        Assert.Equal("47.1 µH", before.Trim());
    }

    [Fact]
    public void PlanPage_NonsenseTurns_ShowsAFieldErrorAndNoResults()
    {
        var page = Render<PlanPage>();

        page.Find("input#turns").Input("lots");

        page.WaitForAssertion(() => Assert.Contains("'lots' is not a whole number", page.Markup, StringComparison.Ordinal));
        Assert.NotNull(page.Find("[data-testid=no-result]"));
    }

    [Fact]
    public void PlanPage_TooManyTurns_SaysTheWireDoesNotFit()
    {
        var page = Render<PlanPage>();
        Services.GetRequiredService<PlanningState>().SelectCore("toroid-10x5x4-nizn-850");

        page.Find("input#conductor-diameter").Input("1.0");
        page.Find("input#turns").Input("500");

        page.WaitForAssertion(() => Assert.NotNull(page.Find("[data-code=wire-does-not-fit]")));
        Assert.Contains("does not fit", page.Find("[data-code=wire-does-not-fit]").TextContent, StringComparison.Ordinal);
    }
}
