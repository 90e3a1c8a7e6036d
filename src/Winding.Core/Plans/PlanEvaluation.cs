namespace Winding.Core.Plans;

/// <summary>The results of evaluating a plan.</summary>
/// <param name="Core">Core results.</param>
/// <param name="Windings">Per-winding results, in winding order.</param>
/// <param name="TurnsRatio">Last winding's turns over the first's; null with a single winding.</param>
/// <param name="ImpedanceRatio">The square of the turns ratio; null with a single winding.</param>
/// <param name="Magnetizing">The primary's magnetising inductance and the reactance rule at f_min (null without operating conditions).</param>
/// <param name="Operating">Flux, losses and temperature (null without operating conditions).</param>
/// <param name="Parasitics">Leakage inductance and capacitances.</param>
/// <param name="Response">The equivalent circuit and its frequency response (null without operating conditions).</param>
/// <param name="Warnings">Findings, most severe first.</param>
public sealed record PlanEvaluation(
    CoreEvaluation Core,
    IReadOnlyList<WindingEvaluation> Windings,
    double? TurnsRatio,
    double? ImpedanceRatio,
    MagnetizingBranch? Magnetizing,
    OperatingPoint? Operating,
    ParasiticsEvaluation Parasitics,
    ResponseEvaluation? Response,
    IReadOnlyList<PlanWarning> Warnings);
