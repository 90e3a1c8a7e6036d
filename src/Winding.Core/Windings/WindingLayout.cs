using Winding.Core.Geometry;
using Winding.Core.Plans;
using Winding.Core.Quantities;

namespace Winding.Core.Windings;

/// <summary>
/// Places the windings of a plan on a (stacked) core in winding order and returns each one's fit.
/// <list type="bullet">
/// <item>Ring cores (toroid, sleeve): layers on the inner circumference (<see cref="ToroidLayerFit"/>). A spread winding
/// goes over everything wound before it; a sector winding over whatever earlier winding overlaps its arc; "over"
/// takes the region of the named winding; a bifilar pair is fitted as one winding whose turns take both wires' places.
/// A toroid's coating and each winding's insulation wrap add to the build under it.</item>
/// <item>Two-hole cores: every turn passes once through each hole; the bundle's overall area (all windings so far) is
/// compared with the hole area times a packing factor of 0.6, the share of a round hole that hand-laid round wires fill
/// (common practice, no source); tight above 0.45. Mean turn length 2·(length + hole spacing) + 2π·t.</item>
/// <item>Bobbins: ⌊breadth/(n·d)⌋ turns per layer, layers stacked over earlier windings and wraps; fits while the build
/// stays within the window height; mean turn length of a layer = leg perimeter + 2π·(wall + build below + (k − ½)·d).</item>
/// </list>
/// Any winding that fits is still "tight" when the copper of all windings so far fills more than 0.4 of the window —
/// the practical utilisation of hand winding (McLyman's K_u ≈ 0.4; common practice).
/// </summary>
public static class WindingLayout
{
    /// <summary>Share of a two-hole core's hole that hand-laid round wires can fill (common practice, no source).</summary>
    public const double TwoHolePackingFactor = 0.6;

    /// <summary>Copper fill of the window above which hand winding is called tight (McLyman K_u ≈ 0.4; common practice).</summary>
    public const double HandWindingUtilisation = 0.4;

    /// <summary>Places <paramref name="windings"/> on <paramref name="shape"/> (already stacked).</summary>
    public static IReadOnlyList<WindingFit> Place(CoreShape shape, IReadOnlyList<WindingSpec> windings)
    {
        ArgumentNullException.ThrowIfNull(shape);
        ArgumentNullException.ThrowIfNull(windings);
        var fits = shape switch
        {
            ToroidCore toroid => PlaceOnRing(
                toroid.InnerDiameter.Metres,
                toroid.OuterDiameter.Metres - toroid.InnerDiameter.Metres + 2 * toroid.Height.Metres,
                toroid.CoatingThickness.Metres,
                windings),
            SleeveCore sleeve => PlaceOnRing(
                sleeve.BoreDiameter.Metres,
                sleeve.OuterDiameter.Metres - sleeve.BoreDiameter.Metres + 2 * sleeve.Length.Metres,
                0,
                windings),
            TwoHoleCore twoHole => PlaceThroughTwoHoles(twoHole, windings),
            BobbinCore bobbin => PlaceOnBobbin(bobbin, windings),
            _ => throw new ArgumentOutOfRangeException(nameof(shape), shape, "Unknown core shape."),
        };
        return ApplyUtilisation(shape, windings, fits);
    }

    private static WindingFit[] PlaceOnRing(double holeM, double perimeterM, double coatingM, IReadOnlyList<WindingSpec> windings)
    {
        var fits = new WindingFit[windings.Count];
        var regions = new List<(double Start, double End, double TopM)>();
        for (var i = 0; i < windings.Count; i++)
        {
            var spec = windings[i];
            if (spec.Placement.Kind == PlacementKind.Bifilar && spec.Placement.OtherWinding < i)
            {
                fits[i] = fits[spec.Placement.OtherWinding];
                continue;
            }

            var (start, end) = PlacementRegion.Of(windings, i);
            var below = coatingM;
            foreach (var region in regions.Where(r => r.Start < end && start < r.End))
            {
                below = Math.Max(below, region.TopM);
            }

            var partners = Group(windings, i);
            below += partners.Sum(p => p.Wrap?.Thickness.Metres ?? 0);
            var elementM = partners.Max(p => p.Wire.ElementOverallDiameter.Metres);
            var places = partners.Sum(p => p.Wire.ElementsInHand);
            var arc = end - start;
            var layers = ToroidLayerFit.Layers(holeM, perimeterM, below, elementM, places, arc, spec.Turns);
            var breadthM = Math.PI * Math.Max(layers.StartHoleDiameterM, elementM) * arc / 360;
            var fit = layers.ToFit(below, breadthM, spec.Turns, elementM);
            fits[i] = fit;
            regions.Add((start, end, below + fit.BuildThicknessM));
        }

        return fits;
    }

    private static WindingFit[] PlaceThroughTwoHoles(TwoHoleCore core, IReadOnlyList<WindingSpec> windings)
    {
        var fits = new WindingFit[windings.Count];
        var holeAreaM2 = core.WindowAreaM2;
        var limitM2 = TwoHolePackingFactor * holeAreaM2;
        var usedM2 = 0.0;
        var wrapsM = 0.0;
        for (var i = 0; i < windings.Count; i++)
        {
            var spec = windings[i];
            if (spec.Placement.Kind == PlacementKind.Bifilar && spec.Placement.OtherWinding < i)
            {
                fits[i] = fits[spec.Placement.OtherWinding];
                continue;
            }

            var partners = Group(windings, i);
            wrapsM += partners.Sum(p => p.Wrap?.Thickness.Metres ?? 0);
            var perTurnM2 = partners.Sum(p => p.Wire.OverallAreaM2);
            var elementM = partners.Max(p => p.Wire.ElementOverallDiameter.Metres);
            var room = Math.Max(0, (limitM2 - usedM2) / perTurnM2);
            var placed = (int)Math.Min(spec.Turns, Math.Floor(room + 1e-9));
            var unplaced = spec.Turns - placed;
            var buildBelowM = wrapsM + Math.Sqrt(usedM2 / Math.PI);
            usedM2 += placed * perTurnM2;
            var bundleThicknessM = Math.Sqrt(usedM2 / Math.PI) - Math.Sqrt(Math.Max(0, usedM2 - placed * perTurnM2) / Math.PI);
            var mltM = 2 * (core.Length.Metres + core.HoleSpacing.Metres) + 2 * Math.PI * (buildBelowM + elementM / 2);
            var freeDiameterM = Math.Sqrt(Math.Max(0, holeAreaM2 - usedM2) * 4 / Math.PI);
            var share = usedM2 / holeAreaM2;
            var (outcome, reason) = unplaced > 0
                ? (FitOutcome.DoesNotFit, FormattableString.Invariant($"Only {placed} of {spec.Turns} turns pass through the holes: the wires would fill more than {TwoHolePackingFactor:0.##} of each hole."))
                : share > 0.75 * TwoHolePackingFactor
                    ? (FitOutcome.Tight, FormattableString.Invariant($"The wires fill {share:0.00} of each hole; above {0.75 * TwoHolePackingFactor:0.00} the last passes are hard to pull through."))
                    : (FitOutcome.Fits, FormattableString.Invariant($"The wires fill {share:0.00} of each hole."));
            fits[i] = new WindingFit(
                placed > 0 ? [placed] : [],
                unplaced,
                placed > 0 ? [mltM] : [],
                mltM,
                buildBelowM,
                bundleThicknessM,
                Length.FromMetres(freeDiameterM),
                null,
                Math.PI * core.HoleDiameter.Metres,
                outcome,
                reason,
                "one bundle through each hole, compared with the hole area");
        }

        return fits;
    }

    private static WindingFit[] PlaceOnBobbin(BobbinCore core, IReadOnlyList<WindingSpec> windings)
    {
        var fits = new WindingFit[windings.Count];
        var breadthM = core.WindowBreadth.Metres;
        var heightM = core.WindowHeight.Metres;
        var belowM = 0.0;
        for (var i = 0; i < windings.Count; i++)
        {
            var spec = windings[i];
            if (spec.Placement.Kind == PlacementKind.Bifilar && spec.Placement.OtherWinding < i)
            {
                fits[i] = fits[spec.Placement.OtherWinding];
                continue;
            }

            var partners = Group(windings, i);
            belowM += partners.Sum(p => p.Wrap?.Thickness.Metres ?? 0);
            var dM = partners.Max(p => p.Wire.ElementOverallDiameter.Metres);
            var places = partners.Sum(p => p.Wire.ElementsInHand);
            var perLayerCapacity = (int)Math.Min(int.MaxValue, Math.Floor(breadthM / (dM * places) + 1e-9));
            var availableLayers = (int)Math.Max(0, Math.Floor((heightM - belowM) / dM + 1e-9));
            var perLayer = new List<int>();
            var lengths = new List<double>();
            var remaining = spec.Turns;
            double weightedM = 0;
            for (var k = 1; perLayerCapacity > 0 && remaining > 0 && k <= availableLayers; k++)
            {
                var placed = Math.Min(perLayerCapacity, remaining);
                var mltM = core.Leg.PerimeterM + 2 * Math.PI * (core.BobbinWall.Metres + belowM + (k - 0.5) * dM);
                perLayer.Add(placed);
                lengths.Add(mltM);
                weightedM += placed * mltM;
                remaining -= placed;
            }

            var placedTurns = spec.Turns - remaining;
            var thicknessM = perLayer.Count * dM;
            var leftM = Math.Max(0, heightM - belowM - thicknessM);
            var meanM = placedTurns > 0 ? weightedM / placedTurns : core.Leg.PerimeterM + 2 * Math.PI * (core.BobbinWall.Metres + belowM + dM / 2);
            var (outcome, reason) = remaining > 0
                ? (FitOutcome.DoesNotFit, perLayerCapacity < 1
                    ? FormattableString.Invariant($"The wire is wider than the bobbin breadth ({breadthM * 1e3:0.##} mm).")
                    : FormattableString.Invariant($"Only {placedTurns} of {spec.Turns} turns fit: {perLayerCapacity} per layer, and the window height allows {Math.Max(0, availableLayers)} layer{(availableLayers == 1 ? string.Empty : "s")}."))
                : leftM < 0.1 * heightM
                    ? (FitOutcome.Tight, FormattableString.Invariant($"Only {leftM * 1e3:0.##} mm of window height is left: under a tenth of the window, little room for tape and finishing."))
                    : (FitOutcome.Fits, FormattableString.Invariant($"{perLayer.Count} layer{(perLayer.Count == 1 ? string.Empty : "s")} of up to {perLayerCapacity}, {leftM * 1e3:0.##} mm of window height left."));
            fits[i] = new WindingFit(perLayer, remaining, lengths, meanM, belowM, thicknessM, null, leftM, breadthM, outcome, reason, "layers across the bobbin breadth");
            belowM += thicknessM;
        }

        return fits;
    }

    private static WindingFit[] ApplyUtilisation(CoreShape shape, IReadOnlyList<WindingSpec> windings, WindingFit[] fits)
    {
        var copperM2 = 0.0;
        for (var i = 0; i < windings.Count; i++)
        {
            copperM2 += windings[i].Turns * windings[i].Wire.ConductorAreaM2;
            var share = copperM2 / shape.WindowAreaM2;
            if (fits[i].Outcome == FitOutcome.Fits && share > HandWindingUtilisation && shape is not TwoHoleCore)
            {
                fits[i] = fits[i] with
                {
                    Outcome = FitOutcome.Tight,
                    Reason = FormattableString.Invariant($"Copper fills {share:0.00} of the window, above the {HandWindingUtilisation:0.0} that hand winding reaches in practice."),
                };
            }
        }

        return fits;
    }

    /// <summary>The winding and any later windings wound bifilar with it.</summary>
    private static List<WindingSpec> Group(IReadOnlyList<WindingSpec> windings, int index)
    {
        var group = new List<WindingSpec> { windings[index] };
        for (var j = index + 1; j < windings.Count; j++)
        {
            if (windings[j].Placement.Kind == PlacementKind.Bifilar && windings[j].Placement.OtherWinding == index)
            {
                group.Add(windings[j]);
            }
        }

        return group;
    }
}
