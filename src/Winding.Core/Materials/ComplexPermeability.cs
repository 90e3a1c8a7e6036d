namespace Winding.Core.Materials;

/// <summary>
/// The series complex relative permeability μs = μs′ − jμs″ read from a <see cref="ComplexPermeabilityCurve"/> at one
/// frequency (IEC 60401-3 notation; Snelling, Soft Ferrites, 2nd ed. 1988), with a flag saying whether the frequency lay
/// outside the tabulated range so that the nearest end value was held.
/// </summary>
/// <param name="FrequencyHz">The frequency asked for, Hz.</param>
/// <param name="MuPrime">Real part μs′ (dimensionless, &gt; 0).</param>
/// <param name="MuDoublePrime">Loss part μs″ (dimensionless, ≥ 0).</param>
/// <param name="IsExtrapolated">True when the frequency lies outside the table and the end value was held.</param>
public readonly record struct ComplexPermeability(double FrequencyHz, double MuPrime, double MuDoublePrime, bool IsExtrapolated)
{
    /// <summary>Loss tangent tan δ = μs″/μs′ (dimensionless; IEC 60401-3).</summary>
    public double LossTangent => MuDoublePrime / MuPrime;
}
