using System.Text.Json;
using Microsoft.Extensions.DependencyInjection;
using Winding.Core.Plans;
using Winding.Web.Components.Pages;
using Winding.Web.Components.Widgets;
using Winding.Web.Display;
using Winding.Web.Planning;

namespace Winding.Web.Tests.Components;

public sealed class ResponseChartTests : WindingComponentTestBase
{
    [Fact]
    public void ResponseChart_DefaultPlan_RendersTheChartContainer()
    {
        var state = Services.GetRequiredService<PlanningState>();
        var response = Assert.IsType<ResponseEvaluation>(state.Result?.Response);
        var operating = Assert.IsType<OperatingConditions>(state.Plan?.Operating);
        IReadOnlyList<(string Name, ResponseEvaluation Response)> responses = [("plan", response), ("variant", response)];

        var chart = Render<ResponseChart>(p => p
            .Add(c => c.Responses, responses)
            .Add(c => c.MinFrequencyHz, operating.MinFrequencyHz)
            .Add(c => c.MaxFrequencyHz, operating.MaxFrequencyHz));

        Assert.NotNull(chart.Find("[data-testid=response-chart]"));
        Assert.Contains("1 dB and 3 dB edges of plan", chart.Markup, StringComparison.Ordinal);
    }

    [Fact]
    public void ResponseChart_SendsEachNewPlotOnce_ToTheChartModule()
    {
        var module = JSInterop.SetupModule(ResponseChartModule.ModulePath);
        module.SetupVoid("update", _ => true).SetVoidResult();
        var state = Services.GetRequiredService<PlanningState>();
        var response = Assert.IsType<ResponseEvaluation>(state.Result?.Response);
        IReadOnlyList<(string Name, ResponseEvaluation Response)> responses = [("plan", response)];

        var chart = Render<ResponseChart>(p => p
            .Add(c => c.Responses, responses)
            .Add(c => c.MinFrequencyHz, 1e6)
            .Add(c => c.MaxFrequencyHz, 3e7));
        chart.WaitForAssertion(() => Assert.Single(module.Invocations["update"]));
        chart.Render(p => p.Add(c => c.MinFrequencyHz, 1e6));
        chart.Render(p => p.Add(c => c.MaxFrequencyHz, 2e7));
        chart.WaitForAssertion(() => Assert.Equal(2, module.Invocations["update"].Count));

        var sent = module.Invocations["update"].Select(i => Assert.IsType<string>(i.Arguments[1])).ToList();
        using var last = JsonDocument.Parse(sent[^1]);
        Assert.Equal(2e7, last.RootElement.GetProperty("band").GetProperty("toHz").GetDouble());
        Assert.Equal(response.Sweep.Count, last.RootElement.GetProperty("frequenciesHz").GetArrayLength());
        Assert.Equal(2, chart.Instance.PlotsGiven);
    }

    [Fact]
    public void ResponsePreviewPage_DefaultPlan_ShowsTheChart()
    {
        var page = Render<ResponsePreviewPage>();

        Assert.NotNull(page.Find("[data-testid=response-chart]"));
        Assert.Empty(page.FindAll("[data-testid=response-missing]"));
    }
}
