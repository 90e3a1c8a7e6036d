using System.Globalization;
using Winding.Core.Windings;

namespace Winding.Core.Plans;

/// <summary>
/// Evaluates a plan: the core's effective parameters, μe and AL; the windings placed in winding order
/// (<see cref="WindingLayout"/>); per winding the inductance, fit, wound length, length to cut and DC resistance; with
/// operating conditions also the magnetising branch, currents, AC resistance, flux, losses and temperature
/// (<see cref="OperatingAnalysis"/>); and the warnings.
/// </summary>
public static class PlanEvaluator
{
    /// <summary>Evaluates <paramref name="plan"/>. Never throws for a plan built through the validated factories.</summary>
    public static PlanEvaluation Evaluate(TransformerPlan plan)
    {
        ArgumentNullException.ThrowIfNull(plan);
        var shape = plan.Core.WoundGeometry;
        var effective = shape.EffectiveParameters();
        var al = plan.Core.InductanceFactor;
        var core = new CoreEvaluation(shape.ShapeName, effective, shape.WindowAreaM2, plan.Core.EffectivePermeability, al);

        var fits = WindingLayout.Place(shape, plan.Windings);
        var warnings = new List<PlanWarning>();
        var windings = new List<WindingEvaluation>(plan.Windings.Count);
        for (var i = 0; i < plan.Windings.Count; i++)
        {
            var spec = plan.Windings[i];
            var fit = fits[i];
            var woundM = WireLengthAllowance.WoundLengthM(spec.Turns, fit.MeanTurnLengthM);
            var lengthM = plan.Allowance.LengthToCutM(spec.Turns, fit.MeanTurnLengthM);
            var rdcOhm = spec.Wire.Metal.DcResistanceOhm(lengthM, spec.Wire.ConductorAreaM2);
            var fill = spec.Turns * spec.Wire.ConductorAreaM2 / shape.WindowAreaM2;
            windings.Add(new WindingEvaluation(spec.Name, spec.Turns, spec.Wire, al.InductanceH(spec.Turns), fit, fill, woundM, lengthM, rdcOhm, spec.Taps, TurnsFor(spec, al, plan.Core.Material.AlTolerance), null));

            if (spec.Wire.OverallDiameterAssumed)
            {
                warnings.Add(new PlanWarning(
                    WarningCodes.OverallDiameterAssumed,
                    WarningSeverity.Info,
                    $"windings[{i}].wire.overallDiameterMm",
                    Invariant($"Winding '{spec.Name}': no overall diameter given, so the IEC 60317-0-1 grade 1 enamel build was assumed ({spec.Wire.ElementOverallDiameter.Millimetres:0.###} mm over a {spec.Wire.StrandDiameter.Millimetres:0.###} mm conductor).")));
            }

            if (fit.Outcome == FitOutcome.DoesNotFit)
            {
                warnings.Add(new PlanWarning(
                    WarningCodes.WireDoesNotFit,
                    WarningSeverity.Error,
                    $"windings[{i}].turns",
                    Invariant($"Winding '{spec.Name}' does not fit: {fit.Reason} Use fewer turns, thinner wire or a larger core.")));
            }
            else if (fit.Outcome == FitOutcome.Tight)
            {
                warnings.Add(new PlanWarning(
                    WarningCodes.FitsButTight,
                    WarningSeverity.Caution,
                    $"windings[{i}].turns",
                    Invariant($"Winding '{spec.Name}' fits but is tight: {fit.Reason}")));
            }
        }

        MagnetizingBranch? magnetizing = null;
        OperatingPoint? point = null;
        if (plan.Operating is not null)
        {
            var analysis = OperatingAnalysis.Analyse(plan, fits, [.. windings.Select(w => w.DcResistanceOhm)], warnings);
            magnetizing = analysis.Magnetizing;
            point = analysis.Point;
            for (var i = 0; i < windings.Count; i++)
            {
                windings[i] = windings[i] with { Electrical = analysis.Windings[i] };
            }
        }

        var parasitics = ParasiticEstimator.Estimate(plan, fits);
        ResponseEvaluation? response = plan.Operating is not null ? ResponseAnalysis.Analyse(plan, parasitics, windings, warnings) : null;

        double? turnsRatio = null;
        double? impedanceRatio = null;
        if (windings.Count >= 2)
        {
            turnsRatio = (double)windings[^1].Turns / windings[0].Turns;
            impedanceRatio = turnsRatio * turnsRatio;
        }

        var ordered = warnings.OrderByDescending(w => w.Severity).ToList();
        return new PlanEvaluation(core, windings, turnsRatio, impedanceRatio, magnetizing, point, parasitics, response, ordered);
    }

    private static (int, int)? TurnsFor(WindingSpec spec, InductanceFactor al, double tolerance) =>
        spec.TargetInductanceH is { } target
            ? (TurnsSolver.ForInductance(al, target, 0), TurnsSolver.ForInductance(al, target, Math.Min(tolerance, 0.9)))
            : null;

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
