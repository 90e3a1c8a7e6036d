using System.Numerics;
using System.Text.Json;
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

    [Fact]
    public void For_OneResponse_SeriesCarryTheSweepsValues()
    {
        var response = Response();

        var plot = ResponsePlot.For([("plan", response)], 1e5, 1e8);

        Assert.Equal(response.Sweep.Select(p => p.FrequencyHz), plot.FrequenciesHz);
        Assert.Equal(2, plot.Series.Count);
        var insertion = plot.Series[0];
        var returnLoss = plot.Series[1];
        Assert.Equal(response.Sweep.Select(p => (double?)p.InsertionLossDb), insertion.Values);
        Assert.Equal(response.Sweep.Select(p => (double?)p.ReturnLossDb), returnLoss.Values);
        Assert.Equal((PlotAxis.Left, LineDash.Solid), (insertion.Axis, insertion.Dash));
        Assert.Equal((PlotAxis.Right, LineDash.Dash), (returnLoss.Axis, returnLoss.Dash));
        Assert.Equal("dB", insertion.Unit);
        Assert.False(insertion.SpansGaps);
        Assert.StartsWith("plan", insertion.Name, StringComparison.Ordinal);
        Assert.Equal(insertion.Colour, returnLoss.Colour);
    }

    [Fact]
    public void ToJson_CarriesTheSeriesAndMarks_WithNullForValuesNotFinite()
    {
        var response = Response();
        var sweep = response.Sweep.ToArray();
        sweep[3] = sweep[3] with { InsertionLossDb = double.PositiveInfinity, ReturnLossDb = double.NaN };

        var plot = ResponsePlot.For([("plan", response with { Sweep = sweep })], 1e5, 1e8);
        using var json = JsonDocument.Parse(plot.ToJson());
        var root = json.RootElement;

        Assert.Equal(sweep.Length, root.GetProperty("frequenciesHz").GetArrayLength());
        var series = root.GetProperty("series");
        Assert.Equal(2, series.GetArrayLength());
        Assert.Equal(JsonValueKind.Null, series[0].GetProperty("values")[3].ValueKind);
        Assert.Equal(JsonValueKind.Null, series[1].GetProperty("values")[3].ValueKind);
        Assert.Equal(sweep[4].InsertionLossDb, series[0].GetProperty("values")[4].GetDouble());
        Assert.Equal("right", series[1].GetProperty("axis").GetString());
        Assert.Equal("dash", series[1].GetProperty("dash").GetString());
        Assert.Equal(1e5, root.GetProperty("band").GetProperty("fromHz").GetDouble());
        Assert.Equal(4, root.GetProperty("edges").GetArrayLength());
        Assert.Equal("frequency", root.GetProperty("frequencyTitle").GetString());
        Assert.Equal("insertion loss (dB)", root.GetProperty("leftTitle").GetString());
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

        var edges = plot.Edges.Select(e => e.FrequencyHz).Order().ToList();
        Assert.Equal(new[] { band.LowerCutoffHz!.Value, band.Lower1DbHz!.Value, band.Upper1DbHz!.Value, band.UpperCutoffHz!.Value }, edges);
        Assert.Equal(2, plot.Edges.Count(e => e.Dash == LineDash.Dot && e.Label == "1 dB"));
        Assert.Equal(2, plot.Edges.Count(e => e.Dash == LineDash.Dash && e.Label == "3 dB"));
        Assert.Equal((1e5, 1e8), (plot.Band.FromHz, plot.Band.ToHz));
        var spans = plot.Spreads.Select(s => (s.FromHz, s.ToHz)).ToList();
        Assert.Contains((response.Tolerance.LowerCutoffMinHz!.Value, response.Tolerance.LowerCutoffMaxHz!.Value), spans);
        Assert.Contains((response.Tolerance.UpperCutoffMinHz!.Value, response.Tolerance.UpperCutoffMaxHz!.Value), spans);
        Assert.Equal(4, plot.Series.Count);
        Assert.StartsWith("more turns", plot.Series[2].Name, StringComparison.Ordinal);
        Assert.NotEqual(plot.Series[0].Colour, plot.Series[2].Colour);
    }

    [Fact]
    public void For_VariantWithOtherFrequencies_IsAlignedOnAllFrequencies_AndSpansItsGaps()
    {
        var plan = Response();
        var variant = Response(400e-6);
        var fewer = variant with { Sweep = variant.Sweep.Where((_, i) => i % 2 == 0).ToArray() };

        var plot = ResponsePlot.For([("plan", plan), ("variant", fewer with { Sweep = [.. fewer.Sweep, plan.Sweep[^1] with { FrequencyHz = 2e10 }] })], 1e5, 1e8);

        Assert.Equal(plan.Sweep.Count + 1, plot.FrequenciesHz.Count);
        Assert.Equal(plot.FrequenciesHz.Order(), plot.FrequenciesHz);
        Assert.Equal(plan.Sweep.Select(p => (double?)p.InsertionLossDb), plot.Series[0].Values.Take(plan.Sweep.Count));
        Assert.Null(plot.Series[0].Values[^1]);
        Assert.Null(plot.Series[2].Values[1]);
        Assert.Equal(variant.Sweep[2].InsertionLossDb, plot.Series[2].Values[2]);
        Assert.All(plot.Series, s => Assert.True(s.SpansGaps));
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

        Assert.Empty(plot.Edges);
        Assert.Empty(plot.Spreads);
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
