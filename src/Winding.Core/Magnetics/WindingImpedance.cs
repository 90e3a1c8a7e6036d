using System.Numerics;
using Winding.Core.Geometry;
using Winding.Core.Materials;

namespace Winding.Core.Magnetics;

/// <summary>
/// Impedance of an N-turn winding on a core of complex permeability μs = μs′ − jμs″:
/// Z = jω·L0·(μs′ − jμs″) = ω·L0·μs″ + jω·L0·μs′, with the air-equivalent inductance L0 = μ0·N²·Ae/le = μ0·N²/C1
/// (IEC 60401-3 and IEC 60050-221 notation, from memory; E. C. Snelling, Soft Ferrites, 2nd ed. 1988, ch. 2, from memory).
/// Series form: R_s = ω·L0·μs″, X_s = ω·L0·μs′, L_s = L0·μs′, tan δ = μs″/μs′.
/// Parallel form: μp′ = μs′·(1 + tan²δ), μp″ = μs″·(1 + 1/tan²δ), R_p = ω·L0·μp″, L_p = L0·μp′.
/// <para>
/// Units: Ω, H, Hz. Valid at low excitation (Rayleigh region) for a winding spread evenly round the core. Winding
/// copper loss and self-capacitance are not included (add them as separate elements); dimensional resonance of large
/// cores is not modelled.
/// </para>
/// </summary>
public sealed record WindingImpedance
{
    private WindingImpedance(int turns, double frequencyHz, double airInductanceH, double muPrime, double muDoublePrime, bool isPermeabilityExtrapolated)
    {
        Turns = turns;
        FrequencyHz = frequencyHz;
        AirInductanceH = airInductanceH;
        MuPrime = muPrime;
        MuDoublePrime = muDoublePrime;
        IsPermeabilityExtrapolated = isPermeabilityExtrapolated;
    }

    /// <summary>Number of turns N.</summary>
    public int Turns { get; }

    /// <summary>Frequency f, Hz.</summary>
    public double FrequencyHz { get; }

    /// <summary>Air-equivalent inductance L0 = μ0·N²/C1, H (the inductance the winding would have with μ = 1).</summary>
    public double AirInductanceH { get; }

    /// <summary>Series μs′ used (dimensionless).</summary>
    public double MuPrime { get; }

    /// <summary>Series μs″ used (dimensionless).</summary>
    public double MuDoublePrime { get; }

    /// <summary>True when the permeability came from a curve outside its tabulated range (end value held).</summary>
    public bool IsPermeabilityExtrapolated { get; }

    /// <summary>Angular frequency ω = 2π·f, rad/s.</summary>
    public double AngularFrequencyRadPerS => 2 * Math.PI * FrequencyHz;

    /// <summary>Series resistance R_s = ω·L0·μs″, Ω.</summary>
    public double SeriesResistanceOhm => AngularFrequencyRadPerS * AirInductanceH * MuDoublePrime;

    /// <summary>Series reactance X_s = ω·L0·μs′, Ω.</summary>
    public double SeriesReactanceOhm => AngularFrequencyRadPerS * AirInductanceH * MuPrime;

    /// <summary>Series inductance L_s = L0·μs′, H.</summary>
    public double SeriesInductanceH => AirInductanceH * MuPrime;

    /// <summary>Complex impedance Z = R_s + jX_s, Ω.</summary>
    public Complex ImpedanceOhm => new(SeriesResistanceOhm, SeriesReactanceOhm);

    /// <summary>Magnitude |Z| = √(R_s² + X_s²), Ω.</summary>
    public double MagnitudeOhm => double.Hypot(SeriesResistanceOhm, SeriesReactanceOhm);

    /// <summary>Loss tangent tan δ = μs″/μs′ = R_s/X_s (dimensionless).</summary>
    public double LossTangent => MuDoublePrime / MuPrime;

    /// <summary>Parallel μp′ = μs′·(1 + tan²δ) = (μs′² + μs″²)/μs′ (dimensionless).</summary>
    public double ParallelMuPrime => (MuPrime * MuPrime + MuDoublePrime * MuDoublePrime) / MuPrime;

    /// <summary>
    /// Parallel μp″ = μs″·(1 + 1/tan²δ) = (μs′² + μs″²)/μs″ (dimensionless); null for a lossless core (μs″ = 0), where it
    /// is infinite.
    /// </summary>
    public double? ParallelMuDoublePrime =>
        MuDoublePrime > 0 ? (MuPrime * MuPrime + MuDoublePrime * MuDoublePrime) / MuDoublePrime : null;

    /// <summary>Parallel (shunt) resistance R_p = ω·L0·μp″, Ω; null for a lossless core (an open circuit).</summary>
    public double? ParallelResistanceOhm => AngularFrequencyRadPerS * AirInductanceH * ParallelMuDoublePrime;

    /// <summary>Parallel inductance L_p = L0·μp′, H.</summary>
    public double ParallelInductanceH => AirInductanceH * ParallelMuPrime;

    /// <summary>Impedance of a winding for given μs′ and μs″ at one frequency (formulas in the type summary).</summary>
    /// <param name="turns">Number of turns N, at least 1.</param>
    /// <param name="core">The core's effective parameters (C1).</param>
    /// <param name="frequencyHz">Frequency, Hz, finite and above 0.</param>
    /// <param name="muPrime">Series μs′, finite and above 0.</param>
    /// <param name="muDoublePrime">Series μs″, finite and at least 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is outside the ranges above.</exception>
    public static WindingImpedance Calculate(int turns, EffectiveParameters core, double frequencyHz, double muPrime, double muDoublePrime) =>
        Create(turns, core, frequencyHz, muPrime, muDoublePrime, false);

    /// <summary>
    /// Impedance of a winding with μs′ and μs″ read from a permeability curve at the frequency; the result says whether
    /// the curve was read outside its table.
    /// </summary>
    /// <param name="turns">Number of turns N, at least 1.</param>
    /// <param name="core">The core's effective parameters (C1).</param>
    /// <param name="frequencyHz">Frequency, Hz, finite and above 0.</param>
    /// <param name="permeability">The material's complex permeability curve.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is outside the ranges above.</exception>
    public static WindingImpedance Calculate(int turns, EffectiveParameters core, double frequencyHz, ComplexPermeabilityCurve permeability)
    {
        ArgumentNullException.ThrowIfNull(permeability);
        var mu = permeability.At(frequencyHz);
        return Create(turns, core, frequencyHz, mu.MuPrime, mu.MuDoublePrime, mu.IsExtrapolated);
    }

    private static WindingImpedance Create(int turns, EffectiveParameters core, double frequencyHz, double muPrime, double muDoublePrime, bool isExtrapolated)
    {
        ArgumentNullException.ThrowIfNull(core);
        ArgumentOutOfRangeException.ThrowIfLessThan(turns, 1);
        if (!double.IsFinite(frequencyHz) || frequencyHz <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(frequencyHz), frequencyHz, "The frequency must be a finite number above 0 Hz.");
        }

        if (!double.IsFinite(muPrime) || muPrime <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(muPrime), muPrime, "μ′ must be a finite number above 0.");
        }

        if (!double.IsFinite(muDoublePrime) || muDoublePrime < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(muDoublePrime), muDoublePrime, "μ″ must be a finite number of at least 0.");
        }

        var airInductanceH = PhysicalConstants.VacuumPermeabilityHPerM * turns * (double)turns / core.CoreFactorC1PerM;
        return new WindingImpedance(turns, frequencyHz, airInductanceH, muPrime, muDoublePrime, isExtrapolated);
    }
}
