using Microsoft.Extensions.DependencyInjection;
using Winding.Catalogue.Plans;
using Winding.Web.Components.Pages;
using Winding.Web.Planning;

namespace Winding.Web.Tests.Components;

/// <summary>The start page's saved-plan actions: duplicate, delete after confirmation, import a plan file.</summary>
public sealed class StartPageTests : WindingComponentTestBase
{
    private PlanStore Store => Services.GetRequiredService<PlanStore>();

    [Fact]
    public void Duplicate_AddsACopyThatIsMarkedAsAVariant()
    {
        var id = Store.Create("Bench balun", DemoPlans.Find("club-current-sense")!.Document).Id;
        var page = Render<StartPage>();

        page.Find($"button[data-testid=duplicate-{id}]").Click();

        page.WaitForAssertion(() => Assert.NotNull(page.Find("[data-testid=saved-bench-balun-copy]")));
        Assert.Contains("variant", page.Find("[data-testid=saved-bench-balun-copy]").TextContent, StringComparison.Ordinal);
        Assert.Equal(id, Store.Read("bench-balun-copy").Plan!.VariantOf);
    }

    [Fact]
    public void Delete_AsksFirst_KeepItKeepsIt_DeleteRemovesIt()
    {
        var id = Store.Create("Bench balun", DemoPlans.Find("club-current-sense")!.Document).Id;
        var page = Render<StartPage>();

        page.Find($"button[data-testid=delete-{id}]").Click();
        page.Find("button[data-testid=confirm-delete-no]").Click();
        Assert.NotNull(Store.Read(id).Plan);
        Assert.Empty(page.FindAll("[data-testid=confirm-delete]"));

        page.Find($"button[data-testid=delete-{id}]").Click();
        page.Find("button[data-testid=confirm-delete-yes]").Click();

        page.WaitForAssertion(() => Assert.Empty(page.FindAll($"[data-testid=saved-{id}]")));
        Assert.Null(Store.Read(id).Plan);
        Assert.Contains("Deleted", page.Find("[data-testid=plans-message]").TextContent, StringComparison.Ordinal);
    }

    [Fact]
    public void Import_PlanPageExport_IsSavedAndListed()
    {
        var model = Services.GetRequiredService<SavedPlansModel>();
        var document = DemoPlans.Find("club-current-sense")!.Document;
        var json = System.Text.Json.JsonSerializer.Serialize(document, Winding.Catalogue.Loading.CatalogueJson.Options);

        model.Import("sense.json", json);

        Assert.True(model.Message!.Value.Succeeded, model.Message.Value.Text);
        Assert.Contains(model.List.Plans, p => p.Name == document.Name);
    }

    [Fact]
    public void Import_BadFile_NamesTheFieldAndSavesNothing()
    {
        var model = Services.GetRequiredService<SavedPlansModel>();

        model.Import("broken.json", """{ "windings": [ { "turns": "three" } ] }""");

        Assert.False(model.Message!.Value.Succeeded);
        Assert.Contains("windings[0].turns", model.Message.Value.Text, StringComparison.Ordinal);
        Assert.Empty(Store.List().Plans);
    }
}
