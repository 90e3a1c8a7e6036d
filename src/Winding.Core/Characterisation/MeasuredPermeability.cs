using Winding.Core.Materials;

namespace Winding.Core.Characterisation;

/// <summary>
/// The series complex permeability μs = μs′ − jμs″ worked out from one impedance reading of a test winding
/// (<see cref="CoreCharacterisation.FromImpedance"/>). Unlike <see cref="ComplexPermeabilityPoint"/> the values are kept
/// exactly as measured, so μs″ may come out slightly negative (R below R_w, measurement noise) and μs′ negative above the
/// winding's self-resonance; the flags say so.
/// </summary>
/// <param name="FrequencyHz">Frequency, Hz.</param>
/// <param name="MuPrime">μs′ (dimensionless).</param>
/// <param name="MuDoublePrime">μs″ (dimensionless).</param>
public sealed record MeasuredPermeability(double FrequencyHz, double MuPrime, double MuDoublePrime)
{
    /// <summary>Loss tangent tan δ = μs″/μs′ (dimensionless; IEC 60401-3, from memory).</summary>
    public double LossTangent => MuDoublePrime / MuPrime;

    /// <summary>False when μs′ ≤ 0: the winding looked capacitive (above its self-resonance) and the point says nothing about the core.</summary>
    public bool IsInductive => MuPrime > 0;

    /// <summary>True when μs″ &lt; 0: the measured resistance was below the winding resistance subtracted from it.</summary>
    public bool IsLossBelowWindingResistance => MuDoublePrime < 0;

    /// <summary>This point as a table row of a permeability curve, or null when it cannot be one (μs′ ≤ 0 or μs″ &lt; 0).</summary>
    public ComplexPermeabilityPoint? ToPoint() =>
        IsInductive && !IsLossBelowWindingResistance ? new ComplexPermeabilityPoint(FrequencyHz, MuPrime, MuDoublePrime) : null;
}
