using BenchmarkDotNet.Attributes;
using Microsoft.Extensions.Logging.Abstractions;
using Winding.Catalogue.Plans;
using Winding.Core.Plans;
using Winding.Web.Display;
using Winding.Web.Hosting;
using Winding.Web.Planning;

namespace Winding.Benchmarks;

/// <summary>
/// The server's part of redrawing the response chart after an edit, for the end-fed demo (401-point sweep): building the
/// plot and serialising it once to the JSON string the chart module receives.
/// </summary>
[MemoryDiagnoser]
public class ChartPayloadBenchmarks
{
    private IReadOnlyList<(string Name, ResponseEvaluation Response)> _responses = default!;
    private OperatingConditions _band = default!;
    private ResponsePlot _plot = default!;

    [GlobalSetup]
    public void Setup()
    {
        var paths = new WindingPaths(Path.Combine(AppContext.BaseDirectory, "cores"), Path.Combine(Path.GetTempPath(), "winding-bench-" + Guid.NewGuid().ToString("N")));
        var catalogue = new CatalogueProvider(paths, TimeProvider.System, NullLogger<CatalogueProvider>.Instance).Catalogue;
        var plan = PlanReader.Read(DemoPlans.Find("club-end-fed-unun")!.Document, catalogue).Plan!;
        var evaluation = PlanEvaluator.Evaluate(plan);
        _responses = [("end-fed", evaluation.Response!)];
        _band = plan.Operating!;
        _plot = ResponsePlot.For(_responses, _band.MinFrequencyHz, _band.MaxFrequencyHz);
    }

    /// <summary>Series, band, edges and tolerance spread from the evaluation.</summary>
    [Benchmark]
    public ResponsePlot BuildPlot() => ResponsePlot.For(_responses, _band.MinFrequencyHz, _band.MaxFrequencyHz);

    /// <summary>The plot serialised once to the JSON string sent to the browser.</summary>
    [Benchmark]
    public int PlotJson() => _plot.ToJson().Length;
}
