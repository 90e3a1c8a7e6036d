using Winding.Core.Conductors;
using Winding.Core.Plans;
using Winding.Core.Windings;
using Winding.Core.Wire;

namespace Winding.Web.Api;

/// <summary>Maps the engine's evaluation to the v1 API contract.</summary>
public static class EvaluationResponseMapper
{
    /// <summary>Maps <paramref name="evaluation"/>.</summary>
    public static EvaluationResponse ToResponse(PlanEvaluation evaluation)
    {
        ArgumentNullException.ThrowIfNull(evaluation);
        var core = evaluation.Core;
        return new EvaluationResponse(
            new CoreResponse(
                core.Effective.EffectiveLengthM,
                core.Effective.EffectiveAreaM2,
                core.Effective.EffectiveVolumeM3,
                core.WindowAreaM2,
                core.InductanceFactor.HenriesPerTurnSquared,
                core.ShapeName,
                core.EffectivePermeability),
            [.. evaluation.Windings.Select((w, index) => new WindingResponse(
                w.Name,
                w.Turns,
                w.InductanceH,
                w.Fit.Fits,
                OutcomeWord(w.Fit.Outcome),
                w.Fit.Reason,
                w.Fit.Layers,
                w.Fit.TurnsPerLayer,
                w.FillFactor,
                w.Fit.RemainingHoleDiameter?.Metres,
                w.Fit.RemainingWindowHeightM,
                w.Fit.MeanTurnLengthM,
                w.Fit.LayerMeanTurnLengthsM,
                w.WoundLengthM,
                w.WireLengthM,
                w.DcResistanceOhm,
                w.Wire.ElementOverallDiameter.Metres,
                w.Wire.OverallDiameterAssumed,
                new WireResponse(
                    w.Wire.Description,
                    w.Wire.Kind switch { WireKind.Litz => "litz", WireKind.HookUp => "hook-up", _ => "solid" },
                    w.Wire.Metal.Name,
                    w.Wire.StrandDiameter.Metres,
                    w.Wire.ParallelConductors,
                    w.Wire.ElementOverallDiameter.Metres,
                    w.Wire.ElementsInHand,
                    w.Wire.ConductorAreaM2),
                w.Taps,
                w.Electrical?.AcResistanceOhm,
                w.Electrical is { } e ? (e.AcFactor.Method == AcResistanceMethod.DowellRoundWire ? "Dowell, round wire" : "Litz, per strand") : null,
                w.Electrical?.SkinDepthM,
                w.Electrical?.AcFactor.SkinDepthRatio,
                w.Electrical?.RmsCurrentA,
                w.Electrical?.CurrentDensityAPerM2,
                w.Electrical?.CopperLossW,
                evaluation.Parasitics.SelfCapacitancesF[index],
                evaluation.Parasitics.SelfResonancesHz[index],
                w.TurnsForTarget is { } t ? new TurnsForTargetResponse(t.Nominal, t.Guaranteed) : null))],
            evaluation.TurnsRatio,
            evaluation.ImpedanceRatio,
            evaluation.Magnetizing?.InductanceH,
            evaluation.Magnetizing is { } m ? new MagnetizingResponse(m.FrequencyHz, m.ReactanceOhm, m.SeriesLossResistanceOhm, m.ParallelLossResistanceOhm, m.ImpedanceSeenOhm, m.ReactanceFactor, m.PrimaryTurnsNeeded) : null,
            evaluation.Operating is { } p
                ? new OperatingPointResponse(p.PeakFluxDensityT, p.SaturationFluxDensityT, p.SaturationMargin, p.CoreLossW, p.CoreLossMethod, p.CopperLossW, p.CopperLossDcW, p.TemperatureRiseK, p.HotTemperatureC, p.SurfaceAreaM2)
                : null,
            evaluation.Parasitics.LeakageInductanceH,
            evaluation.Parasitics.InterwindingCapacitanceF,
            new ParasiticsResponse(evaluation.Parasitics.LeakageMethod, evaluation.Parasitics.InterwindingMethod, evaluation.Parasitics.TransformerSelfResonanceHz, evaluation.Parasitics.Measured),
            evaluation.Response?.Elements,
            evaluation.Response?.ElementsFrequencyHz,
            evaluation.Response is { Band: var b } ? new BandResponse(b.LowerCutoffHz, b.UpperCutoffHz, b.Lower1DbHz, b.Upper1DbHz, b.MinimumInsertionLossDb) : null,
            evaluation.Response is { } r
                ? [.. r.Sweep.Select(p => new SweepPointResponse(p.FrequencyHz, p.InsertionLossDb, p.ReturnLossDb, new ComplexResponse(p.InputImpedanceOhm.Real, p.InputImpedanceOhm.Imaginary)))]
                : [],
            evaluation.Response is { Tolerance: var tol }
                ? new ToleranceResponse(new RangeResponse(tol.LowerCutoffMinHz, tol.LowerCutoffMaxHz), new RangeResponse(tol.UpperCutoffMinHz, tol.UpperCutoffMaxHz))
                : null,
            [.. evaluation.Warnings.Select(ToResponse)]);
    }

    /// <summary>Maps one warning; the severity as a lower-case word.</summary>
    public static WarningResponse ToResponse(PlanWarning warning)
    {
        ArgumentNullException.ThrowIfNull(warning);
        return new WarningResponse(warning.Code, SeverityWord(warning.Severity), warning.Field, warning.Message);
    }

    /// <summary>The API word for a fit outcome.</summary>
    public static string OutcomeWord(FitOutcome outcome) => outcome switch
    {
        FitOutcome.Fits => "fits",
        FitOutcome.Tight => "tight",
        FitOutcome.DoesNotFit => "does-not-fit",
        _ => throw new ArgumentOutOfRangeException(nameof(outcome), outcome, "Unknown outcome."),
    };

    /// <summary>The API word for a severity.</summary>
    public static string SeverityWord(WarningSeverity severity) => severity switch
    {
        WarningSeverity.Info => "info",
        WarningSeverity.Caution => "caution",
        WarningSeverity.Error => "error",
        _ => throw new ArgumentOutOfRangeException(nameof(severity), severity, "Unknown severity."),
    };
}
