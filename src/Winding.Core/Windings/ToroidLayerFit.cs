using Winding.Core.Geometry;
using Winding.Core.Quantities;
using Winding.Core.Wire;

namespace Winding.Core.Windings;

/// <summary>
/// Layer-by-layer fit of a winding through the hole of a toroid, with turns touching on the inner circumference
/// (common practice, no source):
/// <list type="bullet">
/// <item>layer j of a winding that starts at hole diameter D0 holds ⌊π·(D0 − (2j − 1)·d)/d⌋ turns of overall wire
/// diameter d (the arc length of the circle through the wire centres divided by d); for the first winding D0 = ID, which
/// is the convention ⌊π·(ID − (2k − 1)·d)/d⌋; with n elements in hand a turn takes n of those places;</item>
/// <item>the hole left is D0 − 2·layers·d;</item>
/// <item>the mean turn length of a layer whose wire centres lie t above the core surface is the perimeter of the core's
/// cross-section grown by t: (OD − ID) + 2·h + 2π·t, with t = (ID − D0)/2 + (j − ½)·d; for the first winding this is
/// (OD − ID) + 2·h + 2π·(k − ½)·d.</item>
/// </list>
/// The inner circumference is the limit; the outside of the ring has more room. Each further layer loses about 2π turns.
/// </summary>
public static class ToroidLayerFit
{
    /// <summary>Upper bound on layers examined; far beyond anything that can be wound by hand.</summary>
    private const int MaximumLayers = 10_000;

    /// <summary>Fits <paramref name="turns"/> turns of <paramref name="wire"/> on <paramref name="core"/>.</summary>
    /// <param name="core">The toroid (already stacked if several cores are wound as one).</param>
    /// <param name="startHoleDiameter">The hole diameter D0 left by the windings already on the core (ID for the first).</param>
    /// <param name="wire">The wire; its overall diameter sets the fit.</param>
    /// <param name="turns">Number of turns, at least 1.</param>
    public static LayerFit Fit(ToroidCore core, Length startHoleDiameter, WindingWire wire, int turns)
    {
        ArgumentNullException.ThrowIfNull(core);
        ArgumentNullException.ThrowIfNull(wire);
        ArgumentOutOfRangeException.ThrowIfLessThan(turns, 1);
        if (startHoleDiameter > core.InnerDiameter || startHoleDiameter.Metres < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(startHoleDiameter), startHoleDiameter, "The start hole must lie between zero and the inner diameter.");
        }

        var dM = wire.ElementOverallDiameter.Metres;
        var inHand = wire.ElementsInHand;
        var d0M = startHoleDiameter.Metres;
        var buildBelowM = (core.InnerDiameter.Metres - d0M) / 2;
        var sectionPerimeterM = core.OuterDiameter.Metres - core.InnerDiameter.Metres + 2 * core.Height.Metres;

        var perLayer = new List<int>();
        var layerLengths = new List<double>();
        var remaining = turns;
        double weightedLengthM = 0;
        for (var j = 1; remaining > 0 && j <= MaximumLayers; j++)
        {
            var centreCircleM = d0M - (2 * j - 1) * dM;
            var positions = centreCircleM > 0 ? Math.Floor(Math.PI * centreCircleM / dM) : 0;
            var capacity = (int)Math.Min(int.MaxValue, Math.Floor(positions / inHand));
            if (capacity < 1)
            {
                break;
            }

            var placed = Math.Min(capacity, remaining);
            var layerLengthM = sectionPerimeterM + 2 * Math.PI * (buildBelowM + (j - 0.5) * dM);
            perLayer.Add(placed);
            layerLengths.Add(layerLengthM);
            weightedLengthM += placed * layerLengthM;
            remaining -= placed;
        }

        var placedTurns = turns - remaining;
        var holeLeftM = Math.Max(0, d0M - 2 * perLayer.Count * dM);
        var meanTurnLengthM = placedTurns > 0 ? weightedLengthM / placedTurns : sectionPerimeterM + 2 * Math.PI * (buildBelowM + dM / 2);
        return new LayerFit(
            perLayer,
            remaining,
            Length.FromMetres(holeLeftM),
            layerLengths,
            meanTurnLengthM,
            Length.FromMetres((d0M - holeLeftM) / 2));
    }
}
