using Plotly.Blazor;
using Plotly.Blazor.LayoutLib;
using Plotly.Blazor.Traces;
using Winding.Core.Plans;

namespace Winding.Web.Display;

/// <summary>
/// The frequency-response plot of one or more responses, as Plotly traces and layout: insertion loss (left axis, plain:
/// larger loss higher up) and return loss (right axis, dashed) against a log frequency axis; the requested band shaded
/// lightly; the 1 dB (dotted) and 3 dB (dashed) edges of the first response as vertical lines; the spread of its 3 dB
/// edges over the AL and capacitance tolerance shaded. Hovering reads out the frequency and every trace's value there.
/// </summary>
public sealed class ResponsePlot
{
    /// <summary>Line colours, one per response (the first is the plan).</summary>
    private static readonly string[] Palette = ["#1565c0", "#c62828", "#2e7d32", "#6a1b9a", "#ef6c00", "#00838f"];

    private ResponsePlot(IList<ITrace> data, Layout layout, Config config)
    {
        Data = data;
        Layout = layout;
        Config = config;
    }

    /// <summary>The traces: per response, insertion loss then return loss.</summary>
    public IList<ITrace> Data { get; }

    /// <summary>The layout: axes, shaded band, edge lines and tolerance spread.</summary>
    public Layout Layout { get; }

    /// <summary>The chart configuration (responsive, no logo).</summary>
    public Config Config { get; }

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

        var data = new List<ITrace>();
        for (var i = 0; i < responses.Count; i++)
        {
            var (name, response) = responses[i];
            ArgumentNullException.ThrowIfNull(response);
            var colour = Palette[i % Palette.Length];
            var frequencies = response.Sweep.Select(p => (object)p.FrequencyHz).ToList();
            data.Add(new Scatter
            {
                Name = $"{name} · insertion loss",
                Mode = Plotly.Blazor.Traces.ScatterLib.ModeFlag.Lines,
                X = frequencies,
                Y = response.Sweep.Select(p => (object)p.InsertionLossDb).ToList(),
                Line = new Plotly.Blazor.Traces.ScatterLib.Line { Color = colour, Width = 2 },
                HoverTemplate = "IL %{y:.2f} dB",
            });
            data.Add(new Scatter
            {
                Name = $"{name} · return loss",
                Mode = Plotly.Blazor.Traces.ScatterLib.ModeFlag.Lines,
                X = frequencies,
                Y = response.Sweep.Select(p => (object)p.ReturnLossDb).ToList(),
                YAxis = "y2",
                Line = new Plotly.Blazor.Traces.ScatterLib.Line { Color = colour, Width = 1.5m, Dash = "dash" },
                HoverTemplate = "RL %{y:.1f} dB",
            });
        }

        var plan = responses[0].Response;
        var shapes = new List<Shape> { Span(minFrequencyHz, maxFrequencyHz, "rgba(46, 125, 50, 0.10)", "requested band") };
        var spread = plan.Tolerance;
        if (spread.LowerCutoffMinHz is double lowMin && spread.LowerCutoffMaxHz is double lowMax && lowMax > lowMin)
        {
            shapes.Add(Span(lowMin, lowMax, "rgba(198, 40, 40, 0.12)", "3 dB edge spread"));
        }

        if (spread.UpperCutoffMinHz is double highMin && spread.UpperCutoffMaxHz is double highMax && highMax > highMin)
        {
            shapes.Add(Span(highMin, highMax, "rgba(198, 40, 40, 0.12)", "3 dB edge spread"));
        }

        AddEdge(shapes, plan.Band.Lower1DbHz, "dot", "1 dB");
        AddEdge(shapes, plan.Band.Upper1DbHz, "dot", "1 dB");
        AddEdge(shapes, plan.Band.LowerCutoffHz, "dash", "3 dB");
        AddEdge(shapes, plan.Band.UpperCutoffHz, "dash", "3 dB");

        var layout = new Layout
        {
            Height = 420,
            Margin = new Margin { L = 60, R = 60, T = 20, B = 50 },
            HoverMode = HoverModeEnum.XUnified,
            XAxis =
            [
                new XAxis
                {
                    Type = Plotly.Blazor.LayoutLib.XAxisLib.TypeEnum.Log,
                    Title = new Plotly.Blazor.LayoutLib.XAxisLib.Title { Text = "frequency" },
                    TickFormat = "~s",
                    TickSuffix = "Hz",
                    ExponentFormat = Plotly.Blazor.LayoutLib.XAxisLib.ExponentFormatEnum.SI,
                    HoverFormat = ".4s", // the unified read-out's heading, e.g. "7.348MHz"
                    ShowGrid = true,
                },
            ],
            YAxis =
            [
                new YAxis
                {
                    Title = new Plotly.Blazor.LayoutLib.YAxisLib.Title { Text = "insertion loss (dB)" },
                    RangeMode = Plotly.Blazor.LayoutLib.YAxisLib.RangeModeEnum.ToZero,
                },
                new YAxis
                {
                    Title = new Plotly.Blazor.LayoutLib.YAxisLib.Title { Text = "return loss (dB)" },
                    Overlaying = "y",
                    Side = Plotly.Blazor.LayoutLib.YAxisLib.SideEnum.Right,
                    RangeMode = Plotly.Blazor.LayoutLib.YAxisLib.RangeModeEnum.ToZero,
                    ShowGrid = false,
                },
            ],
            Shapes = shapes,
            Legend = [new Legend { Orientation = Plotly.Blazor.LayoutLib.LegendLib.OrientationEnum.H, Y = -0.2m }],
        };
        var config = new Config { Responsive = true, DisplayLogo = false };
        return new ResponsePlot(data, layout, config);
    }

    private static Shape Span(double fromHz, double toHz, string fill, string name) => new()
    {
        Type = Plotly.Blazor.LayoutLib.ShapeLib.TypeEnum.Rect,
        Name = name,
        XRef = "x",
        YRef = "paper",
        X0 = fromHz,
        X1 = toHz,
        Y0 = 0,
        Y1 = 1,
        FillColor = fill,
        Line = new Plotly.Blazor.LayoutLib.ShapeLib.Line { Width = 0 },
        Layer = Plotly.Blazor.LayoutLib.ShapeLib.LayerEnum.Below,
    };

    private static void AddEdge(List<Shape> shapes, double? edgeHz, string dash, string label)
    {
        if (edgeHz is not double hz)
        {
            return;
        }

        shapes.Add(new Shape
        {
            Type = Plotly.Blazor.LayoutLib.ShapeLib.TypeEnum.Line,
            Name = label + " edge",
            XRef = "x",
            YRef = "paper",
            X0 = hz,
            X1 = hz,
            Y0 = 0,
            Y1 = 1,
            Line = new Plotly.Blazor.LayoutLib.ShapeLib.Line { Color = "#424242", Width = 1, Dash = dash },
            Label = new Plotly.Blazor.LayoutLib.ShapeLib.Label { Text = label, TextPosition = Plotly.Blazor.LayoutLib.ShapeLib.LabelLib.TextPositionEnum.End },
        });
    }
}
