using System.Globalization;
using System.Text.Json;
using CsCheck;
using Microsoft.Extensions.DependencyInjection;
using Winding.Catalogue.Loading;
using Winding.Web.Components.Pages;
using Winding.Web.Display;
using Winding.Web.Planning;

namespace Winding.Web.Tests.Components;

/// <summary>
/// The plan page in either unit system: labels and values in the windings editor, the result tables and the drawing's
/// scale bar follow the switch; the plan document stays in millimetres (presentation; figures are checked for
/// consistency with the metric page, converted with 1 in = 25.4 mm exactly).
/// </summary>
public sealed class PlanPageUnitsTests : WindingComponentTestBase
{
    private PlanningState State => Services.GetRequiredService<PlanningState>();

    private Task SwitchTo(UnitSystem system) => Services.GetRequiredService<DisplayUnits>().SetAsync(system);

    private static double Leading(string text) =>
        double.Parse(text.Trim().Split(' ')[0], NumberStyles.Float, CultureInfo.InvariantCulture);

    private string Document() => JsonSerializer.Serialize(State.ToDocument(), CatalogueJson.Options);

    [Fact]
    public async Task PlanPage_SwitchToImperial_RelabelsTheWindingsEditor()
    {
        var page = Render<PlanPage>();
        Assert.Equal("Conductor (mm)", page.Find("label[for=windings-0-conductor]").TextContent.Trim());
        Assert.Equal("0.5", page.Find("input#windings-0-conductor").GetAttribute("value"));

        await SwitchTo(UnitSystem.Imperial);

        page.WaitForAssertion(() => Assert.Equal("Conductor (in)", page.Find("label[for=windings-0-conductor]").TextContent.Trim()));
        Assert.Equal("Overall (in)", page.Find("label[for=windings-0-overall]").TextContent.Trim());
        // 0.5 mm = 0.0196850… in, shown to six significant digits.
        Assert.Equal("0.019685", page.Find("input#windings-0-conductor").GetAttribute("value"));
    }

    [Fact]
    public async Task PlanPage_SwitchToImperial_FitReasonsAndWarningsGiveNoMillimetres()
    {
        State.Load(DemoPlans.Find("club-end-fed-unun")!.Document);
        var page = Render<PlanPage>();
        Assert.Contains(" mm hole left", page.Find("[data-testid=value-w0-fits]").TextContent, StringComparison.Ordinal);

        await SwitchTo(UnitSystem.Imperial);

        page.WaitForAssertion(() => Assert.Contains(" in hole left", page.Find("[data-testid=value-w0-fits]").TextContent, StringComparison.Ordinal));
        Assert.DoesNotContain(" mm", page.Find("[data-testid=warnings]").TextContent, StringComparison.Ordinal);
        Assert.Contains(" in)", page.Find("[data-testid=warnings]").TextContent, StringComparison.Ordinal);
    }

    [Fact]
    public async Task PlanPage_SwitchToImperial_ShowsResultsInInches()
    {
        var page = Render<PlanPage>();
        var le = Leading(page.Find("[data-testid=value-le]").TextContent);
        var window = Leading(page.Find("[data-testid=value-window]").TextContent);
        var mlt = Leading(page.Find("[data-testid=value-w0-mlt]").TextContent);
        var inductance = page.Find("[data-testid=value-w0-inductance]").TextContent;

        await SwitchTo(UnitSystem.Imperial);

        page.WaitForAssertion(() => Assert.EndsWith(" in", page.Find("[data-testid=value-le]").TextContent.Trim(), StringComparison.Ordinal));
        Assert.Equal(le / 25.4, Leading(page.Find("[data-testid=value-le]").TextContent), 0.0005 + (0.005 / 25.4));
        Assert.EndsWith(" in²", page.Find("[data-testid=value-window]").TextContent.Trim(), StringComparison.Ordinal);
        Assert.Equal(window / 645.16, Leading(page.Find("[data-testid=value-window]").TextContent), 0.005 * window / 645.16);
        Assert.Equal(mlt / 25.4, Leading(page.Find("[data-testid=value-w0-mlt]").TextContent), 0.0005 + (0.05 / 25.4));
        Assert.Contains(" in", page.Find("[data-testid=value-w0-wire-length]").TextContent, StringComparison.Ordinal);
        Assert.Contains("0.0197 in over", page.Find("[data-testid=value-w0-wire]").TextContent, StringComparison.Ordinal);
        Assert.Contains("cmil/A", page.Find("[data-testid=value-w0-density]").TextContent, StringComparison.Ordinal);
        // Electrical figures stay SI.
        Assert.Equal(inductance, page.Find("[data-testid=value-w0-inductance]").TextContent);
    }

    [Fact]
    public async Task PlanPage_SwitchToImperial_ScaleBarIsInInches()
    {
        var page = Render<PlanPage>();
        Assert.EndsWith(" mm", page.Find("[data-testid=cross-section-scale] text").TextContent.Trim(), StringComparison.Ordinal);

        await SwitchTo(UnitSystem.Imperial);

        page.WaitForAssertion(() => Assert.EndsWith(" in", page.Find("[data-testid=cross-section-scale] text").TextContent.Trim(), StringComparison.Ordinal));
        // The 36 mm ring: a quarter is 9 mm = 0.354 in, so the bar is 0.2 in = 5.08 mm long.
        Assert.Equal("0.2 in", page.Find("[data-testid=cross-section-scale] text").TextContent.Trim());
        var line = page.Find("[data-testid=cross-section-scale] line");
        var length = double.Parse(line.GetAttribute("x2")!, CultureInfo.InvariantCulture) - double.Parse(line.GetAttribute("x1")!, CultureInfo.InvariantCulture);
        Assert.Equal(5.08, length, 1e-3);
    }

    [Fact]
    public async Task PlanPage_ValueTypedInInches_GivesTheSameDocumentAsTheMillimetreValue()
    {
        // 0.02 in = 0.508 mm and 0.03 in = 0.762 mm exactly (1 in = 25.4 mm).
        var page = Render<PlanPage>();
        page.Find("input#windings-0-conductor").Input("0.508");
        page.Find("input#windings-0-overall").Input("0.762");
        page.WaitForAssertion(() => Assert.Equal(0.762, State.ToDocument().Windings![0]!.Wire!.OverallDiameterMm));
        var typedInMillimetres = Document();

        await SwitchTo(UnitSystem.Imperial);
        page.WaitForAssertion(() => Assert.Equal("Conductor (in)", page.Find("label[for=windings-0-conductor]").TextContent.Trim()));
        page.Find("input#windings-0-conductor").Input("0.5");
        page.WaitForAssertion(() => Assert.Equal(12.7, State.ToDocument().Windings![0]!.Wire!.ConductorDiameterMm));
        page.Find("input#windings-0-conductor").Input("0.02");
        page.Find("input#windings-0-overall").Input("0.03");

        page.WaitForAssertion(() => Assert.Equal(typedInMillimetres, Document()));
        Assert.Equal(0.508, State.ToDocument().Windings![0]!.Wire!.ConductorDiameterMm);
    }

    [Fact]
    public void PlanPage_SwitchingBackAndForth_NeverChangesThePlan()
    {
        // Property: whatever length is stored, showing it in inches and back (any number of times) leaves the plan
        // document exactly as it was, and the metric field shows it again as it was.
        var page = Render<PlanPage>();
        Gen.Select(LengthGeneratorsForPage.WireMillimetres, Gen.Int[1, 3]).Sample((mm, switches) =>
        {
            State.EditWinding(0, w => w.ConductorDiameter = LengthText.ForDraft(mm));
            var before = Document();
            var shown = LengthText.ForDraft(mm);
            page.WaitForAssertion(() => Assert.Equal(shown, page.Find("input#windings-0-conductor").GetAttribute("value")));
            for (var k = 0; k < switches; k++)
            {
                SwitchTo(UnitSystem.Imperial).GetAwaiter().GetResult();
                page.WaitForAssertion(() => Assert.Equal(LengthText.Number(mm, LengthUnit.Inch, 6), page.Find("input#windings-0-conductor").GetAttribute("value")));
                SwitchTo(UnitSystem.Metric).GetAwaiter().GetResult();
                page.WaitForAssertion(() => Assert.Equal(shown, page.Find("input#windings-0-conductor").GetAttribute("value")));
            }

            Assert.Equal(before, Document());
        }, iter: 15, threads: 1);
    }

    private static class LengthGeneratorsForPage
    {
        /// <summary>Wire diameters from 0.02 mm to 3 mm, any double (not only round values).</summary>
        public static Gen<double> WireMillimetres { get; } = Gen.Double[0.02, 3];
    }
}
