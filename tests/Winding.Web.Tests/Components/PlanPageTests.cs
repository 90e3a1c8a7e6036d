using Microsoft.Extensions.DependencyInjection;
using Winding.Web.Components.Pages;
using Winding.Web.Planning;

namespace Winding.Web.Tests.Components;

public sealed class PlanPageTests : WindingComponentTestBase
{
    [Fact]
    public void PlanPage_FirstRender_ShowsCoreWindingsBandAndOperatingPoint()
    {
        var page = Render<PlanPage>();

        Assert.Equal("true", page.Find("#plan-page").GetAttribute("data-interactive"));
        Assert.Contains("H/turn²", page.Find("[data-testid=value-al]").TextContent, StringComparison.Ordinal);
        Assert.Contains("mm", page.Find("[data-testid=value-le]").TextContent, StringComparison.Ordinal);
        Assert.NotEmpty(page.Find("[data-testid=value-w0-inductance]").TextContent);
        Assert.NotEmpty(page.Find("[data-testid=value-w1-rac]").TextContent);
        Assert.Contains("mT", page.Find("[data-testid=value-flux]").TextContent, StringComparison.Ordinal);
        Assert.Contains("K", page.Find("[data-testid=value-temperature]").TextContent, StringComparison.Ordinal);
        Assert.NotEmpty(page.Find("[data-testid=value-magnetizing]").TextContent);
        Assert.EndsWith("H", page.Find("[data-testid=value-leakage]").TextContent.Trim(), StringComparison.Ordinal);
        Assert.EndsWith("F", page.Find("[data-testid=value-interwinding]").TextContent.Trim(), StringComparison.Ordinal);
        Assert.Contains("resonates at", page.Find("[data-testid=value-w0-self-capacitance]").TextContent, StringComparison.Ordinal);
        Assert.Contains("Hz", page.Find("[data-testid=value-band-3db]").TextContent, StringComparison.Ordinal);
        Assert.Contains("LLK", page.Find("[data-testid=value-circuit]").TextContent, StringComparison.Ordinal);
    }

    [Fact]
    public void PlanPage_BenchSheetButton_LeadsToTheSheetOfThePlanOnTheForm()
    {
        var page = Render<PlanPage>();

        Assert.Equal("sheet", page.Find("[data-testid=bench-sheet-link]").GetAttribute("href"));
    }

    [Fact]
    public void PlanPage_TypingTurns_UpdatesTheInductance()
    {
        var page = Render<PlanPage>();
        var state = Services.GetRequiredService<PlanningState>();
        state.SelectCore("toroid-10x5x4-nizn-850");
        page.Find("input#windings-0-turns").Input("10");
        // AL of a 10 × 5 × 4 mm ring at μi 850 is 471.34 nH (IEC 60205; physics-sources.md §2.2): 10 turns → 47.13 µH.
        page.WaitForAssertion(() => Assert.Equal("47.1 µH", page.Find("[data-testid=value-w0-inductance]").TextContent.Trim()));

        page.Find("input#windings-0-turns").Input("20");

        // 20 turns → 188.5 µH.
        page.WaitForAssertion(() => Assert.Equal("189 µH", page.Find("[data-testid=value-w0-inductance]").TextContent.Trim()));
    }

    [Fact]
    public void PlanPage_NonsenseTurns_ShowsAFieldErrorAndNoResults()
    {
        var page = Render<PlanPage>();

        page.Find("input#windings-0-turns").Input("lots");

        page.WaitForAssertion(() => Assert.Contains("Turns: 'lots' is not a number", page.Markup, StringComparison.Ordinal));
        Assert.NotNull(page.Find("[data-testid=no-result]"));
    }

    [Fact]
    public void PlanPage_TooManyTurns_SaysTheWireDoesNotFit()
    {
        var page = Render<PlanPage>();
        Services.GetRequiredService<PlanningState>().SelectCore("toroid-10x5x4-nizn-850");

        page.Find("input#windings-0-conductor").Input("1.0");
        page.Find("input#windings-0-turns").Input("500");

        page.WaitForAssertion(() => Assert.NotNull(page.Find("[data-code=wire-does-not-fit]")));
        Assert.Contains("does not fit", page.Find("[data-code=wire-does-not-fit]").TextContent, StringComparison.Ordinal);
    }

    [Fact]
    public void PlanPage_AddAndRemoveWinding_ChangesTheResults()
    {
        var page = Render<PlanPage>();

        page.Find("[data-testid=add-winding] button, button[data-testid=add-winding]").Click();

        page.WaitForAssertion(() => Assert.NotNull(page.Find("[data-testid=value-w2-inductance]")));
        page.Find("button[data-testid=windings-2-remove]").Click();
        page.WaitForAssertion(() => Assert.Empty(page.FindAll("[data-testid=value-w2-inductance]")));
    }

    [Fact]
    public void PlanPage_SuggestWire_ListsChoicesAndUsingOneSetsTheWire()
    {
        var page = Render<PlanPage>();
        var state = Services.GetRequiredService<PlanningState>();

        page.Find("button[data-testid=windings-0-suggest]").Click();

        page.WaitForAssertion(() => Assert.NotNull(page.Find("[data-testid=windings-0-suggestions]")));
        page.Find("[data-testid=windings-0-suggestions] button").Click();
        page.WaitForAssertion(() => Assert.NotNull(state.Windings[0].StandardId));
        Assert.NotNull(state.Result);
    }

    [Fact]
    public void PlanPage_ComparedVariant_ShowsBothColumnsInTheVariantTable()
    {
        var page = Render<PlanPage>();
        var state = Services.GetRequiredService<PlanningState>();
        state.SelectCore("toroid-10x5x4-nizn-850");
        state.EditWinding(0, w => w.Turns = "10");
        state.PlanName = "Ten turns";
        state.Save();
        var first = state.SavedId!;
        state.EditWinding(0, w => w.Turns = "20");
        state.SaveAsVariant();

        state.SetCompare([first]);

        page.WaitForAssertion(() => Assert.NotNull(page.Find("[data-testid=variant-table]")));
        var table = page.Find("[data-testid=variant-table]").TextContent;
        Assert.Contains("Ten turns (variant)", table, StringComparison.Ordinal);
        // AL 471.34 nH (IEC 60205 ring constants, as above): 20 turns → 189 µH beside 10 turns → 47.1 µH.
        Assert.Contains("189 µH", table, StringComparison.Ordinal);
        Assert.Contains("47.1 µH", table, StringComparison.Ordinal);
    }

    [Fact]
    public void PlanPage_TurnsForBand_ButtonSetsTheTurns()
    {
        var page = Render<PlanPage>();
        var state = Services.GetRequiredService<PlanningState>();
        state.SelectCore("toroid-10x5x4-nizn-850");
        state.EditWinding(0, w => w.Turns = "1");
        state.EditWinding(1, w => w.Turns = "1");

        page.WaitForAssertion(() => Assert.NotNull(page.Find("[data-testid=turns-for-band]")));
        var expected = state.TurnsForBand![0];
        page.Find("[data-testid=use-turns-for-band] button, button[data-testid=use-turns-for-band]").Click();

        page.WaitForAssertion(() => Assert.Empty(page.FindAll("[data-testid=turns-for-band]")));
        Assert.Equal(expected.ToString(System.Globalization.CultureInfo.InvariantCulture), state.Windings[0].Turns);
        Assert.Equal(state.Windings[0].Turns, state.Windings[1].Turns);
    }

    [Fact]
    public void PlanPage_MoveDown_ReordersTheWindings()
    {
        var page = Render<PlanPage>();
        var state = Services.GetRequiredService<PlanningState>();
        var first = state.Windings[0].Name;

        page.Find("button[data-testid=windings-0-down]").Click();

        page.WaitForAssertion(() => Assert.Equal(first, state.Windings[1].Name));
    }
}

