using System.Globalization;
using Winding.Core.Plans;
using Winding.Core.Windings;

namespace Winding.Web.Display;

/// <summary>Turns an evaluation into the labelled, formatted rows the results panel shows.</summary>
public static class ResultRows
{
    /// <summary>Rows for the core and each winding of <paramref name="evaluation"/>.</summary>
    public static IReadOnlyList<ResultRow> For(PlanEvaluation evaluation)
    {
        ArgumentNullException.ThrowIfNull(evaluation);
        var core = evaluation.Core;
        var rows = new List<ResultRow>
        {
            new("al", "AL", EngineeringFormat.Format(core.InductanceFactor.HenriesPerTurnSquared, "H") + "/turn²", "Inductance per turn squared, AL = μ0·μi·Ae/le (IEC 60205 effective parameters)."),
            new("le", "Effective length le", EngineeringFormat.Fixed(core.Effective.EffectiveLengthM * 1e3, 2, "mm"), "Effective magnetic path length, IEC 60205 ring-core formula."),
            new("ae", "Effective area Ae", EngineeringFormat.Fixed(core.Effective.EffectiveAreaM2 * 1e6, 2, "mm²"), "Effective cross-section, IEC 60205 ring-core formula."),
            new("ve", "Effective volume Ve", EngineeringFormat.Fixed(core.Effective.EffectiveVolumeM3 * 1e9, 0, "mm³"), "Effective volume le·Ae, IEC 60205."),
        };

        var multiple = evaluation.Windings.Count > 1;
        for (var i = 0; i < evaluation.Windings.Count; i++)
        {
            var w = evaluation.Windings[i];
            var prefix = multiple ? w.Name + ": " : string.Empty;
            var key = multiple ? $"w{i}-" : string.Empty;
            rows.Add(new($"{key}inductance", prefix + "Inductance L", EngineeringFormat.Format(w.InductanceH, "H"), "L = AL·N² at low excitation and low frequency."));
            rows.Add(new($"{key}turns-per-layer", prefix + "Turns per layer", string.Join(" + ", w.Fit.TurnsPerLayer.Select(t => t.ToString(CultureInfo.InvariantCulture))), "Turns touching on the inner circumference, layer by layer (common practice)."));
            rows.Add(new($"{key}layers", prefix + "Layers", w.Fit.Layers.ToString(CultureInfo.InvariantCulture), "Layers used inside the hole."));
            rows.Add(new($"{key}fits", prefix + "Fit", OutcomeText(w.Fit.Outcome) + " — " + w.Fit.Reason, "Whether every turn finds room, and how comfortably: " + w.Fit.Method + "."));
            if (w.Fit.RemainingHoleDiameter is { } hole)
            {
                rows.Add(new($"{key}hole-left", prefix + "Hole left", EngineeringFormat.Fixed(hole.Millimetres, 2, "mm"), "Diameter of the hole left after this winding."));
            }

            if (w.Fit.RemainingWindowHeightM is { } height)
            {
                rows.Add(new($"{key}height-left", prefix + "Window height left", EngineeringFormat.Fixed(height * 1e3, 2, "mm"), "Bobbin window height left after this winding."));
            }

            rows.Add(new($"{key}fill", prefix + "Copper fill", EngineeringFormat.Fixed(w.FillFactor * 100, 1, "%"), "Copper cross-section over the window area."));
            rows.Add(new($"{key}mlt", prefix + "Mean turn length", EngineeringFormat.Fixed(w.Fit.MeanTurnLengthM * 1e3, 1, "mm"), "Perimeter of the core section grown by the wire build."));
            rows.Add(new($"{key}wire-length", prefix + "Wire to cut", EngineeringFormat.Fixed(w.WireLengthM * 1e3, 0, "mm"), "N·MLT plus the margin, plus two leads."));
            rows.Add(new($"{key}rdc", prefix + "DC resistance (20 °C)", EngineeringFormat.Format(w.DcResistanceOhm, "Ω"), "ρ20·ℓ/A with ρ20 = 1/58 Ω·mm²/m (IEC 60028)."));
        }

        static string OutcomeText(FitOutcome outcome) => outcome switch
        {
            FitOutcome.Fits => "fits",
            FitOutcome.Tight => "tight",
            _ => "does not fit",
        };

        if (evaluation.TurnsRatio is { } ratio)
        {
            rows.Add(new("turns-ratio", "Turns ratio", ratio.ToString("G4", CultureInfo.InvariantCulture), "Last winding's turns over the first's."));
        }

        return rows;
    }
}
