using Microsoft.Extensions.DependencyInjection;
using Winding.Web.Components.Pages;
using Winding.Web.Components.Widgets;
using Winding.Web.Exports;
using Winding.Web.Planning;

namespace Winding.Web.Tests.Components;

public sealed class SweepCsvButtonTests : WindingComponentTestBase
{
    [Fact]
    public void SweepCsvButton_Click_SavesTheSweepAsCsvNamedAfterThePlan()
    {
        var module = JSInterop.SetupModule(SweepCsvButton.ModulePath);
        var save = module.SetupVoid("saveText", _ => true);
        var response = Exports.SweepCsvTests.Response(11);
        var button = Render<SweepCsvButton>(p => p.Add(b => b.Response, response).Add(b => b.PlanName, "club <b>4:1</b>"));

        button.Find("[data-testid=export-sweep]").Click();

        var call = Assert.Single(save.Invocations);
        Assert.Equal("club-b41b.csv", call.Arguments[0]);
        Assert.Equal("text/csv;charset=utf-8", call.Arguments[1]);
        Assert.Equal(SweepCsv.Write(response.Sweep), call.Arguments[2]);
    }

    [Fact]
    public void SweepCsvButton_NoResponse_IsDisabledAndSavesNothing()
    {
        var module = JSInterop.SetupModule(SweepCsvButton.ModulePath);
        var save = module.SetupVoid("saveText", _ => true);

        var button = Render<SweepCsvButton>(p => p.Add(b => b.Response, null));

        Assert.True(button.Find("[data-testid=export-sweep]").HasAttribute("disabled"));
        Assert.Empty(save.Invocations);
    }

    [Fact]
    public void SweepCsvButton_OnThePlanPage_SavesTheSweepShown()
    {
        var module = JSInterop.SetupModule(SweepCsvButton.ModulePath);
        var save = module.SetupVoid("saveText", _ => true);
        var page = Render<PlanPage>();
        var state = Services.GetRequiredService<PlanningState>();
        state.PlanName = "bench 1:9";
        page.Render();

        page.Find("[data-testid=export-sweep]").Click();

        page.WaitForAssertion(() => Assert.Single(save.Invocations));
        var call = Assert.Single(save.Invocations);
        Assert.Equal("bench-19.csv", call.Arguments[0]);
        Assert.Equal(SweepCsv.Write(state.Result!.Response!.Sweep), call.Arguments[2]);
    }
}
