using Winding.Core.Quantities;

namespace Winding.Core.Conductors;

/// <summary>
/// Dowell's one-dimensional AC resistance factor of a layered winding (P. L. Dowell, "Effects of eddy currents in
/// transformer windings", Proc. IEE 113(8):1387–1394, 1966, from memory; the usual rewriting of his M′ and D′ functions,
/// physics-sources.md §5):
/// <code>
/// F_R = Rac/Rdc (average over p layers) = Δ·[ς1(Δ) + (2/3)·(p² − 1)·ς2(Δ)]
/// F_m (layer m, m = 1 at the zero-MMF side)  = Δ·[ς1(Δ) + 2·m·(m − 1)·ς2(Δ)]
/// ς1 = (sinh 2Δ + sin 2Δ)/(cosh 2Δ − cos 2Δ),   ς2 = (sinh Δ − sin Δ)/(cosh Δ + cos Δ)
/// </code>
/// Δ is the layer thickness over the skin depth; for round wire use <see cref="RoundWireDelta"/>.
/// </summary>
/// <remarks>
/// <para>
/// Validity: 1-D field (layers span the full window breadth, parallel to the core surface), sinusoidal current, equal
/// current in all turns. For non-sinusoidal currents sum over the harmonics (Hurley, Gath, Breslin, IEEE TPEL 15(2),
/// 2000, from memory). On a toroid the layers are wedge-shaped and F_R is an estimate.
/// </para>
/// <para>
/// Numerics (both switches are continuous to rounding; documented thresholds):
/// </para>
/// <list type="bullet">
/// <item><description>Δ &lt; <see cref="SeriesLimit"/> (0.01): cosh 2Δ − cos 2Δ ≈ 4Δ² cancels (relative error
/// ≈ 2e-16/(4Δ²)), so the low-frequency series F_R = 1 + (5p² − 1)·Δ⁴/45 is used (physics-sources.md §5, confirmed
/// there against the exact form), and per layer F_m = 1 + [4/45 + m(m − 1)/3]·Δ⁴ (the same expansion, ς1 ≈ 1/Δ + 4Δ³/45,
/// ς2 ≈ Δ³/6; derived). The next terms are −[16/4725 + (2/3)(p² − 1)·17/2520]·Δ⁸, at most 4.5e-13·(p/1000)²
/// relative at the switch.</description></item>
/// <item><description>Δ ≥ <see cref="LimitingFormStart"/> (40): sinh and cosh would overflow beyond Δ ≈ 355, so the
/// limiting forms ς1 = ς2 = 1 are used; the neglected terms are at most 2√2·e^(−Δ) &lt; 1.3e-17 (in ς2; e^(−2Δ) in
/// ς1), below double rounding. Then F_R = Δ·[1 + (2/3)(p² − 1)] (a single layer tends to F_R = Δ).</description></item>
/// </list>
/// </remarks>
public static class DowellFactor
{
    /// <summary>Below this Δ the low-frequency series is used.</summary>
    public const double SeriesLimit = 0.01;

    /// <summary>At and above this Δ the limiting forms ς1 = ς2 = 1 are used.</summary>
    public const double LimitingFormStart = 40;

    /// <summary>The largest Δ accepted; it keeps every factor finite for any layer count an <see cref="int"/> can hold.</summary>
    public const double MaximumDelta = 1e100;

    private static readonly double RoundToSquare = Math.Pow(Math.PI / 4, 0.75);

    /// <summary>F_R, the Rac/Rdc factor averaged over a winding of <paramref name="layers"/> layers.</summary>
    /// <param name="delta">Δ, dimensionless, from 0 to <see cref="MaximumDelta"/>.</param>
    /// <param name="layers">p, the number of layers, at least 1.</param>
    /// <returns>F_R, finite and at least 1.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside its range.</exception>
    public static double Average(double delta, int layers)
    {
        RequireDelta(delta);
        ArgumentOutOfRangeException.ThrowIfLessThan(layers, 1);
        var pSquaredMinusOne = (double)layers * layers - 1;
        if (delta < SeriesLimit)
        {
            var d2 = delta * delta;
            return 1 + (5 * pSquaredMinusOne + 4) * d2 * d2 / 45;
        }

        return delta * (Zeta1(delta) + 2.0 / 3.0 * pSquaredMinusOne * Zeta2(delta));
    }

    /// <summary>F_m, the Rac/Rdc factor of layer <paramref name="layer"/>, counted from the zero-MMF side (m = 1).</summary>
    /// <param name="delta">Δ, dimensionless, from 0 to <see cref="MaximumDelta"/>.</param>
    /// <param name="layer">m, at least 1.</param>
    /// <returns>F_m, finite and at least 1. The mean of F_1 … F_p equals <see cref="Average"/> for p layers.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside its range.</exception>
    public static double Layer(double delta, int layer)
    {
        RequireDelta(delta);
        ArgumentOutOfRangeException.ThrowIfLessThan(layer, 1);
        var mTimesMMinusOne = (double)layer * (layer - 1);
        if (delta < SeriesLimit)
        {
            var d2 = delta * delta;
            return 1 + (4.0 / 45.0 + mTimesMMinusOne / 3) * d2 * d2;
        }

        return delta * (Zeta1(delta) + 2 * mTimesMMinusOne * Zeta2(delta));
    }

    /// <summary>
    /// Δ of round wire by the equivalent square conductor and the porosity (E. C. Snelling, <i>Soft Ferrites</i>, 2nd ed.,
    /// 1988; W. G. Hurley, E. Gath, J. G. Breslin, IEEE TPEL 15(2), 2000; both from memory; physics-sources.md §5):
    /// h = (√π/2)·d, η = h/t, Δ = (h/δ)·√η = (π/4)^(3/4)·(d/δ)·√(d/t). The substitution loses accuracy for widely
    /// spaced wire (η &lt; 0.5) and at large Δ.
    /// </summary>
    /// <param name="bareDiameter">d, bare conductor diameter, positive.</param>
    /// <param name="pitch">t, centre-to-centre distance of neighbouring conductors in a layer, at least d.</param>
    /// <param name="skinDepth">δ, positive.</param>
    /// <returns>Δ, dimensionless.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A length is outside its range.</exception>
    public static double RoundWireDelta(Length bareDiameter, Length pitch, Length skinDepth)
    {
        RequirePitch(bareDiameter, pitch);
        if (skinDepth.Metres <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(skinDepth), skinDepth, "The skin depth must be above 0 m.");
        }

        var dM = bareDiameter.Metres;
        return RoundToSquare * (dM / skinDepth.Metres) * Math.Sqrt(dM / pitch.Metres);
    }

    /// <summary>Layer porosity η = h/t = (√π/2)·d/t of round wire at pitch t (Snelling 1988, from memory), at most √π/2.</summary>
    /// <param name="bareDiameter">d, bare conductor diameter, positive.</param>
    /// <param name="pitch">t, centre-to-centre distance of neighbouring conductors in a layer, at least d.</param>
    /// <returns>η, dimensionless.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A length is outside its range.</exception>
    public static double Porosity(Length bareDiameter, Length pitch)
    {
        RequirePitch(bareDiameter, pitch);
        return Math.Sqrt(Math.PI) / 2 * bareDiameter.Metres / pitch.Metres;
    }

    private static double Zeta1(double delta)
    {
        if (delta >= LimitingFormStart)
        {
            return 1;
        }

        var twoDelta = 2 * delta;
        return (Math.Sinh(twoDelta) + Math.Sin(twoDelta)) / (Math.Cosh(twoDelta) - Math.Cos(twoDelta));
    }

    private static double Zeta2(double delta)
    {
        if (delta >= LimitingFormStart)
        {
            return 1;
        }

        return (Math.Sinh(delta) - Math.Sin(delta)) / (Math.Cosh(delta) + Math.Cos(delta));
    }

    private static void RequireDelta(double delta)
    {
        if (!double.IsFinite(delta) || delta < 0 || delta > MaximumDelta)
        {
            throw new ArgumentOutOfRangeException(nameof(delta), delta, "Δ must be a finite number from 0 to 1e100.");
        }
    }

    private static void RequirePitch(Length bareDiameter, Length pitch)
    {
        if (bareDiameter.Metres <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(bareDiameter), bareDiameter, "The bare diameter must be above 0 m.");
        }

        if (pitch < bareDiameter)
        {
            throw new ArgumentOutOfRangeException(nameof(pitch), pitch, "The pitch must be at least the bare diameter.");
        }
    }
}
