using Microsoft.Extensions.DependencyInjection;
using Winding.Catalogue.Plans;
using Winding.Web.Components.Widgets;
using Winding.Web.Sheets;

namespace Winding.Web.Tests.Components;

public sealed class BenchSheetViewTests : WindingComponentTestBase
{
    private SheetView Demo(string id) => Services.GetRequiredService<SheetLoader>().Demo(id).View!;

    [Fact]
    public void BenchSheetView_Demo_ShowsEveryPartWithEmptyMeasuredCellsAndTickBoxes()
    {
        var view = Demo("club-audio-isolation");

        var sheet = Render<BenchSheetView>(p => p.Add(c => c.View, view));

        Assert.Equal(view.Title, sheet.Find("h1").TextContent);
        Assert.Equal(view.DateText, sheet.Find("[data-testid=sheet-date]").TextContent);
        Assert.Equal(view.CoreFacts.Count, sheet.FindAll("[data-testid=sheet-core] dl > div").Count);
        Assert.Equal(2, sheet.FindAll("[data-testid=sheet-windings] tbody tr").Count);
        Assert.Equal(view.Steps.Count, sheet.FindAll("[data-testid=sheet-steps] ol > li").Count);
        Assert.Equal(view.Checks.Count, sheet.FindAll("[data-testid=sheet-checks] tbody tr").Count);
        Assert.Equal(view.Checks.Count, sheet.FindAll("[data-testid=sheet-check-notes] li").Count);
        Assert.Equal(view.Steps.Count + view.Checks.Count, sheet.FindAll(".tick-box").Count);
        Assert.All(sheet.FindAll("[data-cell=measured]"), c => Assert.Equal(string.Empty, c.TextContent.Trim()));
        Assert.NotNull(sheet.Find("[data-testid=cross-section-svg]"));
        Assert.Equal("400", sheet.Find("[data-testid=winding-1] [data-cell=turns]").TextContent);
    }

    [Fact]
    public void BenchSheetView_Paper_SetsThePageSize()
    {
        var view = Demo("club-gate-drive");

        var a4 = Render<BenchSheetView>(p => p.Add(c => c.View, view));
        var letter = Render<BenchSheetView>(p => p.Add(c => c.View, view).Add(c => c.Paper, SheetPaper.Letter));

        Assert.Contains("size: A4", a4.Find("style").TextContent, StringComparison.Ordinal);
        Assert.Contains("size: letter", letter.Find("style").TextContent, StringComparison.Ordinal);
        Assert.Contains("paper-letter", letter.Find("[data-testid=bench-sheet]").ClassName, StringComparison.Ordinal);
    }

    [Fact]
    public void BenchSheetView_NoSafetyConcern_HasNoCautionsBox()
    {
        // The long-wire receive plan drives 0.1 V: nothing calls for a caution.
        var sheet = Render<BenchSheetView>(p => p.Add(c => c.View, Demo("club-long-wire-receive")));

        Assert.Empty(sheet.FindAll("[data-testid=sheet-cautions]"));
    }

    [Fact]
    public void BenchSheetView_HighVoltagePlan_ShowsTheEnginesCautionsAndTheLocalCodesLine()
    {
        var view = Demo("club-end-fed-unun");

        var sheet = Render<BenchSheetView>(p => p.Add(c => c.View, view));

        var items = sheet.FindAll("[data-testid=sheet-cautions] li").Select(li => li.TextContent).ToList();
        Assert.Contains(items, t => t.Contains("extra-low-voltage", StringComparison.Ordinal));
        Assert.Contains("local electrical codes", items[^1], StringComparison.Ordinal);
    }

    [Fact]
    public void BenchSheetView_MarkupInNames_IsShownAsText()
    {
        var document = new PlanDocument
        {
            Name = "<script>alert(1)</script>",
            Core = new PlanCoreDocument { CatalogueId = "toroid-10x5x4-nizn-850" },
            Windings =
            [
                new PlanWindingDocument { Name = "\"><svg onload=alert(2)>", Turns = 8, Wire = new PlanWireDocument { ConductorDiameterMm = 0.2 } },
            ],
        };
        var view = Services.GetRequiredService<SheetLoader>().FromDocument(document, 0, "not saved", "plan").View!;

        var sheet = Render<BenchSheetView>(p => p.Add(c => c.View, view));

        Assert.Empty(sheet.FindAll("script"));
        Assert.Single(sheet.FindAll("svg[data-testid=cross-section-svg]"));
        Assert.DoesNotContain(sheet.FindAll("*"), e => e.Attributes.Any(a => a.Name.StartsWith("on", StringComparison.OrdinalIgnoreCase)));
        Assert.Equal("<script>alert(1)</script>", sheet.Find("h1").TextContent);
        Assert.Equal("\"><svg onload=alert(2)>", sheet.Find("[data-testid=winding-1] [data-cell=name]").TextContent);
    }
}
