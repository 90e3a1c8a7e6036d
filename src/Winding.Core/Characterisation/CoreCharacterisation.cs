using System.Numerics;
using Winding.Core.Geometry;
using Winding.Core.Windings;

namespace Winding.Core.Characterisation;

/// <summary>
/// Turns bench readings of an N-turn test winding on an unknown core into AL, μe and the series complex permeability
/// (IEC 62044-2:2005, magnetic properties at low excitation level, formulas from memory; IEC 60401-3 notation, from
/// memory; physics-sources.md §12):
/// <code>
/// AL   = L / N²                                   [H/turn²]
/// μe   = AL·C1/μ0 = L·le/(μ0·N²·Ae)                (= μi for an ungapped ring at low excitation)
/// μs′  = X·C1/(ω·μ0·N²)
/// μs″  = (R − R_w)·C1/(ω·μ0·N²)                   (R_w: winding resistance at that frequency, skin effect included)
/// tan δ = μs″/μs′
/// </code>
/// These invert Z = jω·L0·(μs′ − jμs″), L0 = μ0·N²/C1 (physics-sources.md §2.2). Units: H, Ω, Hz, C1 in m⁻¹.
/// Valid at low excitation (Rayleigh region) with the test turns spread evenly round the whole core, below the winding's
/// self-resonance (its capacitance is not removed), with the fixture compensated; dimensional resonance of large cores
/// is not modelled.
/// </summary>
public static class CoreCharacterisation
{
    /// <summary>AL = L/N² and μe = AL·C1/μ0 from a measured inductance (formulas in the type summary).</summary>
    /// <param name="core">The core's effective parameters (C1).</param>
    /// <param name="turns">N, at least 1.</param>
    /// <param name="inductanceH">Measured inductance L, H, finite and above 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is outside the ranges above.</exception>
    public static CharacterisedCore FromInductance(EffectiveParameters core, int turns, double inductanceH)
    {
        ArgumentNullException.ThrowIfNull(core);
        ArgumentOutOfRangeException.ThrowIfLessThan(turns, 1);
        if (!double.IsFinite(inductanceH) || inductanceH <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(inductanceH), inductanceH, "The inductance must be a finite number above 0 H.");
        }

        var al = InductanceFactor.FromHenriesPerTurnSquared(inductanceH / (turns * (double)turns));
        var muE = al.HenriesPerTurnSquared * core.CoreFactorC1PerM / PhysicalConstants.VacuumPermeabilityHPerM;
        return new CharacterisedCore(al, muE, null);
    }

    /// <summary>
    /// AL and μe from the reading's series inductance and, when it carries a resistance (or Q, or a complex impedance),
    /// μs′ and μs″ at the test frequency after subtracting R_w (formulas in the type summary).
    /// </summary>
    /// <param name="core">The core's effective parameters (C1).</param>
    /// <param name="measurement">The reading.</param>
    public static CharacterisedCore FromMeasurement(EffectiveParameters core, TestWindingMeasurement measurement)
    {
        ArgumentNullException.ThrowIfNull(measurement);
        var fromInductance = FromInductance(core, measurement.Turns, measurement.SeriesInductanceH);
        return measurement.SeriesImpedanceOhm is { } z
            ? fromInductance with { Permeability = FromImpedance(core, measurement.Turns, measurement.FrequencyHz, z, measurement.WindingResistanceOhm) }
            : fromInductance;
    }

    /// <summary>
    /// μs′ = X·C1/(ω·μ0·N²) and μs″ = (R − R_w)·C1/(ω·μ0·N²) from one complex series impedance Z = R + jX. The values are
    /// returned as measured, even when μs′ ≤ 0 (capacitive, above self-resonance) or μs″ &lt; 0 (R &lt; R_w).
    /// </summary>
    /// <param name="core">The core's effective parameters (C1).</param>
    /// <param name="turns">N, at least 1.</param>
    /// <param name="frequencyHz">Frequency, Hz, finite and above 0.</param>
    /// <param name="impedanceOhm">Measured Z = R + jX, Ω, finite.</param>
    /// <param name="windingResistanceOhm">R_w at that frequency, Ω, finite and at least 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is outside the ranges above.</exception>
    public static MeasuredPermeability FromImpedance(EffectiveParameters core, int turns, double frequencyHz, Complex impedanceOhm, double windingResistanceOhm)
    {
        ArgumentNullException.ThrowIfNull(core);
        ArgumentOutOfRangeException.ThrowIfLessThan(turns, 1);
        if (!double.IsFinite(frequencyHz) || frequencyHz <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(frequencyHz), frequencyHz, "The frequency must be a finite number above 0 Hz.");
        }

        if (!double.IsFinite(impedanceOhm.Real) || !double.IsFinite(impedanceOhm.Imaginary))
        {
            throw new ArgumentOutOfRangeException(nameof(impedanceOhm), impedanceOhm, "The impedance must be finite.");
        }

        if (!double.IsFinite(windingResistanceOhm) || windingResistanceOhm < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(windingResistanceOhm), windingResistanceOhm, "The winding resistance must be a finite number of at least 0 Ω.");
        }

        // ω·L0 = ω·μ0·N²/C1, the reactance of the winding with μ = 1.
        var airReactanceOhm = 2 * Math.PI * frequencyHz * PhysicalConstants.VacuumPermeabilityHPerM * turns * (double)turns / core.CoreFactorC1PerM;
        return new MeasuredPermeability(
            frequencyHz,
            impedanceOhm.Imaginary / airReactanceOhm,
            (impedanceOhm.Real - windingResistanceOhm) / airReactanceOhm);
    }

    /// <summary>
    /// μs′(f), μs″(f) from a sweep of complex series impedances (for example a one-port file), each point as
    /// <see cref="FromImpedance"/> with the same R_w at every frequency (adequate when R_w is small beside the core's
    /// loss resistance; otherwise subtract a frequency-dependent R_w point by point with <see cref="FromImpedance"/>).
    /// </summary>
    /// <param name="core">The core's effective parameters (C1).</param>
    /// <param name="turns">N, at least 1.</param>
    /// <param name="impedances">(frequency Hz, Z Ω) pairs, each frequency finite and above 0, each Z finite.</param>
    /// <param name="windingResistanceOhm">R_w, Ω, finite and at least 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is outside the ranges above.</exception>
    public static IReadOnlyList<MeasuredPermeability> FromImpedances(
        EffectiveParameters core, int turns, IReadOnlyList<(double FrequencyHz, Complex ImpedanceOhm)> impedances, double windingResistanceOhm)
    {
        ArgumentNullException.ThrowIfNull(impedances);
        return impedances.Select(p => FromImpedance(core, turns, p.FrequencyHz, p.ImpedanceOhm, windingResistanceOhm)).ToArray();
    }

    /// <summary>
    /// The material classes whose initial permeability lies nearest to a measured one on a logarithmic scale, ranked by
    /// |ln(μ/μi)| (a factor of two above counts as far as a factor of two below; common practice, no source), ties broken
    /// by identifier (ordinal) so that the answer does not depend on the order of <paramref name="classes"/>.
    /// </summary>
    /// <param name="mu">Measured μ (μe or μs′ at low frequency), finite and above 0.</param>
    /// <param name="classes">(id, name, μi) of each candidate class; μi finite and above 0.</param>
    /// <param name="count">How many to return, at least 1 (fewer when there are fewer classes).</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is outside the ranges above.</exception>
    public static IReadOnlyList<MaterialClassMatch> NearestMaterialClasses(
        double mu, IEnumerable<(string Id, string Name, double InitialPermeability)> classes, int count)
    {
        ArgumentNullException.ThrowIfNull(classes);
        ArgumentOutOfRangeException.ThrowIfLessThan(count, 1);
        if (!double.IsFinite(mu) || mu <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(mu), mu, "The permeability must be a finite number above 0.");
        }

        var matches = new List<MaterialClassMatch>();
        foreach (var (id, name, muI) in classes)
        {
            if (!double.IsFinite(muI) || muI <= 0)
            {
                throw new ArgumentOutOfRangeException(nameof(classes), muI, FormattableString.Invariant($"Class '{id}': the initial permeability must be a finite number above 0."));
            }

            matches.Add(new MaterialClassMatch(id, name, muI, Math.Abs(Math.Log(mu / muI))));
        }

        return matches
            .OrderBy(m => m.LogDistance)
            .ThenBy(m => m.Id, StringComparer.Ordinal)
            .Take(count)
            .ToArray();
    }
}
