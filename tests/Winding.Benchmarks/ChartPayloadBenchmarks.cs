using System.Text.Json;
using System.Text.Json.Serialization;
using BenchmarkDotNet.Attributes;
using Microsoft.Extensions.Logging.Abstractions;
using Plotly.Blazor;
using Winding.Catalogue.Plans;
using Winding.Core.Plans;
using Winding.Web.Display;
using Winding.Web.Hosting;
using Winding.Web.Planning;

namespace Winding.Benchmarks;

/// <summary>
/// The server's part of redrawing the response chart after an edit, for the end-fed demo (401-point sweep): building the
/// plot, and turning it into what is sent to the browser — the way Plotly.Blazor's <c>React()</c> does it (serialise,
/// parse back, serialise again for the interop call) against one serialisation to a JSON string.
/// </summary>
[MemoryDiagnoser]
public class ChartPayloadBenchmarks
{
    private static readonly JsonSerializerOptions Options = new()
    {
        PropertyNamingPolicy = null,
        DefaultIgnoreCondition = JsonIgnoreCondition.WhenWritingNull,
        Converters = { new PolymorphicConverter<ITrace>() },
    };

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

    /// <summary>Traces, band, edges and tolerance shapes from the evaluation.</summary>
    [Benchmark]
    public ResponsePlot BuildPlot() => ResponsePlot.For(_responses, _band.MinFrequencyHz, _band.MaxFrequencyHz);

    /// <summary>As the wrapper's React(): each part serialised, parsed back to a JsonElement, then serialised for the call.</summary>
    [Benchmark]
    public int WrapperPayload()
    {
        var parts = new object[]
        {
            _plot.Data.Select(t => RoundTrip(t)).ToList(),
            RoundTrip(_plot.Layout),
            RoundTrip(_plot.Config),
        };
        return JsonSerializer.Serialize(parts).Length;
    }

    /// <summary>The same content serialised once into a string.</summary>
    [Benchmark]
    public int SingleStringPayload() =>
        JsonSerializer.Serialize(new { data = _plot.Data, layout = _plot.Layout, config = _plot.Config }, Options).Length;

    private static JsonElement RoundTrip(object part) => JsonSerializer.Deserialize<JsonElement>(JsonSerializer.Serialize(part, Options));
}
