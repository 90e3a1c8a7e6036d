using System.Text.Json;
using Microsoft.Extensions.DependencyInjection;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Plans;
using Winding.Web.Planning;
using Winding.Web.Sheets;

namespace Winding.Web.Tests.Sheets;

public sealed class SheetDownloadsTests : WindingComponentTestBase
{
    [Fact]
    public void Netlist_PlanWithABand_IsTheFrequencyIndependentCircuitNamedAfterThePlan()
    {
        var view = Services.GetRequiredService<SheetLoader>().Demo("club-gate-drive").View!;

        var file = SheetDownloads.Netlist(view)!;

        Assert.Equal("Club-gate-drive-transformer-11.cir", file.FileName);
        Assert.Contains(".ac", file.Text, StringComparison.OrdinalIgnoreCase);
        Assert.Null(SheetDownloads.NetlistUnavailable(view));
    }

    [Fact]
    public void Netlist_PlanWithoutABand_IsNoneAndSaysWhy()
    {
        // A copy: the demo's document is shared by the whole process.
        var document = JsonSerializer.Deserialize<PlanDocument>(JsonSerializer.Serialize(DemoPlans.Find("club-gate-drive")!.Document, CatalogueJson.Options), CatalogueJson.Options)!;
        document.Operating = null;
        var view = Services.GetRequiredService<SheetLoader>().FromDocument(document, 0, "test", "plan").View!;

        Assert.Null(SheetDownloads.Netlist(view));
        Assert.Contains("operating conditions", SheetDownloads.NetlistUnavailable(view), StringComparison.Ordinal);
    }

    [Fact]
    public void PlanJson_ReadsBackAsTheSamePlan()
    {
        var loaded = Services.GetRequiredService<SheetLoader>().Demo("club-gate-drive");

        var file = SheetDownloads.PlanJson(loaded.View!, loaded.Document!);

        var back = JsonSerializer.Deserialize<PlanDocument>(file.Text, CatalogueJson.Options);
        Assert.Equal(JsonSerializer.Serialize(loaded.Document, CatalogueJson.Options), JsonSerializer.Serialize(back, CatalogueJson.Options));
        Assert.Equal("Club-gate-drive-transformer-11.json", file.FileName);
    }
}
