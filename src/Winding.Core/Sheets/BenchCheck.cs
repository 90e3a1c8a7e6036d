namespace Winding.Core.Sheets;

/// <summary>
/// One row of the bench-check table: what to measure, how, the expected value with its lower and upper limits, and why
/// the limits are where they are.
/// </summary>
/// <param name="Id">Stable key, e.g. <c>w0-inductance</c>, <c>leakage</c>, <c>w1-ratio</c>, <c>srf</c>.</param>
/// <param name="Quantity">What is measured.</param>
/// <param name="WindingIndex">The winding measured (0-based; for a ratio, the winding compared with the first), or null
/// for leakage and the self-resonance, which are measured at the first winding.</param>
/// <param name="FrequencyHz">The test frequency, Hz; null for a DC measurement.</param>
/// <param name="Condition">How to measure, in plain words (frequency, which windings open or shorted, temperature).</param>
/// <param name="Expected">The expected value in SI (H, Ω, Hz, or a plain ratio).</param>
/// <param name="Lower">Lowest value still within tolerance.</param>
/// <param name="Upper">Highest value still within tolerance.</param>
/// <param name="Unit">The SI unit symbol (<c>H</c>, <c>Ω</c>, <c>Hz</c>), empty for a ratio.</param>
/// <param name="Basis">How the expected value and the tolerance were found, in plain words.</param>
/// <param name="Source">Where the formula and the tolerance come from.</param>
public sealed record BenchCheck(
    string Id,
    BenchQuantity Quantity,
    int? WindingIndex,
    double? FrequencyHz,
    string Condition,
    double Expected,
    double Lower,
    double Upper,
    string Unit,
    string Basis,
    string Source)
{
    /// <summary>
    /// Self-resonance check only: the shunt capacitance referred to the first winding that is not the first winding's own
    /// self-capacitance (the last winding's, referred, and the interwinding capacitance), F. A measured resonance is
    /// turned into the first winding's self-capacitance by subtracting it.
    /// </summary>
    public double? OtherShuntCapacitanceF { get; init; }
}
