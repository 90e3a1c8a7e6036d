using Microsoft.Extensions.DependencyInjection;
using Winding.Web.Components.Pages;

namespace Winding.Web.Tests.Components;

public sealed class CataloguePageTests : WindingComponentTestBase
{
    [Fact]
    public void CataloguePage_ListsCoresOfEveryShape_AndSearchFilters()
    {
        var page = Render<CataloguePage>();

        foreach (var shape in new[] { "toroid", "sleeve", "two-hole", "bobbin" })
        {
            Assert.Contains(shape, page.Find("[data-testid=catalogue-table]").TextContent, StringComparison.Ordinal);
        }

        page.Find("input#catalogue-search").Input("36 × 23");

        page.WaitForAssertion(() => Assert.DoesNotContain("two-hole", page.Find("[data-testid=catalogue-table] tbody").TextContent, StringComparison.Ordinal));
        Assert.Contains("Toroid 36 × 23 × 15 mm", page.Markup, StringComparison.Ordinal);
    }

    [Fact]
    public void CoreDetailPage_ShowsParametersChartAndCloneForABuiltIn()
    {
        var page = Render<CoreDetailPage>(p => p.Add(x => x.Id, "toroid-10x5x4-nizn-850"));

        // AL of the 10 × 5 × 4 mm ring at μi 850: 471.34 nH (IEC 60205; physics-sources.md §2.2).
        Assert.Contains("471.3 nH", page.Find("[data-testid=value-al]").TextContent, StringComparison.Ordinal);
        Assert.NotNull(page.Find("[data-testid=permeability-chart]"));
        Assert.NotNull(page.Find("button[data-testid=clone]"));
    }

    [Fact]
    public async Task CoreDetailPage_Imperial_ShowsDimensionsInInches()
    {
        var page = Render<CoreDetailPage>(p => p.Add(x => x.Id, "toroid-10x5x4-nizn-850"));
        var le = double.Parse(page.Find("[data-testid=value-le]").TextContent.Split(' ')[0], System.Globalization.CultureInfo.InvariantCulture);
        var al = page.Find("[data-testid=value-al]").TextContent;

        await Services.GetRequiredService<Winding.Web.Display.DisplayUnits>().SetAsync(Winding.Web.Display.UnitSystem.Imperial);

        // The same le converted with 1 in = 25.4 mm (to 0.001 in); AL stays in nH.
        page.WaitForAssertion(() => Assert.EndsWith(" in", page.Find("[data-testid=value-le]").TextContent.Trim(), StringComparison.Ordinal));
        var inches = double.Parse(page.Find("[data-testid=value-le]").TextContent.Split(' ')[0], System.Globalization.CultureInfo.InvariantCulture);
        Assert.Equal(le / 25.4, inches, 0.0005 + (0.005 / 25.4));
        Assert.EndsWith(" in²", page.Find("[data-testid=value-window]").TextContent.Trim(), StringComparison.Ordinal);
        Assert.Equal(al, page.Find("[data-testid=value-al]").TextContent);
    }

    [Fact]
    public void MaterialDetailPage_UnknownId_SaysSo()
    {
        var page = Render<MaterialDetailPage>(p => p.Add(x => x.Id, "no-such-material"));

        Assert.Contains("no material with the id", page.Markup, StringComparison.OrdinalIgnoreCase);
    }
}
