namespace Winding.Core.Plans;

/// <summary>Leakage inductance and capacitances estimated from the build (or measured), with how each was found.</summary>
/// <param name="LeakageInductanceH">Leakage between the first and the last winding referred to the primary, H (0 with one winding).</param>
/// <param name="LeakageMethod">How it was found, with its expected accuracy, in plain words.</param>
/// <param name="InterwindingCapacitanceF">Capacitance between the first and the last winding, F (0 with one winding).</param>
/// <param name="InterwindingMethod">How it was found, in plain words.</param>
/// <param name="SelfCapacitancesF">Self-capacitance of each winding, F.</param>
/// <param name="SelfCapacitanceMethods">How each was found.</param>
/// <param name="SelfResonancesHz">Self-resonant frequency of each winding, 1/(2π√(L·C_s)), Hz (null when C_s is 0).</param>
/// <param name="TransformerSelfResonanceHz">Parallel resonance seen from the primary, 1/(2π√(L_m·(C_in + C_out))), Hz.</param>
/// <param name="Measured">Which values are measured rather than estimated (<c>al</c>, <c>leakageInductance</c>,
/// <c>interwindingCapacitance</c>, <c>selfCapacitance[i]</c>).</param>
public sealed record ParasiticsEvaluation(
    double LeakageInductanceH,
    string LeakageMethod,
    double InterwindingCapacitanceF,
    string InterwindingMethod,
    IReadOnlyList<double> SelfCapacitancesF,
    IReadOnlyList<string> SelfCapacitanceMethods,
    IReadOnlyList<double?> SelfResonancesHz,
    double? TransformerSelfResonanceHz,
    IReadOnlyList<string> Measured)
{
    /// <summary>
    /// The accuracy <see cref="LeakageMethod"/> states, as factors (±30 % for the 1-D formula on a bobbin, a bifilar
    /// pair or a measured value's ±10 %; a factor of 3 for side-by-side sectors; a factor of 2 for overlaid windings on
    /// other shapes). A bench sheet sets its leakage limits from it.
    /// </summary>
    public EstimateAccuracy LeakageAccuracy { get; init; } = EstimateAccuracy.WithinFactor(3);
}
