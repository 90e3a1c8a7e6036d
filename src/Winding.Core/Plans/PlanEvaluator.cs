using System.Globalization;
using Winding.Core.Windings;
using Winding.Core.Wire;

namespace Winding.Core.Plans;

/// <summary>
/// Evaluates a plan: core effective parameters and AL, then each winding in winding order, layered over the windings
/// before it (each starts in the hole the previous ones left), with inductance, fit, length to cut and DC resistance.
/// </summary>
public static class PlanEvaluator
{
    /// <summary>Evaluates <paramref name="plan"/>. Never throws for a plan built through the validated factories.</summary>
    public static PlanEvaluation Evaluate(TransformerPlan plan)
    {
        ArgumentNullException.ThrowIfNull(plan);
        var geometry = plan.Core.WoundGeometry;
        var effective = geometry.EffectiveParameters();
        var al = InductanceFactor.FromPermeability(plan.Core.Material.InitialPermeability, effective);
        var core = new CoreEvaluation(effective, geometry.WindowAreaM2, al);

        var warnings = new List<PlanWarning>();
        var windings = new List<WindingEvaluation>(plan.Windings.Count);
        var hole = geometry.InnerDiameter;
        for (var i = 0; i < plan.Windings.Count; i++)
        {
            var spec = plan.Windings[i];
            var fit = ToroidLayerFit.Fit(geometry, hole, spec.Wire, spec.Turns);
            hole = fit.RemainingHoleDiameter;
            var lengthM = plan.Allowance.LengthToCutM(spec.Turns, fit.MeanTurnLengthM);
            var rdcOhm = ConductorMaterial.Copper.DcResistanceOhm(lengthM, spec.Wire.ConductorAreaM2);
            var fill = spec.Turns * spec.Wire.ConductorAreaM2 / geometry.WindowAreaM2;
            windings.Add(new WindingEvaluation(spec.Name, spec.Turns, spec.Wire, al.InductanceH(spec.Turns), fit, fill, lengthM, rdcOhm));

            if (spec.Wire.OverallDiameterAssumed)
            {
                warnings.Add(new PlanWarning(
                    WarningCodes.OverallDiameterAssumed,
                    WarningSeverity.Info,
                    $"windings[{i}].wire.overallDiameterMm",
                    Invariant($"Winding '{spec.Name}': no overall diameter given, so the IEC 60317-0-1 grade 1 enamel build was assumed ({spec.Wire.ElementOverallDiameter.Millimetres:0.###} mm over a {spec.Wire.StrandDiameter.Millimetres:0.###} mm conductor).")));
            }

            if (!fit.Fits)
            {
                warnings.Add(new PlanWarning(
                    WarningCodes.WireDoesNotFit,
                    WarningSeverity.Error,
                    $"windings[{i}].turns",
                    Invariant($"Winding '{spec.Name}' does not fit: only {spec.Turns - fit.UnplacedTurns} of {spec.Turns} turns of {spec.Wire.ElementOverallDiameter.Millimetres:0.###} mm wire find room in the {(i == 0 ? "core's hole" : "hole the earlier windings leave")} ({fit.Layers} layer{(fit.Layers == 1 ? "" : "s")}). Use fewer turns, thinner wire or a core with a larger hole.")));
            }
        }

        double? turnsRatio = null;
        double? impedanceRatio = null;
        if (windings.Count >= 2)
        {
            turnsRatio = (double)windings[^1].Turns / windings[0].Turns;
            impedanceRatio = turnsRatio * turnsRatio;
        }

        var ordered = warnings.OrderByDescending(w => w.Severity).ToList();
        return new PlanEvaluation(core, windings, turnsRatio, impedanceRatio, ordered);
    }

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
