namespace Winding.Core.Plans;

/// <summary>
/// How far an estimate may be from the true value, as factors on it: the truth is expected between
/// <see cref="LowerFactor"/> × and <see cref="UpperFactor"/> × the estimate. "±30 %" is 0.7 … 1.3; "within a factor of
/// 3" is 1/3 … 3.
/// </summary>
/// <param name="LowerFactor">Lowest expected true value over the estimate, 0 &lt; factor ≤ 1.</param>
/// <param name="UpperFactor">Highest expected true value over the estimate, ≥ 1.</param>
public sealed record EstimateAccuracy(double LowerFactor, double UpperFactor)
{
    /// <summary>An accuracy of ±<paramref name="fraction"/> (0.3 for ±30 %), 0 ≤ fraction &lt; 1.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Outside 0 ≤ fraction &lt; 1.</exception>
    public static EstimateAccuracy PlusMinus(double fraction)
    {
        if (!(fraction >= 0 && fraction < 1))
        {
            throw new ArgumentOutOfRangeException(nameof(fraction), fraction, "The fraction must lie from 0 up to (not including) 1.");
        }

        return new EstimateAccuracy(1 - fraction, 1 + fraction);
    }

    /// <summary>Within a factor of <paramref name="factor"/> either way (≥ 1).</summary>
    /// <exception cref="ArgumentOutOfRangeException">Below 1 or not finite.</exception>
    public static EstimateAccuracy WithinFactor(double factor)
    {
        if (!(factor >= 1 && double.IsFinite(factor)))
        {
            throw new ArgumentOutOfRangeException(nameof(factor), factor, "The factor must be finite and at least 1.");
        }

        return new EstimateAccuracy(1 / factor, factor);
    }
}
