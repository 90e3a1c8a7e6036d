using Winding.Core.Geometry;
using Winding.Core.Quantities;
using Winding.Core.Wire;

namespace Winding.Core.Windings;

/// <summary>
/// Layer-by-layer fit of a winding through the hole of a ring core (toroid or sleeve bore), with turns touching on the
/// inner circumference (common practice, no source):
/// <list type="bullet">
/// <item>layer j of a winding that starts at hole diameter D0 has ⌊π·(D0 − (2j − 1)·d)·(θ/360°)/d⌋ places for elements of
/// overall diameter d on an arc θ (θ = 360° when spread); with n elements in hand a turn takes n places. For the first
/// winding spread round a bare toroid this is the convention ⌊π·(ID − (2k − 1)·d)/d⌋;</item>
/// <item>the hole left is D0 − 2·layers·d;</item>
/// <item>the mean turn length of a layer whose element centres lie t above the core surface is the perimeter of the
/// core's cross-section grown by t: (OD − ID) + 2·h + 2π·t, with t = (build below) + (j − ½)·d; for the first winding on a
/// bare toroid this is (OD − ID) + 2·h + 2π·(k − ½)·d.</item>
/// </list>
/// The inner circumference is the limit; the outside of the ring has more room. Each further layer loses about 2π places.
/// </summary>
public static class ToroidLayerFit
{
    /// <summary>Upper bound on layers examined; far beyond anything that can be wound by hand.</summary>
    private const int MaximumLayers = 10_000;

    /// <summary>The raw layer arithmetic shared by toroids and sleeves.</summary>
    /// <param name="holeDiameterM">Inner diameter of the bare ring (ID or bore), m.</param>
    /// <param name="sectionPerimeterM">Perimeter of the bare cross-section, (OD − ID) + 2·h, m.</param>
    /// <param name="buildBelowM">Radial build already under this winding (coating, earlier windings, wrap), m.</param>
    /// <param name="elementDiameterM">Overall diameter of one element, m.</param>
    /// <param name="placesPerTurn">Elements side by side per turn (strands in hand, bifilar partners), ≥ 1.</param>
    /// <param name="arcDegrees">Arc of the circumference available (360 when spread).</param>
    /// <param name="turns">Turns to place, ≥ 1.</param>
    public static RingLayers Layers(double holeDiameterM, double sectionPerimeterM, double buildBelowM, double elementDiameterM, int placesPerTurn, double arcDegrees, int turns)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(placesPerTurn, 1);
        ArgumentOutOfRangeException.ThrowIfLessThan(turns, 1);
        if (!(elementDiameterM > 0) || !(arcDegrees > 0) || arcDegrees > 360)
        {
            throw new ArgumentOutOfRangeException(nameof(elementDiameterM), elementDiameterM, "Element diameter and arc must be positive (arc ≤ 360°).");
        }

        var d0M = holeDiameterM - 2 * buildBelowM;
        var arcFraction = arcDegrees / 360;
        var perLayer = new List<int>();
        var layerLengths = new List<double>();
        var remaining = turns;
        double weightedLengthM = 0;
        for (var j = 1; remaining > 0 && j <= MaximumLayers; j++)
        {
            var centreCircleM = d0M - (2 * j - 1) * elementDiameterM;
            var places = centreCircleM > 0 ? Math.Floor(Math.PI * centreCircleM * arcFraction / elementDiameterM) : 0;
            var capacity = (int)Math.Min(int.MaxValue, Math.Floor(places / placesPerTurn));
            if (capacity < 1)
            {
                break;
            }

            var placed = Math.Min(capacity, remaining);
            var layerLengthM = sectionPerimeterM + 2 * Math.PI * (buildBelowM + (j - 0.5) * elementDiameterM);
            perLayer.Add(placed);
            layerLengths.Add(layerLengthM);
            weightedLengthM += placed * layerLengthM;
            remaining -= placed;
        }

        var placedTurns = turns - remaining;
        var holeLeftM = Math.Max(0, d0M - 2 * perLayer.Count * elementDiameterM);
        var meanTurnLengthM = placedTurns > 0 ? weightedLengthM / placedTurns : sectionPerimeterM + 2 * Math.PI * (buildBelowM + elementDiameterM / 2);
        return new RingLayers(perLayer, remaining, layerLengths, meanTurnLengthM, Math.Max(0, d0M), holeLeftM);
    }

    /// <summary>
    /// Fits <paramref name="turns"/> turns of <paramref name="wire"/>, spread round a bare <paramref name="core"/>,
    /// starting in the hole <paramref name="startHoleDiameter"/> that earlier windings left (ID for the first).
    /// </summary>
    public static WindingFit Fit(ToroidCore core, Length startHoleDiameter, WindingWire wire, int turns)
    {
        ArgumentNullException.ThrowIfNull(core);
        ArgumentNullException.ThrowIfNull(wire);
        if (startHoleDiameter > core.InnerDiameter || startHoleDiameter.Metres < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(startHoleDiameter), startHoleDiameter, "The start hole must lie between zero and the inner diameter.");
        }

        var buildBelowM = (core.InnerDiameter.Metres - startHoleDiameter.Metres) / 2;
        var perimeterM = core.OuterDiameter.Metres - core.InnerDiameter.Metres + 2 * core.Height.Metres;
        var layers = Layers(core.InnerDiameter.Metres, perimeterM, buildBelowM, wire.ElementOverallDiameter.Metres, wire.ElementsInHand, 360, turns);
        return layers.ToFit(buildBelowM, Math.PI * startHoleDiameter.Metres, turns, wire.ElementOverallDiameter.Metres);
    }
}
