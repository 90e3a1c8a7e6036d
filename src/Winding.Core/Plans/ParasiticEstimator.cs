using System.Globalization;
using Winding.Core.Geometry;
using Winding.Core.Parasitics;
using Winding.Core.Windings;
using Winding.Core.Wire;

namespace Winding.Core.Plans;

/// <summary>
/// Estimates leakage inductance and capacitances from the physical build (<see cref="Parasitics"/> formulas), between
/// the first winding (the primary) and the last one, and each winding's self-capacitance; measured values replace the
/// estimates.
/// <list type="bullet">
/// <item>Overlaid windings: the 1-D MMF formula with b_w the mean circumference of the winding region on a ring core
/// (π·(ID + OD)/2 times the shared arc), the bobbin breadth on a bobbin, twice the block length on a two-hole core,
/// scaled by the larger share of it the two windings' conductors cover; a = each winding's build, c = the radial distance
/// between them. Expected within about ±30 % on bobbins, a rougher
/// estimate on rings (wedge-shaped layers) and two-hole cores.</item>
/// <item>Side-by-side sectors: each sector's air-cored inductance over its own arc (a derived estimate, within a factor
/// of about 3; measure it).</item>
/// <item>Bifilar pairs: the two-wire line inductance per metre times the pair's length (±30 %).</item>
/// <item>Interwinding capacitance: parallel plates over the shared area (mean turn length × shared breadth × the share
/// each winding's conductors cover) through both
/// enamels, the wraps between and the air a layer of round wires leaves, (1 − π/4)·r per face (plane geometry); bifilar
/// pairs as a two-wire line with ε_eff = (1 + ε_enamel)/2 (common practice, no source); sectors that do not overlap only
/// by the two end-turn pairs where they meet (2·C_tt). All ±30 % at best.</item>
/// <item>Self-capacitance: one layer by Massarini–Kazimierczuk (1997) C_tt — or, for turns spread more than 5 % apart,
/// the two-wire line capacitance in air between neighbours — with the ladder to a conductive core (MnZn class,
/// resistivity ≤ 100 Ω·m) or the neighbour chain otherwise; several layers by the energy method
/// (4/3)·C_l·(n − 1)/n² with C_l the layer-to-layer plate capacitance.</item>
/// </list>
/// Insulation permittivities (common practice, no source): enamel 3.5, hook-up insulation 3.0, Litz serving 3.5.
/// </summary>
public static class ParasiticEstimator
{
    /// <summary>Relative permittivity taken for enamel film.</summary>
    public const double EnamelPermittivity = 3.5;

    /// <summary>Relative permittivity taken for hook-up wire insulation.</summary>
    public const double HookUpPermittivity = 3.0;

    /// <summary>Accuracy taken for a measured leakage inductance: ±10 % (a repeat measurement; common practice, no source).</summary>
    public static EstimateAccuracy MeasuredAccuracy { get; } = EstimateAccuracy.PlusMinus(0.1);

    /// <summary>Resistivity at or below which a core counts as conductive for turn-to-core capacitance, Ω·m.</summary>
    public const double ConductiveCoreResistivityOhmM = 100;

    /// <summary>Estimates the parasitics of <paramref name="plan"/> given its windings' fits.</summary>
    public static ParasiticsEvaluation Estimate(TransformerPlan plan, IReadOnlyList<WindingFit> fits)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(fits);
        var shape = plan.Core.WoundGeometry;
        var al = plan.Core.InductanceFactor;
        var measured = new List<string>();
        if (plan.Core.MeasuredAl is not null)
        {
            measured.Add("al");
        }

        var conductive = plan.Core.Material.ResistivityOhmM is { } rho && rho <= ConductiveCoreResistivityOhmM;
        var selfCaps = new List<double>();
        var selfMethods = new List<string>();
        var resonances = new List<double?>();
        for (var i = 0; i < plan.Windings.Count; i++)
        {
            var spec = plan.Windings[i];
            double capacitanceF;
            string method;
            if (plan.Measured.SelfCapacitanceF(i) is { } measuredC)
            {
                capacitanceF = measuredC;
                method = "measured";
                measured.Add(Text($"selfCapacitance[{i}]"));
            }
            else
            {
                (capacitanceF, method) = SelfCapacitance(spec, fits[i], shape, conductive, PlacementRegion.ArcDegrees(plan.Windings, i));
            }

            selfCaps.Add(capacitanceF);
            selfMethods.Add(method);
            var inductanceH = al.InductanceH(spec.Turns);
            resonances.Add(capacitanceF > 0 ? 1 / (2 * Math.PI * Math.Sqrt(inductanceH * capacitanceF)) : null);
        }

        double leakageH = 0;
        var leakageMethod = "one winding: no leakage between windings";
        var leakageAccuracy = EstimateAccuracy.PlusMinus(0);
        double interwindingF = 0;
        var interwindingMethod = "one winding";
        var last = plan.Windings.Count - 1;
        if (last > 0)
        {
            if (plan.Measured.LeakageInductanceH is { } measuredL)
            {
                (leakageH, leakageMethod, leakageAccuracy) = (measuredL, "measured (primary with the last winding shorted; a repeat measurement within about ±10 %)", MeasuredAccuracy);
                measured.Add("leakageInductance");
            }
            else
            {
                (leakageH, leakageMethod, leakageAccuracy) = Leakage(plan, fits, shape, last);
            }

            if (plan.Measured.InterwindingCapacitanceF is { } measuredC)
            {
                (interwindingF, interwindingMethod) = (measuredC, "measured");
                measured.Add("interwindingCapacitance");
            }
            else
            {
                (interwindingF, interwindingMethod) = Interwinding(plan, fits, shape, last);
            }
        }

        double? transformerSrf = null;
        var n = (double)plan.Windings[last].Turns / plan.Windings[0].Turns;
        var shuntF = selfCaps[0] + (last > 0 ? selfCaps[last] * n * n + interwindingF * (1 - n) * (1 - n) : 0);
        if (shuntF > 0)
        {
            transformerSrf = 1 / (2 * Math.PI * Math.Sqrt(al.InductanceH(plan.Windings[0].Turns) * shuntF));
        }

        return new ParasiticsEvaluation(leakageH, leakageMethod, interwindingF, interwindingMethod, selfCaps, selfMethods, resonances, transformerSrf, measured)
        {
            LeakageAccuracy = leakageAccuracy,
        };
    }

    private static (double, string) SelfCapacitance(WindingSpec spec, WindingFit fit, CoreShape shape, bool conductive, double arcDegrees)
    {
        var (rcM, roM, eps) = Insulation(spec.Wire);
        var turnLengthM = fit.MeanTurnLengthM;
        if (fit.Layers <= 1)
        {
            var turns = spec.Turns * spec.Wire.ElementsInHand;
            var pitchM = fit.TurnsPerLayer.Count > 0 ? fit.BreadthM / (fit.TurnsPerLayer[0] * spec.Wire.ElementsInHand) : 2 * roM;
            if (pitchM > 1.05 * 2 * roM && turns > 1)
            {
                // Turns spread apart: neighbouring turns are a two-wire line in air rather than touching enamel.
                var spacedF = Capacitance.TwoWireLinePerMetreFPerM(pitchM, 2 * rcM, 1) * turnLengthM;
                return (Capacitance.SingleLayerSelfF(spacedF, turns, conductive),
                    "one layer, turns spread apart: neighbouring turns as a two-wire line in air, " + (conductive ? "ladder to a conductive core" : "neighbour chain (an underestimate)"));
            }

            var ctt = Capacitance.TurnToTurnF(rcM, roM, eps, turnLengthM);
            return (Capacitance.SingleLayerSelfF(ctt, Math.Max(1, turns), conductive),
                conductive
                    ? "one layer: Massarini–Kazimierczuk turn-to-turn capacitance, ladder to a conductive core (±30 %)"
                    : "one layer: Massarini–Kazimierczuk turn-to-turn capacitance, neighbour chain (an underestimate)");
        }

        var layerF = Capacitance.LayeredPlateF(turnLengthM * LayerBreadthM(fit, shape, arcDegrees), RoundWireLayerGap(roM, roM, rcM, rcM, eps, eps, []));
        return (Capacitance.MultilayerSelfF(layerF, fit.Layers),
            Text($"{fit.Layers} layers: energy method, (4/3)·C_l·(n − 1)/n² with C_l the layer-to-layer plate capacitance (±30 %)"));
    }

    private static (double, string, EstimateAccuracy) Leakage(TransformerPlan plan, IReadOnlyList<WindingFit> fits, CoreShape shape, int last)
    {
        var first = plan.Windings[0];
        var second = plan.Windings[last];
        var f1 = fits[0];
        var f2 = fits[last];
        if (second.Placement.Kind == PlacementKind.Bifilar && second.Placement.OtherWinding == 0)
        {
            var spacingM = Math.Max(first.Wire.ElementOverallDiameter.Metres, second.Wire.ElementOverallDiameter.Metres);
            var conductorM = Math.Min(EquivalentConductorDiameterM(first.Wire), EquivalentConductorDiameterM(second.Wire));
            var perMetre = LeakageInductance.TwoWireLinePerMetreHPerM(Math.Max(spacingM, conductorM), conductorM);
            return (perMetre * first.Turns * f1.MeanTurnLengthM, "bifilar pair: two-wire line inductance times the pair's length (±30 %)", EstimateAccuracy.PlusMinus(0.3));
        }

        var overlap = OverlapFraction(plan, 0, last);
        if (shape is ToroidCore or SleeveCore && overlap <= 0)
        {
            var (w, h, meanCircumferenceM) = RingSection(shape);
            var a1 = Enclosed(w, h, f1.BuildBelowM + f1.BuildThicknessM / 2);
            var a2 = Enclosed(w, h, f2.BuildBelowM + f2.BuildThicknessM / 2);
            var arc1 = meanCircumferenceM * PlacementRegion.ArcDegrees(plan.Windings, 0) / 360;
            var arc2 = meanCircumferenceM * PlacementRegion.ArcDegrees(plan.Windings, last) / 360;
            return (LeakageInductance.SectoredEstimateH(first.Turns, a1, arc1, second.Turns, a2, arc2),
                "side-by-side sectors: air-cored inductance of each sector (a derived estimate, within a factor of about 3; measure it)",
                EstimateAccuracy.WithinFactor(3));
        }

        var gapM = Math.Max(0, f2.BuildBelowM - (f1.BuildBelowM + f1.BuildThicknessM));
        var mltM = (f1.MeanTurnLengthM + f2.MeanTurnLengthM) / 2;
        var breadthM = SharedBreadthM(shape, f1, overlap) * Math.Max(Coverage(first, f1, shape), Coverage(second, f2, shape));
        // A winding that found no room at all still has at least one wire's build for this estimate.
        var build1 = Math.Max(f1.BuildThicknessM, first.Wire.ElementOverallDiameter.Metres);
        var build2 = Math.Max(f2.BuildThicknessM, second.Wire.ElementOverallDiameter.Metres);
        return shape is BobbinCore
            ? (LeakageInductance.OverlaidLayersH(first.Turns, mltM, breadthM, build1, build2, gapM),
                "overlaid layers: 1-D MMF formula μ0·N²·MLT·(c + Σa/3)/b_w (McLyman; ±30 %)",
                EstimateAccuracy.PlusMinus(0.3))
            : (LeakageInductance.OverlaidLayersH(first.Turns, mltM, breadthM, build1, build2, gapM),
                "overlaid layers: 1-D MMF formula μ0·N²·MLT·(c + Σa/3)/b_w with b_w the mean circumference of the winding region (a rougher estimate on this shape, taken as within a factor of 2, no source; measure it)",
                EstimateAccuracy.WithinFactor(2));
    }

    private static (double, string) Interwinding(TransformerPlan plan, IReadOnlyList<WindingFit> fits, CoreShape shape, int last)
    {
        var first = plan.Windings[0];
        var second = plan.Windings[last];
        var f1 = fits[0];
        var f2 = fits[last];
        var (rc1, ro1, eps1) = Insulation(first.Wire);
        var (rc2, ro2, eps2) = Insulation(second.Wire);
        if (second.Placement.Kind == PlacementKind.Bifilar && second.Placement.OtherWinding == 0)
        {
            var spacingM = Math.Max(2 * Math.Max(ro1, ro2), 2 * Math.Min(rc1, rc2));
            var perMetre = Capacitance.TwoWireLinePerMetreFPerM(spacingM, 2 * Math.Min(rc1, rc2), (1 + (eps1 + eps2) / 2) / 2);
            return (perMetre * first.Turns * f1.MeanTurnLengthM, "bifilar pair: two-wire line capacitance times the pair's length (±30 %)");
        }

        var overlap = OverlapFraction(plan, 0, last);
        if (overlap <= 0)
        {
            var ctt = Capacitance.TurnToTurnF(Math.Min(rc1, rc2), Math.Min(ro1, ro2), Math.Min(eps1, eps2), (f1.MeanTurnLengthM + f2.MeanTurnLengthM) / 2);
            return (2 * ctt, "side-by-side sectors: the two end-turn pairs where the sectors meet, 2·C_tt (a rough estimate)");
        }

        var wraps = new List<DielectricLayer>();
        double wrapsM = 0;
        for (var j = 1; j <= last; j++)
        {
            if (plan.Windings[j].Wrap is { } wrap)
            {
                wraps.Add(new DielectricLayer(wrap.Thickness.Metres, wrap.RelativePermittivity));
                wrapsM += wrap.Thickness.Metres;
            }
        }

        var gapM = Math.Max(0, f2.BuildBelowM - (f1.BuildBelowM + f1.BuildThicknessM) - wrapsM);
        var layers = RoundWireLayerGap(ro1, ro2, rc1, rc2, eps1, eps2, wraps);
        layers.Add(new DielectricLayer(gapM, 1));
        var areaM2 = (f1.MeanTurnLengthM + f2.MeanTurnLengthM) / 2 * SharedBreadthM(shape, f1, overlap) * Coverage(first, f1, shape) * Coverage(second, f2, shape);
        return (Capacitance.LayeredPlateF(areaM2, layers),
            "parallel plates over the shared area through enamel, wraps and the air between round wires (±30 % at best)");
    }

    /// <summary>The dielectric between two facing layers of round wires: each enamel, the wraps, and the mean air gap a
    /// row of touching round wires leaves against a plane, (1 − π/4)·r_o per face (plane geometry).</summary>
    private static List<DielectricLayer> RoundWireLayerGap(double ro1, double ro2, double rc1, double rc2, double eps1, double eps2, IEnumerable<DielectricLayer> wraps)
    {
        var layers = new List<DielectricLayer>
        {
            new(ro1 - rc1, eps1),
            new(ro2 - rc2, eps2),
            new((1 - Math.PI / 4) * (ro1 + ro2), 1),
        };
        layers.AddRange(wraps);
        return layers;
    }

    private static (double ConductorRadiusM, double OuterRadiusM, double Permittivity) Insulation(WindingWire wire)
    {
        var outer = wire.ElementOverallDiameter.Metres / 2;
        var conductor = Math.Min(EquivalentConductorDiameterM(wire) / 2, outer * 0.999);
        var eps = wire.Kind == WireKind.HookUp ? HookUpPermittivity : EnamelPermittivity;
        // The turn-to-turn formula needs ln(r_o/r_c) ≤ 2·ε_r; thick insulation is clamped to that limit.
        var minimumConductor = outer / Math.Exp(2 * eps * 0.999);
        return (Math.Max(conductor, minimumConductor), outer, eps);
    }

    /// <summary>The conductor diameter of one element: the wire itself, or for Litz a circle holding the strands' copper
    /// at a 0.75 packing (common practice, no source).</summary>
    private static double EquivalentConductorDiameterM(WindingWire wire) =>
        wire.Kind == WireKind.Litz
            ? Math.Min(wire.ElementOverallDiameter.Metres * 0.95, wire.StrandDiameter.Metres * Math.Sqrt(wire.StrandsPerElement / 0.75))
            : wire.StrandDiameter.Metres;

    /// <summary>
    /// The share of its breadth a winding's conductors cover, turns × elements in hand × d over the breadth of its first
    /// layer (1 when the layer is full; 1 on two-hole cores). Facing areas and the leakage breadth are scaled by it, so a
    /// few turns spread round a large ring do not count as a full plate (our adjustment, common practice, no source).
    /// </summary>
    private static double Coverage(WindingSpec spec, WindingFit fit, CoreShape shape)
    {
        if (shape is TwoHoleCore || fit.TurnsPerLayer.Count == 0 || fit.BreadthM <= 0)
        {
            return 1;
        }

        var covered = fit.TurnsPerLayer[0] * spec.Wire.ElementsInHand * spec.Wire.ElementOverallDiameter.Metres;
        return Math.Clamp(covered / fit.BreadthM, 1e-3, 1);
    }

    private static double LayerBreadthM(WindingFit fit, CoreShape shape, double arcDegrees) => shape switch
    {
        BobbinCore bobbin => bobbin.WindowBreadth.Metres,
        ToroidCore or SleeveCore => RingSection(shape).MeanCircumferenceM * arcDegrees / 360,
        _ => fit.BreadthM,
    };

    private static double SharedBreadthM(CoreShape shape, WindingFit first, double overlap) => shape switch
    {
        BobbinCore bobbin => bobbin.WindowBreadth.Metres,
        ToroidCore or SleeveCore => RingSection(shape).MeanCircumferenceM * overlap,
        TwoHoleCore twoHole => 2 * twoHole.Length.Metres,
        _ => first.BreadthM,
    };

    private static (double W, double H, double MeanCircumferenceM) RingSection(CoreShape shape) => shape switch
    {
        ToroidCore t => ((t.OuterDiameter.Metres - t.InnerDiameter.Metres) / 2, t.Height.Metres, Math.PI * (t.OuterDiameter.Metres + t.InnerDiameter.Metres) / 2),
        SleeveCore s => ((s.OuterDiameter.Metres - s.BoreDiameter.Metres) / 2, s.Length.Metres, Math.PI * (s.OuterDiameter.Metres + s.BoreDiameter.Metres) / 2),
        _ => throw new ArgumentOutOfRangeException(nameof(shape), shape, "Not a ring core."),
    };

    private static double Enclosed(double w, double h, double t) => (w + 2 * t) * (h + 2 * t);

    /// <summary>The share of the circumference both windings cover (1 when both are spread).</summary>
    private static double OverlapFraction(TransformerPlan plan, int a, int b)
    {
        var (s1, e1) = PlacementRegion.Of(plan.Windings, a);
        var (s2, e2) = PlacementRegion.Of(plan.Windings, b);
        var overlap = Math.Max(0, Math.Min(e1, e2) - Math.Max(s1, s2));
        return overlap / 360;
    }

    private static string Text(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
