using Winding.Core.Geometry;
using Winding.Core.Quantities;
using Winding.Core.Windings;
using Winding.Core.Wire;

namespace Winding.Core.Tests.Windings;

/// <summary>
/// Layer-by-layer fit in a toroid's hole. The convention — layer k holds ⌊π·(ID − (2k−1)·d)/d⌋ turns — is common
/// practice, no source; the expected turns per layer were computed independently by the arc method in
/// physics-sources.md §11 (script t11_fill.py), which also gives the exact touching-circle (chord) count for comparison.
/// </summary>
public sealed class ToroidLayerFitTests
{
    [Theory]
    // ID (mm), overall wire diameter (mm), expected turns in layers 1..4 (physics-sources.md §11, arc column)
    [InlineData(5, 0.226, new[] { 66, 60, 53, 47 })]
    [InlineData(10, 0.544, new[] { 54, 48, 42, 35 })]
    [InlineData(10, 1.062, new[] { 26, 20, 13, 7 })]
    [InlineData(15, 0.349, new[] { 131, 125, 119, 113 })]
    [InlineData(5, 0.566, new[] { 24, 18, 12, 5 })]
    public void Fit_FullLayers_MatchCheckValues(double idMm, double wireMm, int[] expected)
    {
        var core = Core(idMm * 2, idMm, 5);
        var wire = WindingWire.Solid(Length.FromMillimetres(wireMm * 0.9), Length.FromMillimetres(wireMm));

        var fit = ToroidLayerFit.Fit(core, core.InnerDiameter, wire, expected.Sum());

        Assert.True(fit.Fits);
        Assert.Equal(expected, fit.TurnsPerLayer);
        Assert.Equal(idMm - 2 * 4 * wireMm, fit.RemainingHoleDiameter!.Value.Millimetres, 9);
    }

    [Fact]
    public void Fit_OneTurnMoreThanTheHoleHolds_DoesNotFit()
    {
        // ID 5 mm with 0.566 mm wire: 24 + 18 + 12 + 5 = 59 turns, and a fifth layer has no room (5 − 9·0.566 < 0).
        var core = Core(10, 5, 4);
        var wire = WindingWire.Solid(Length.FromMillimetres(0.5), Length.FromMillimetres(0.566));

        var fit = ToroidLayerFit.Fit(core, core.InnerDiameter, wire, 60);

        Assert.False(fit.Fits);
        Assert.Equal(1, fit.UnplacedTurns);
        Assert.Equal(4, fit.Layers);
    }

    [Fact]
    public void Fit_WireThickerThanTheHole_PlacesNothing()
    {
        var core = Core(10, 2, 4);
        var wire = WindingWire.Solid(Length.FromMillimetres(2.5), Length.FromMillimetres(2.6));

        var fit = ToroidLayerFit.Fit(core, core.InnerDiameter, wire, 1);

        Assert.False(fit.Fits);
        Assert.Empty(fit.TurnsPerLayer);
        Assert.Equal(2, fit.RemainingHoleDiameter!.Value.Millimetres, 9);
    }

    [Fact]
    public void MeanTurnLength_FirstLayerOnRing10x5x4_MatchesCheckValue()
    {
        // physics-sources.md §11: MLT of the first layer = (OD − ID) + 2H + π·d_o = 13.71 mm for d_o = 0.226 mm.
        var core = Core(10, 5, 4);
        var wire = WindingWire.Solid(Length.FromMillimetres(0.2), Length.FromMillimetres(0.226));

        var fit = ToroidLayerFit.Fit(core, core.InnerDiameter, wire, 20);

        Assert.Equal(13.71, fit.MeanTurnLengthM * 1e3, 2);
    }

    [Fact]
    public void Fit_SecondWindingStartsInTheHoleTheFirstLeft()
    {
        // The second winding's first layer lies on a circle 2·d₁ smaller, with the same convention (common practice).
        var core = Core(20, 10, 5);
        var wire = WindingWire.Solid(Length.FromMillimetres(0.5), Length.FromMillimetres(0.544));
        var first = ToroidLayerFit.Fit(core, core.InnerDiameter, wire, 10);

        var second = ToroidLayerFit.Fit(core, first.RemainingHoleDiameter!.Value, wire, 100);

        Assert.Equal(48, second.TurnsPerLayer[0]);
        Assert.Equal(first.LayerMeanTurnLengthsM[0] + 2 * Math.PI * 0.544e-3, second.LayerMeanTurnLengthsM[0], 12);
    }

    private static ToroidCore Core(double odMm, double idMm, double hMm) =>
        ToroidCore.Create(Length.FromMillimetres(odMm), Length.FromMillimetres(idMm), Length.FromMillimetres(hMm));
}
