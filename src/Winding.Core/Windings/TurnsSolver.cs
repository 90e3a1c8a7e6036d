namespace Winding.Core.Windings;

/// <summary>
/// How many turns a winding needs. L = AL·N² (IEC 60205 definition of AL) solved for N, rounded up; with an AL
/// tolerance t the low end AL·(1 − t) is used so that the target is met for every core in the batch (physics-sources
/// §2.3, common practice).
/// </summary>
public static class TurnsSolver
{
    /// <summary>Turns for at least <paramref name="inductanceH"/>: N = ⌈√(L / (AL·(1 − t)))⌉, at least one turn.</summary>
    /// <param name="al">AL of the core.</param>
    /// <param name="inductanceH">Target inductance, H, positive.</param>
    /// <param name="alTolerance">AL tolerance as a fraction, 0 ≤ t &lt; 1 (0 for the nominal AL).</param>
    public static int ForInductance(InductanceFactor al, double inductanceH, double alTolerance)
    {
        if (!(inductanceH > 0) || !double.IsFinite(inductanceH))
        {
            throw new ArgumentOutOfRangeException(nameof(inductanceH), inductanceH, "The target inductance must be finite and positive.");
        }

        if (!(alTolerance >= 0 && alTolerance < 1))
        {
            throw new ArgumentOutOfRangeException(nameof(alTolerance), alTolerance, "The tolerance must lie in [0, 1).");
        }

        var exact = Math.Sqrt(inductanceH / (al.HenriesPerTurnSquared * (1 - alTolerance)));
        return (int)Math.Clamp(Math.Ceiling(exact - 1e-9), 1, int.MaxValue);
    }

    /// <summary>
    /// Turns so that the winding's reactance at <paramref name="frequencyHz"/> is at least <paramref name="factor"/> times
    /// <paramref name="impedanceOhm"/>: 2π·f·AL(f)·(1 − t)·N² ≥ k·Z (the rule X ≥ k·Z at the bottom of the band is common
    /// practice, no source; k = 4 by default). AL(f) is the AL at that frequency, μ0·μe′(f)/C1.
    /// </summary>
    /// <param name="alAtFrequency">AL at the frequency (from μ′(f)).</param>
    /// <param name="frequencyHz">Frequency, Hz, positive.</param>
    /// <param name="impedanceOhm">Impedance the winding works at, Ω, positive.</param>
    /// <param name="factor">k, positive.</param>
    /// <param name="alTolerance">AL tolerance fraction, 0 ≤ t &lt; 1.</param>
    public static int ForReactance(InductanceFactor alAtFrequency, double frequencyHz, double impedanceOhm, double factor, double alTolerance)
    {
        if (!(frequencyHz > 0) || !(impedanceOhm > 0) || !(factor > 0) || !double.IsFinite(frequencyHz * impedanceOhm * factor))
        {
            throw new ArgumentOutOfRangeException(nameof(frequencyHz), frequencyHz, "Frequency, impedance and factor must be finite and positive.");
        }

        return ForInductance(alAtFrequency, factor * impedanceOhm / (2 * Math.PI * frequencyHz), alTolerance);
    }

    /// <summary>
    /// The smallest whole multiple of a plan's turns ratio whose first winding has at least
    /// <paramref name="minimumPrimaryTurns"/>: with g = gcd(N₁ … Nₙ) the ratio in lowest terms is Nᵢ/g, and the result
    /// is m·Nᵢ/g with m = ⌈N_min·g / N₁⌉. Every ratio Nᵢ/N₁ — hence the impedance ratio (N₂/N₁)² — is kept exactly.
    /// </summary>
    /// <param name="turns">The windings' turns, the primary first; each at least one.</param>
    /// <param name="minimumPrimaryTurns">Primary turns to reach, at least one.</param>
    public static IReadOnlyList<int> ScaleKeepingRatio(IReadOnlyList<int> turns, int minimumPrimaryTurns)
    {
        ArgumentNullException.ThrowIfNull(turns);
        if (turns.Count == 0 || turns.Any(t => t < 1))
        {
            throw new ArgumentException("Every winding needs at least one turn.", nameof(turns));
        }

        ArgumentOutOfRangeException.ThrowIfLessThan(minimumPrimaryTurns, 1);
        var g = turns.Aggregate(0L, (a, t) => (long)MathNet.Numerics.Euclid.GreatestCommonDivisor(a, t));
        var primaryBase = turns[0] / g;
        var multiplier = (minimumPrimaryTurns + primaryBase - 1) / primaryBase;
        return [.. turns.Select(t => checked((int)(t / g * multiplier)))];
    }
}

