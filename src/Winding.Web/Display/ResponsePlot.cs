using System.Text.Json;
using System.Text.Json.Serialization;
using Winding.Core.Plans;
using Winding.Core.Response;

namespace Winding.Web.Display;

/// <summary>
/// The frequency-response plot of one or more responses, independent of any chart library: insertion loss (left axis,
/// plain: larger loss higher up) and return loss (right axis, dashed) against a log frequency axis; the requested band
/// shaded lightly; the 1 dB (dotted) and 3 dB (dashed) edges of the first response as vertical lines; the spread of its
/// 3 dB edges over the AL and capacitance tolerance shaded. <see cref="ToJson"/> is what the browser module
/// <c>wwwroot/js/response-chart.js</c> draws.
/// </summary>
public sealed class ResponsePlot
{
    /// <summary>Line colours, one per response (the first is the plan).</summary>
    private static readonly string[] Palette = ["#1565c0", "#c62828", "#2e7d32", "#6a1b9a", "#ef6c00", "#00838f"];

    /// <summary>Colour of the edge lines and their labels (readable on light and dark backgrounds).</summary>
    private const string EdgeColour = "#808080";

    private static readonly JsonSerializerOptions JsonOptions = new(JsonSerializerDefaults.Web)
    {
        Converters = { new JsonStringEnumConverter(JsonNamingPolicy.CamelCase) },
    };

    private ResponsePlot(
        IReadOnlyList<double> frequenciesHz,
        IReadOnlyList<PlotSeries> series,
        PlotSpan band,
        IReadOnlyList<PlotSpan> spreads,
        IReadOnlyList<PlotEdge> edges)
    {
        FrequenciesHz = frequenciesHz;
        Series = series;
        Band = band;
        Spreads = spreads;
        Edges = edges;
    }

    /// <summary>The frequencies, Hz, ascending: every response's sweep frequencies (one list when they agree).</summary>
    public IReadOnlyList<double> FrequenciesHz { get; }

    /// <summary>The lines: per response, insertion loss then return loss.</summary>
    public IReadOnlyList<PlotSeries> Series { get; }

    /// <summary>The requested band, shaded.</summary>
    public PlotSpan Band { get; }

    /// <summary>The spread of the first response's 3 dB edges over the tolerance, shaded (none, one or two ranges).</summary>
    public IReadOnlyList<PlotSpan> Spreads { get; }

    /// <summary>The first response's 1 dB and 3 dB edges that lie within its sweep.</summary>
    public IReadOnlyList<PlotEdge> Edges { get; }

    /// <summary>Title of the frequency axis.</summary>
    public string FrequencyTitle => "frequency";

    /// <summary>Title of the left axis.</summary>
    public string LeftTitle => "insertion loss (dB)";

    /// <summary>Title of the right axis.</summary>
    public string RightTitle => "return loss (dB)";

    /// <summary>The plot as one compact JSON object (camelCase names; enum values as camelCase strings; null for a missing value).</summary>
    public string ToJson() => JsonSerializer.Serialize(this, JsonOptions);

    /// <summary>Builds the plot.</summary>
    /// <param name="responses">Named responses; the first is the plan, its edges and tolerance are marked; at least one.</param>
    /// <param name="minFrequencyHz">Lower end of the requested band, Hz (positive, finite).</param>
    /// <param name="maxFrequencyHz">Upper end of the requested band, Hz (above <paramref name="minFrequencyHz"/>, finite).</param>
    public static ResponsePlot For(IReadOnlyList<(string Name, ResponseEvaluation Response)> responses, double minFrequencyHz, double maxFrequencyHz)
    {
        ArgumentNullException.ThrowIfNull(responses);
        if (responses.Count == 0)
        {
            throw new ArgumentOutOfRangeException(nameof(responses), "At least one response is needed.");
        }

        if (!double.IsFinite(minFrequencyHz) || minFrequencyHz <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(minFrequencyHz), minFrequencyHz, "Must be positive and finite.");
        }

        if (!double.IsFinite(maxFrequencyHz) || maxFrequencyHz <= minFrequencyHz)
        {
            throw new ArgumentOutOfRangeException(nameof(maxFrequencyHz), maxFrequencyHz, "Must be finite and above minFrequencyHz.");
        }

        foreach (var (_, response) in responses)
        {
            ArgumentNullException.ThrowIfNull(response);
        }

        var (frequencies, shared) = Frequencies(responses);
        var series = new List<PlotSeries>();
        for (var i = 0; i < responses.Count; i++)
        {
            var (name, response) = responses[i];
            var colour = Palette[i % Palette.Length];
            var insertion = Align(response, frequencies, shared, p => p.InsertionLossDb);
            var returnLoss = Align(response, frequencies, shared, p => p.ReturnLossDb);
            series.Add(new PlotSeries($"{name} · insertion loss", colour, 2, LineDash.Solid, PlotAxis.Left, "dB", 2, !shared, insertion));
            series.Add(new PlotSeries($"{name} · return loss", colour, 1.5, LineDash.Dash, PlotAxis.Right, "dB", 1, !shared, returnLoss));
        }

        var plan = responses[0].Response;
        var band = new PlotSpan(minFrequencyHz, maxFrequencyHz, "rgba(46, 125, 50, 0.10)", "requested band");
        var spreads = new List<PlotSpan>();
        var spread = plan.Tolerance;
        if (spread.LowerCutoffMinHz is double lowMin && spread.LowerCutoffMaxHz is double lowMax && lowMax > lowMin)
        {
            spreads.Add(new PlotSpan(lowMin, lowMax, "rgba(198, 40, 40, 0.12)", "3 dB edge spread"));
        }

        if (spread.UpperCutoffMinHz is double highMin && spread.UpperCutoffMaxHz is double highMax && highMax > highMin)
        {
            spreads.Add(new PlotSpan(highMin, highMax, "rgba(198, 40, 40, 0.12)", "3 dB edge spread"));
        }

        var edges = new List<PlotEdge>();
        AddEdge(edges, plan.Band.Lower1DbHz, LineDash.Dot, "1 dB");
        AddEdge(edges, plan.Band.Upper1DbHz, LineDash.Dot, "1 dB");
        AddEdge(edges, plan.Band.LowerCutoffHz, LineDash.Dash, "3 dB");
        AddEdge(edges, plan.Band.UpperCutoffHz, LineDash.Dash, "3 dB");
        return new ResponsePlot(frequencies, series, band, spreads, edges);
    }

    /// <summary>
    /// The first response's frequencies when every response has the same ones (shared), otherwise all of them, ascending.
    /// </summary>
    private static (List<double> Frequencies, bool Shared) Frequencies(IReadOnlyList<(string Name, ResponseEvaluation Response)> responses)
    {
        var first = responses[0].Response.Sweep.Select(p => p.FrequencyHz).ToList();
        var shared = IsAscending(first) && responses.All(r => r.Response.Sweep.Select(p => p.FrequencyHz).SequenceEqual(first));
        return shared
            ? (first, true)
            : (responses.SelectMany(r => r.Response.Sweep.Select(p => p.FrequencyHz)).Where(f => double.IsFinite(f) && f > 0).Distinct().Order().ToList(), false);
    }

    private static bool IsAscending(List<double> values)
    {
        if (values.Count > 0 && !(double.IsFinite(values[0]) && values[0] > 0))
        {
            return false;
        }

        for (var i = 1; i < values.Count; i++)
        {
            if (!(values[i] > values[i - 1]))
            {
                return false;
            }
        }

        return double.IsFinite(values.Count > 0 ? values[^1] : 1);
    }

    /// <summary>The response's values at <paramref name="frequencies"/>: null where it has no point or the value is not finite.</summary>
    private static double?[] Align(ResponseEvaluation response, List<double> frequencies, bool shared, Func<CircuitPoint, double> value)
    {
        var values = new double?[frequencies.Count];
        var sweep = response.Sweep;
        if (shared)
        {
            for (var i = 0; i < values.Length; i++)
            {
                values[i] = Finite(value(sweep[i]));
            }

            return values;
        }

        var index = new Dictionary<double, int>(frequencies.Count);
        for (var i = 0; i < frequencies.Count; i++)
        {
            index[frequencies[i]] = i;
        }

        foreach (var point in sweep)
        {
            if (index.TryGetValue(point.FrequencyHz, out var at))
            {
                values[at] = Finite(value(point));
            }
        }

        return values;
    }

    private static double? Finite(double value) => double.IsFinite(value) ? value : null;

    private static void AddEdge(List<PlotEdge> edges, double? edgeHz, LineDash dash, string label)
    {
        if (edgeHz is double hz && double.IsFinite(hz) && hz > 0)
        {
            edges.Add(new PlotEdge(hz, dash, label, EdgeColour));
        }
    }
}
