using Winding.Core.Geometry;
using Winding.Core.Magnetics;
using Winding.Core.Materials;
using Winding.Core.Quantities;

namespace Winding.Core.Tests.Magnetics;

/// <summary>
/// Winding impedance from the series complex permeability, Z = jω·L0·(μs′ − jμs″) with L0 = μ0·N²/C1, and its parallel
/// form (IEC 60401-3 notation; Snelling 1988). Expected values: computed from these formulas in physics-sources.md §2.2
/// (script t02_inductance.py) for N = 10 on the ring 10/5/4 mm (L0 = 55.4518 nH), printed to six significant figures,
/// hence a relative tolerance of 1e-5. The script used μ0 = 4π×10⁻⁷ H/m; the CODATA value differs by 5.5×10⁻¹⁰.
/// </summary>
public sealed class WindingImpedanceTests
{
    private const double Relative = 1e-5;

    private static readonly EffectiveParameters Ring10x5x4 =
        ToroidCore.Create(Length.FromMillimetres(10), Length.FromMillimetres(5), Length.FromMillimetres(4)).EffectiveParameters();

    [Theory]
    // f, μs′, μs″ → R_s, X_s, |Z| (Ω), tan δ, μp′, μp″, R_p (Ω), L_p (µH)
    [InlineData(1e6, 125, 2, 0.696828, 43.5517, 43.5573, 0.016, 125.032, 7814.5, 2722.68, 6.93325)]
    [InlineData(10e6, 100, 40, 139.366, 348.414, 375.253, 0.4, 116, 290, 1010.40, 6.43241)]
    [InlineData(100e6, 20, 60, 2090.48, 696.828, 2203.56, 3, 200, 66.6667, 2322.76, 11.0904)]
    public void Calculate_Ring10x5x4TenTurns_MatchesCheckTable(
        double frequencyHz, double muPrime, double muDoublePrime,
        double rsOhm, double xsOhm, double zOhm, double tanDelta, double muPParallelPrime, double muPParallelDoublePrime, double rpOhm, double lpMicrohenries)
    {
        var z = WindingImpedance.Calculate(10, Ring10x5x4, frequencyHz, muPrime, muDoublePrime);

        AssertRelative(55.4518e-9, z.AirInductanceH);
        AssertRelative(rsOhm, z.SeriesResistanceOhm);
        AssertRelative(xsOhm, z.SeriesReactanceOhm);
        AssertRelative(zOhm, z.MagnitudeOhm);
        AssertRelative(tanDelta, z.LossTangent);
        AssertRelative(muPParallelPrime, z.ParallelMuPrime);
        AssertRelative(muPParallelDoublePrime, z.ParallelMuDoublePrime!.Value);
        AssertRelative(rpOhm, z.ParallelResistanceOhm!.Value);
        AssertRelative(lpMicrohenries, z.ParallelInductanceH * 1e6);
        AssertRelative(zOhm, z.ImpedanceOhm.Magnitude);
        Assert.False(z.IsPermeabilityExtrapolated);
    }

    [Fact]
    public void Calculate_ConstantCurveMu125_IsTheLosslessAlInductance()
    {
        // physics-sources.md §2.2: μr = 125, N = 10 on ring 10/5/4 → L = 6.93147 µH (AL = μ0·μr/C1, IEC 60205).
        var z = WindingImpedance.Calculate(10, Ring10x5x4, 1e6, ComplexPermeabilityCurve.Constant(125));

        AssertRelative(6.93147e-6, z.SeriesInductanceH);
        AssertRelative(6.93147e-6, z.ParallelInductanceH);
        Assert.Equal(0, z.SeriesResistanceOhm);
        Assert.Null(z.ParallelResistanceOhm);
        Assert.Null(z.ParallelMuDoublePrime);
    }

    [Fact]
    public void Calculate_FromCurveOutsideTable_IsFlaggedAndUsesTheEndValue()
    {
        // The 1 MHz row of physics-sources.md §2.2 held down to 500 kHz: R_s scales with ω, so half of 0.696828 Ω.
        var curve = ComplexPermeabilityCurve.Create([new(1e6, 125, 2), new(10e6, 100, 40)]);

        var z = WindingImpedance.Calculate(10, Ring10x5x4, 0.5e6, curve);

        Assert.True(z.IsPermeabilityExtrapolated);
        AssertRelative(0.348414, z.SeriesResistanceOhm);
    }

    [Theory]
    [InlineData(0, 1e6, 125, 2)]
    [InlineData(10, 0, 125, 2)]
    [InlineData(10, double.NaN, 125, 2)]
    [InlineData(10, 1e6, 0, 2)]
    [InlineData(10, 1e6, 125, -1)]
    [InlineData(10, 1e6, 125, double.PositiveInfinity)]
    public void Calculate_OutOfRange_Throws(int turns, double frequencyHz, double muPrime, double muDoublePrime) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => WindingImpedance.Calculate(turns, Ring10x5x4, frequencyHz, muPrime, muDoublePrime));

    private static void AssertRelative(double expected, double actual) =>
        Assert.Equal(expected, actual, Math.Abs(expected) * Relative);
}
