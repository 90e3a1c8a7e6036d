using Microsoft.AspNetCore.Components;
using Microsoft.Extensions.DependencyInjection;
using Winding.Catalogue.Plans;
using Winding.Web.Components.Pages;
using Winding.Web.Planning;

namespace Winding.Web.Tests.Components;

public sealed class SheetPageTests : WindingComponentTestBase
{
    private IRenderedComponent<SheetPage> Open(string address, string? planId = null)
    {
        Services.GetRequiredService<NavigationManager>().NavigateTo(address);
        return planId is null ? Render<SheetPage>() : Render<SheetPage>(p => p.Add(c => c.PlanId, planId));
    }

    [Fact]
    public void SheetPage_Demo_ShowsItsSheetAsADemo()
    {
        var page = Open("sheet?demo=club-end-fed-unun");

        Assert.Equal("Club end-fed 1:9 unun, 100 W", page.Find("[data-testid=sheet-title]").TextContent);
        Assert.Equal("demo plan, not saved", page.Find("[data-testid=sheet-revision]").TextContent);
        Assert.Equal("plan?demo=club-end-fed-unun", page.Find("[data-testid=back-to-plan]").GetAttribute("href"));
    }

    [Fact]
    public void SheetPage_PaperQueryAndButtons_SwitchThePageSize()
    {
        var page = Open("sheet?demo=club-gate-drive&paper=letter");
        Assert.Equal("letter", page.Find("[data-testid=bench-sheet]").GetAttribute("data-paper"));

        page.Find("[data-testid=paper-a4]").Click();

        Assert.Equal("a4", page.Find("[data-testid=bench-sheet]").GetAttribute("data-paper"));
        Assert.Contains("size: A4", page.Find("[data-testid=bench-sheet]").PreviousElementSibling!.TextContent, StringComparison.Ordinal);
    }

    [Fact]
    public void SheetPage_Print_AsksTheBrowserToPrint()
    {
        var page = Open("sheet?demo=club-gate-drive");

        page.Find("[data-testid=print-sheet]").Click();

        JSInterop.VerifyInvoke("print");
    }

    [Fact]
    public void SheetPage_SavedPlan_ShowsItsRevision()
    {
        var store = Services.GetRequiredService<PlanStore>();
        var created = store.Create("Bench copy", DemoPlans.Find("club-gate-drive")!.Document);
        var saved = store.Save(created.Id!, DemoPlans.Find("club-gate-drive")!.Document, created.Version!.Value);

        var page = Open($"plan/{created.Id}/sheet", created.Id);

        Assert.Equal("Bench copy", page.Find("[data-testid=sheet-title]").TextContent);
        Assert.Equal($"revision {saved.Version}", page.Find("[data-testid=sheet-revision]").TextContent);
    }

    [Fact]
    public void SheetPage_CurrentPlan_FollowsThePlanPagesStateAndItsRevision()
    {
        var state = Services.GetRequiredService<PlanningState>();
        state.Load(DemoPlans.Find("club-long-wire-receive")!.Document);
        Assert.Equal("not saved", Open("sheet").Find("[data-testid=sheet-revision]").TextContent);

        state.Save();
        Assert.Equal("revision 1", Open("sheet").Find("[data-testid=sheet-revision]").TextContent);

        state.EditWinding(0, w => w.Turns = "13");
        var page = Open("sheet");

        Assert.Equal("changed since revision 1, not saved", page.Find("[data-testid=sheet-revision]").TextContent);
        Assert.Equal("13", page.Find("[data-testid=winding-1] [data-cell=turns]").TextContent);
    }

    [Fact]
    public void SheetPage_UnknownDemo_SaysSoAndCannotPrint()
    {
        var page = Open("sheet?demo=no-such-plan");

        Assert.Contains("no demo plan", page.Find("[data-testid=sheet-problem]").TextContent, StringComparison.Ordinal);
        Assert.True(page.Find("[data-testid=print-sheet]").HasAttribute("disabled"));
    }
}
