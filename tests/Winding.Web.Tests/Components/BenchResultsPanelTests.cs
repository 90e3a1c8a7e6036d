using System.Globalization;
using Microsoft.AspNetCore.Components;
using Microsoft.Extensions.DependencyInjection;
using Winding.Catalogue.Plans;
using Winding.Core.Sheets;
using Winding.Web.Components.Pages;
using Winding.Web.Display;
using Winding.Web.Hosting;
using Winding.Web.Planning;
using Winding.Web.Sheets;

namespace Winding.Web.Tests.Components;

/// <summary>
/// The sheet page's bench-results panel. Measured values are made from the sheet's own expected values and limits (a
/// value at the expected value lies within, one at twice the upper limit outside), so the tests check the panel, not
/// the physics.
/// </summary>
public sealed class BenchResultsPanelTests : WindingComponentTestBase
{
    private const string Demo = "club-gate-drive";

    [Fact]
    public void Panel_ValueAtExpected_IsWithin_AndTwiceTheUpperLimitIsFlaggedOutsideInWords()
    {
        var (page, sheet) = OpenSaved();
        var inductance = Check(sheet, "w0-inductance");
        var resistance = Check(sheet, "w0-resistance");

        Type(page, inductance, inductance.Expected);
        Type(page, resistance, resistance.Upper * 2);

        var within = page.Find("[data-testid=outcome-w0-inductance]");
        var outside = page.Find("[data-testid=outcome-w0-resistance]");
        Assert.Equal("within", within.GetAttribute("data-verdict"));
        Assert.StartsWith("Within limits", within.TextContent.Trim(), StringComparison.Ordinal);
        Assert.Equal("above", outside.GetAttribute("data-verdict"));
        Assert.Contains("OUTSIDE: above the highest", outside.TextContent, StringComparison.Ordinal);
        Assert.Contains("1 measured value(s) outside the limits.", page.Find("[data-testid=bench-summary]").TextContent, StringComparison.Ordinal);
        Assert.Contains("AL = L/N²", page.Find("[data-testid=suggestion-coreal]").TextContent, StringComparison.Ordinal);
    }

    [Fact]
    public void Panel_TextThatIsNotANumber_GetsAMessageAtItsField_AndIsNotCompared()
    {
        var (page, _) = OpenSaved();

        page.Find("#measured-w0-inductance").Change("about ten");

        Assert.Contains("'about ten' is not a number in H", page.Find("[data-testid=bench-row-w0-inductance]").TextContent, StringComparison.Ordinal);
        Assert.Equal("notmeasured", page.Find("[data-testid=outcome-w0-inductance]").GetAttribute("data-verdict"));

        page.Find("#measured-w0-resistance").Change("-3");
        Assert.Contains("enter a value above zero in Ω", page.Find("[data-testid=bench-row-w0-resistance]").TextContent, StringComparison.Ordinal);
    }

    [Fact]
    public void Panel_DemoPlan_SaysToSaveItFirstWithALinkToThePlanPage()
    {
        Services.GetRequiredService<NavigationManager>().NavigateTo($"sheet?demo={Demo}");
        var page = Render<SheetPage>();

        var note = page.Find("[data-testid=bench-not-saved]");
        Assert.Contains("demo plan", note.TextContent, StringComparison.Ordinal);
        Assert.Equal($"plan?demo={Demo}", page.Find("[data-testid=bench-open-plan]").GetAttribute("href"));
        Assert.Empty(page.FindAll("[data-testid=bench-save-record]"));
    }

    [Fact]
    public void UpdateCoreAl_BuiltInCore_SavesAUserCopyWithTheMeasuredAlAndItsProvenance()
    {
        var (page, sheet) = OpenSaved();
        var inductance = Check(sheet, "w0-inductance");
        var measured = inductance.Expected * 1.3;
        Type(page, inductance, measured);

        page.Find("[data-testid=bench-update-core-al] button, button[data-testid=bench-update-core-al]").Click();

        var catalogue = Services.GetRequiredService<CatalogueProvider>().Catalogue;
        var copy = catalogue.CoresById["toroid-16x10x6-mnzn-2000-measured"];
        var turns = sheet.Windings[0].Turns;
        Assert.False(copy.BuiltIn);
        Assert.Equal(ParsedBack(measured) / (turns * turns), copy.MeasuredAl!.Value.HenriesPerTurnSquared, 1e-5 * copy.MeasuredAl.Value.HenriesPerTurnSquared);
        Assert.Contains("Bench copy", copy.Source, StringComparison.Ordinal);
        Assert.Contains($"{turns} turns", copy.Source, StringComparison.Ordinal);
        Assert.True(catalogue.CoresById["toroid-16x10x6-mnzn-2000"].BuiltIn);
        Assert.Contains("Saved", page.Find("[data-testid=bench-message]").TextContent, StringComparison.Ordinal);

        page.Find("button[data-testid=bench-use-core-copy]").Click();

        var saved = Services.GetRequiredService<PlanStore>().Read("bench-copy").Plan!;
        Assert.Equal(("toroid-16x10x6-mnzn-2000-measured", 2), (saved.Plan!.Core!.CatalogueId, saved.Version));
    }

    [Fact]
    public void UpdateCoreAl_UserCore_SavesItsNextVersion()
    {
        var (page, sheet) = OpenSaved();
        Type(page, Check(sheet, "w0-inductance"), Check(sheet, "w0-inductance").Expected * 1.3);
        page.Find("button[data-testid=bench-update-core-al]").Click();
        page.Find("button[data-testid=bench-use-core-copy]").Click();

        Type(page, Check(sheet, "w0-inductance"), Check(sheet, "w0-inductance").Expected * 1.1);
        page.Find("button[data-testid=bench-update-core-al]").Click();

        var copy = Services.GetRequiredService<CatalogueProvider>().Catalogue.CoresById["toroid-16x10x6-mnzn-2000-measured"];
        Assert.Equal(2, copy.Version);
        Assert.False(Services.GetRequiredService<CatalogueProvider>().Catalogue.CoresById.ContainsKey("toroid-16x10x6-mnzn-2000-measured-2"));
    }

    [Fact]
    public void KeepAsPlanValues_SavesTheMeasuredAlAsANewPlanVersion_WithTheBenchRecord()
    {
        var (page, sheet) = OpenSaved();
        var inductance = Check(sheet, "w0-inductance");
        var measured = inductance.Expected * 0.8;
        Type(page, inductance, measured);

        page.Find("button[data-testid=bench-keep-plan-values]").Click();

        var saved = Services.GetRequiredService<PlanStore>().Read("bench-copy").Plan!;
        var turns = sheet.Windings[0].Turns;
        Assert.Equal(2, saved.Version);
        Assert.Equal(ParsedBack(measured) / (turns * turns) * 1e9, saved.Plan!.Measured!.AlNh!.Value, 1e-5 * saved.Plan.Measured.AlNh.Value);
        Assert.Equal(ParsedBack(measured), saved.Plan.Bench!.Values!["w0-inductance"]!.Value, 1e-12);
        Assert.Equal("revision 2", page.Find("[data-testid=sheet-revision]").TextContent);
    }

    [Fact]
    public void SavedRecord_ReloadedPage_ShowsTheStoredValuesAndTheirComparison()
    {
        var (page, sheet) = OpenSaved();
        var resistance = Check(sheet, "w0-resistance");
        Type(page, resistance, resistance.Upper * 2);
        page.Find("button[data-testid=bench-save-record]").Click();
        Assert.Contains("revision 2", page.Find("[data-testid=bench-message]").TextContent, StringComparison.Ordinal);

        var reloaded = Render<SheetPage>(p => p.Add(c => c.PlanId, "bench-copy"));

        Assert.Equal(EngineeringFormat.Editable(ParsedBack(resistance.Upper * 2), "Ω"), reloaded.Find("#measured-w0-resistance").GetAttribute("value"));
        Assert.Equal("above", reloaded.Find("[data-testid=outcome-w0-resistance]").GetAttribute("data-verdict"));
        Assert.Contains("to revision 1", reloaded.Find("[data-testid=bench-record-note]").TextContent, StringComparison.Ordinal);
    }

    private (IRenderedComponent<SheetPage> Page, BenchSheet Sheet) OpenSaved()
    {
        var store = Services.GetRequiredService<PlanStore>();
        var created = store.Create("Bench copy", DemoPlans.Find(Demo)!.Document);
        Services.GetRequiredService<NavigationManager>().NavigateTo($"plan/{created.Id}/sheet");
        var page = Render<SheetPage>(p => p.Add(c => c.PlanId, created.Id));
        return (page, Services.GetRequiredService<SheetLoader>().Saved(created.Id!).View!.Sheet);
    }

    private static BenchCheck Check(BenchSheet sheet, string id) => sheet.Checks.Single(c => c.Id == id);

    /// <summary>Types a value as the panel's own edit text (6 significant figures).</summary>
    private static void Type(IRenderedComponent<SheetPage> page, BenchCheck check, double value) =>
        page.Find($"#measured-{check.Id}").Change(EngineeringFormat.Editable(value, check.Unit));

    /// <summary>The value the panel reads from that text.</summary>
    private static double ParsedBack(double value) => double.Parse(value.ToString("G6", CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
}
