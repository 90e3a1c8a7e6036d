using MathNet.Numerics;
using Winding.Core.Quantities;

namespace Winding.Core.Conductors;

/// <summary>
/// Skin effect in an isolated straight round wire: the exact ratio of AC resistance and internal reactance to DC
/// resistance as a function of x = r·√2/δ (r the wire radius, δ the <see cref="SkinDepth"/>; the "x" of NBS Circular
/// C74 and of Terman's <i>Radio Engineers' Handbook</i>, 1943, section 2, both from memory):
/// <code>
/// Rac/Rdc   = (x/2)·[ber(x)·bei′(x) − bei(x)·ber′(x)] / [ber′(x)² + bei′(x)²]
/// X_int/Rdc = (x/2)·[ber(x)·ber′(x) + bei(x)·bei′(x)] / [ber′(x)² + bei′(x)²]
/// </code>
/// (Kelvin-function form as in S. Ramo et al. and H. B. Dwight, from memory; equal to Re/Im of (ka/2)·J0(ka)/J1(ka)
/// with ka = (1 − j)·r/δ, physics-sources.md §4.2).
/// </summary>
/// <remarks>
/// <para>
/// Validity: a straight wire far from other conductors, carrying a sinusoidal current, μr = 1. A wire in a winding also
/// has proximity loss (use <see cref="DowellFactor"/> or <see cref="WindingAcResistance"/>); a winding on a ferrite
/// core is not an isolated wire.
/// </para>
/// <para>
/// Numerics. The Kelvin functions come from MathNet.Numerics 5.0.0 (<see cref="SpecialFunctions.KelvinBer(double)"/>,
/// <see cref="SpecialFunctions.KelvinBei(double)"/>, <see cref="SpecialFunctions.KelvinBerPrime(double)"/>,
/// <see cref="SpecialFunctions.KelvinBeiPrime(double)"/>). They grow as e^(x/√2): the unscaled squares in the denominator
/// overflow to infinity from x ≈ 505 (the ratio then becomes NaN), and the functions themselves return infinity or NaN
/// from x ≈ 990. Both ratios are homogeneous of degree 0 in the four values, so they are divided by the largest of
/// their magnitudes first; the exact form is then finite and accurate to about 1e-13 up to x ≈ 980. Three branches:
/// </para>
/// <list type="bullet">
/// <item><description>x &lt; <see cref="SmallArgumentLimit"/> (0.1): the series Rac/Rdc = 1 + x⁴/192
/// (physics-sources.md §4.2; the next term, −x⁸/46080, is below 3e-13 there) and X_int/Rdc = x²/8 − x⁶/3072 (the power
/// series of ber and bei, Abramowitz and Stegun 9.9.10, from memory; checked numerically, next term below 2e-16).
/// MathNet's derivatives lose relative accuracy at very small x, and the exact ratio can dip below 1 there by
/// rounding.</description></item>
/// <item><description><see cref="SmallArgumentLimit"/> ≤ x &lt; <see cref="LargeArgumentLimit"/> (400): the exact
/// Kelvin-function form above.</description></item>
/// <item><description>x ≥ <see cref="LargeArgumentLimit"/>: the published large-x asymptote Rac/Rdc ≈ x/(2√2) + 1/4
/// (physics-sources.md §4.2) with its next term from Hankel's asymptotic expansion of J0/J1 (Abramowitz and Stegun
/// 9.2.5–9.2.10, from memory; derived here): Rac/Rdc = x/(2√2) + 1/4 + 3/(16√2·x) and
/// X_int/Rdc = x/(2√2) − 3/(16√2·x) − 3/(16·x²). At x = 400 the neglected terms are below 3e-9 in both ratios, so
/// the switch is continuous far below the 6-decimal precision of the check table. Without the 1/x term the
/// jump would be 3.3e-4 at x = 400.</description></item>
/// </list>
/// </remarks>
public static class IsolatedWireSkinEffect
{
    /// <summary>Below this x the small-argument series is used (dimensionless).</summary>
    public const double SmallArgumentLimit = 0.1;

    /// <summary>At and above this x the large-argument asymptote is used (dimensionless).</summary>
    public const double LargeArgumentLimit = 400;

    private static readonly double Sqrt2 = Math.Sqrt(2);

    /// <summary>The argument x = r·√2/δ = d/(√2·δ) for a wire of diameter d.</summary>
    /// <param name="diameter">Bare conductor diameter d, finite and positive.</param>
    /// <param name="skinDepth">Skin depth δ, positive.</param>
    /// <returns>x, dimensionless.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A length is not positive.</exception>
    public static double Argument(Length diameter, Length skinDepth)
    {
        if (diameter.Metres <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(diameter), diameter, "The diameter must be above 0 m.");
        }

        if (skinDepth.Metres <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(skinDepth), skinDepth, "The skin depth must be above 0 m.");
        }

        return diameter.Metres / (Sqrt2 * skinDepth.Metres);
    }

    /// <summary>Rac/Rdc of an isolated round wire (see the class remarks for the formula and branches).</summary>
    /// <param name="x">x = r·√2/δ, finite and at least 0.</param>
    /// <returns>Rac/Rdc, finite and at least 1.</returns>
    public static double ResistanceRatio(double x) => Evaluate(x).ResistanceRatio;

    /// <summary>Z_int/Rdc of an isolated round wire at x = r·√2/δ (see the class remarks for the formula and branches).</summary>
    /// <param name="x">x = r·√2/δ, finite and at least 0.</param>
    /// <returns>Rac/Rdc and X_int/Rdc, both finite, with the branch used.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="x"/> is NaN, infinite or negative.</exception>
    public static InternalImpedanceRatio Evaluate(double x)
    {
        if (!double.IsFinite(x) || x < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(x), x, "x must be a finite number of at least 0.");
        }

        if (x < SmallArgumentLimit)
        {
            var x2 = x * x;
            return new InternalImpedanceRatio(x, 1 + x2 * x2 / 192, x2 / 8 - x2 * x2 * x2 / 3072, SkinEffectMethod.SmallArgumentSeries);
        }

        if (x >= LargeArgumentLimit)
        {
            var leading = x / (2 * Sqrt2);
            var correction = 3 / (16 * Sqrt2 * x);
            return new InternalImpedanceRatio(x, leading + 0.25 + correction, leading - correction - 3 / (16 * x * x), SkinEffectMethod.LargeArgumentAsymptote);
        }

        var ber = SpecialFunctions.KelvinBer(x);
        var bei = SpecialFunctions.KelvinBei(x);
        var berPrime = SpecialFunctions.KelvinBerPrime(x);
        var beiPrime = SpecialFunctions.KelvinBeiPrime(x);
        var scale = Math.Max(Math.Max(Math.Abs(ber), Math.Abs(bei)), Math.Max(Math.Abs(berPrime), Math.Abs(beiPrime)));
        ber /= scale;
        bei /= scale;
        berPrime /= scale;
        beiPrime /= scale;
        var denominator = berPrime * berPrime + beiPrime * beiPrime;
        var resistance = x / 2 * (ber * beiPrime - bei * berPrime) / denominator;
        var reactance = x / 2 * (ber * berPrime + bei * beiPrime) / denominator;
        return new InternalImpedanceRatio(x, resistance, reactance, SkinEffectMethod.KelvinFunctions);
    }
}
