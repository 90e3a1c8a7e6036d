using Microsoft.Extensions.DependencyInjection;
using Winding.Core.Plans;
using Winding.Web.Components.Pages;
using Winding.Web.Components.Widgets;
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
    public void ResponsePreviewPage_DefaultPlan_ShowsTheChart()
    {
        var page = Render<ResponsePreviewPage>();

        Assert.NotNull(page.Find("[data-testid=response-chart]"));
        Assert.Empty(page.FindAll("[data-testid=response-missing]"));
    }
}
