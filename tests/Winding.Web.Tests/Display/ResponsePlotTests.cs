using System.Globalization;
using System.Numerics;
using Plotly.Blazor.LayoutLib;
using Plotly.Blazor.Traces;
using Winding.Core.Plans;
using Winding.Core.Response;
using Winding.Web.Display;

namespace Winding.Web.Tests.Display;

public sealed class ResponsePlotTests
{
    /// <summary>A plain band-pass circuit: 100 µH magnetising, 50 nH leakage, 20 pF each side, 50 Ω in and out.</summary>
    private static ResponseEvaluation Response(double magnetizingH = 100e-6)
    {
        var circuit = new EquivalentCircuit(50, 50, 20e-12, 20e-12, 50e-9, f => new Complex(0, 2 * Math.PI * f * magnetizingH), _ => 0.1);
        var sweep = FrequencySweep.Run(circuit, FrequencySweep.LogSpaced(1e3, 1e10, 141));
        var band = BandEdges.Find(circuit, sweep);
        var tolerance = new BandTolerance(band.LowerCutoffHz * 0.8, band.LowerCutoffHz * 1.25, band.UpperCutoffHz * 0.7, band.UpperCutoffHz * 1.3);
        return new ResponseEvaluation(circuit, new Dictionary<string, double>(), 1e6, sweep, band, tolerance);
    }

    private static double Number(object value) => Convert.ToDouble(value, CultureInfo.InvariantCulture);

    private static IEnumerable<Shape> Lines(ResponsePlot plot) => plot.Layout.Shapes.Where(s => s.Type == Plotly.Blazor.LayoutLib.ShapeLib.TypeEnum.Line);

    private static IEnumerable<Shape> Rects(ResponsePlot plot) => plot.Layout.Shapes.Where(s => s.Type == Plotly.Blazor.LayoutLib.ShapeLib.TypeEnum.Rect);

    [Fact]
    public void For_OneResponse_TracesCarryTheSweepsValues()
    {
        var response = Response();

        var plot = ResponsePlot.For([("plan", response)], 1e5, 1e8);

        Assert.Equal(2, plot.Data.Count);
        var insertion = Assert.IsType<Scatter>(plot.Data[0]);
        var returnLoss = Assert.IsType<Scatter>(plot.Data[1]);
        Assert.Equal(response.Sweep.Select(p => p.FrequencyHz), insertion.X.Select(Number));
        Assert.Equal(response.Sweep.Select(p => p.InsertionLossDb), insertion.Y.Select(Number));
        Assert.Equal(response.Sweep.Select(p => p.FrequencyHz), returnLoss.X.Select(Number));
        Assert.Equal(response.Sweep.Select(p => p.ReturnLossDb), returnLoss.Y.Select(Number));
        Assert.Equal("y2", returnLoss.YAxis);
        Assert.StartsWith("plan", insertion.Name, StringComparison.Ordinal);
        Assert.Contains("dB", insertion.HoverTemplate, StringComparison.Ordinal);
    }

    [Fact]
    public void For_FrequencyAxis_IsLogarithmic_WithAReadOutAcrossTraces()
    {
        var plot = ResponsePlot.For([("plan", Response())], 1e5, 1e8);

        Assert.Equal(Plotly.Blazor.LayoutLib.XAxisLib.TypeEnum.Log, plot.Layout.XAxis[0].Type);
        Assert.Equal(HoverModeEnum.XUnified, plot.Layout.HoverMode);
        Assert.Equal(2, plot.Layout.YAxis.Count);
    }

    [Fact]
    public void For_MarksTheFirstResponsesEdges_AndShadesBandAndSpread()
    {
        var response = Response();
        var band = response.Band;
        Assert.NotNull(band.Lower1DbHz);
        Assert.NotNull(band.Upper1DbHz);
        Assert.NotNull(band.LowerCutoffHz);
        Assert.NotNull(band.UpperCutoffHz);

        var plot = ResponsePlot.For([("plan", response), ("more turns", Response(400e-6))], 1e5, 1e8);

        var edges = Lines(plot).Select(s => Number(s.X0)).Order().ToList();
        Assert.Equal(new[] { band.LowerCutoffHz!.Value, band.Lower1DbHz!.Value, band.Upper1DbHz!.Value, band.UpperCutoffHz!.Value }, edges);
        Assert.All(Lines(plot), s => Assert.Equal(Number(s.X0), Number(s.X1)));
        var spans = Rects(plot).Select(s => (Number(s.X0), Number(s.X1))).ToList();
        Assert.Contains((1e5, 1e8), spans);
        Assert.Contains((response.Tolerance.LowerCutoffMinHz!.Value, response.Tolerance.LowerCutoffMaxHz!.Value), spans);
        Assert.Contains((response.Tolerance.UpperCutoffMinHz!.Value, response.Tolerance.UpperCutoffMaxHz!.Value), spans);
        Assert.Equal(4, plot.Data.Count);
        Assert.StartsWith("more turns", Assert.IsType<Scatter>(plot.Data[2]).Name, StringComparison.Ordinal);
    }

    [Fact]
    public void For_MissingEdgesAndSpread_AreLeftOut()
    {
        var response = Response() with
        {
            Band = new BandEdges(0.1, 1e6, null, null, null, null),
            Tolerance = new BandTolerance(null, null, null, null),
        };

        var plot = ResponsePlot.For([("plan", response)], 1e5, 1e8);

        Assert.Empty(Lines(plot));
        Assert.Single(Rects(plot));
    }

    [Theory]
    [InlineData(0, 1e6)]
    [InlineData(double.NaN, 1e6)]
    [InlineData(1e6, 1e6)]
    [InlineData(1e6, double.PositiveInfinity)]
    public void For_BadBand_Throws(double minHz, double maxHz)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => ResponsePlot.For([("plan", Response())], minHz, maxHz));
    }

    [Fact]
    public void For_NoResponses_Throws()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => ResponsePlot.For([], 1e5, 1e8));
    }
}
