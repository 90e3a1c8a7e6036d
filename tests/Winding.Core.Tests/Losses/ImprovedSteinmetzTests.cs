using Winding.Core.Losses;
using Winding.Core.Materials;

namespace Winding.Core.Tests.Losses;

/// <summary>
/// The iGSE (Venkatachalam et al., IEEE COMPEL 2002; from memory). Expected values: computed from the iGSE in
/// physics-sources.md §8.3 (script t08) with the illustrative parameters k = 10, α = 1.4, β = 2.6 and k = 1, α = 1.2,
/// β = 2.8 (not real materials; f in Hz, B in T, Pv in W/m³), printed to six or seven significant figures.
/// </summary>
public sealed class ImprovedSteinmetzTests
{
    private static readonly SteinmetzParameters SetA = SteinmetzParameters.Create(10, 1.4, 2.6, 1e3, 1e6, 0.001, 0.3);
    private static readonly SteinmetzParameters SetB = SteinmetzParameters.Create(1, 1.2, 2.8, 1e3, 1e6, 0.001, 0.3);

    [Fact]
    public void Coefficient_MatchesCheckValues()
    {
        // physics-sources.md §8.3: k_i = 0.5825804 (set A), 0.060516311 (set B); seven and eight significant figures.
        Assert.Equal(0.5825804, ImprovedSteinmetz.Coefficient(SetA), 0.5825804 * 1e-6);
        Assert.Equal(0.060516311, ImprovedSteinmetz.Coefficient(SetB), 0.060516311 * 1e-7);
    }

    [Theory]
    // triangular flux, B̂ = 0.1 T (ΔB = 0.2 T), 100 kHz, rise fraction D → Pv (W/m³), six significant figures
    [InlineData(0.5, 234140)]
    [InlineData(0.3, 245938)]
    [InlineData(0.2, 265903)]
    [InlineData(0.1, 315402)]
    public void Triangular_MatchesCheckTable(double riseFraction, double expectedWPerM3) =>
        Assert.Equal(expectedWPerM3, ImprovedSteinmetz.TriangularPowerDensityWPerM3(SetA, 0.2, 100e3, riseFraction), expectedWPerM3 * 1e-5);

    [Fact]
    public void Triangular_SetB_RatioToSineMatchesCheckValue()
    {
        // physics-sources.md §8.3: set B, triangle (D = 0.5) / sine at the same B̂ and f = 0.968261.
        var triangle = ImprovedSteinmetz.TriangularPowerDensityWPerM3(SetB, 0.2, 100e3, 0.5);
        var sine = CoreLoss.SinePowerDensityWPerM3(SetB, 0.1, 100e3);

        Assert.Equal(0.968261, triangle / sine, 0.968261 * 1e-5);
    }

    [Fact]
    public void Numeric_Sine_ReturnsTheSteinmetzValue()
    {
        // physics-sources.md §8.3 [DERIVED]: the iGSE applied numerically to a sine returns exactly the Steinmetz value,
        // Pv(sine, 100 kHz, 0.1 T) = 251189 W/m³ with set A.
        const double f = 100e3, peak = 0.1;
        var pv = ImprovedSteinmetz.PowerDensityWPerM3(SetA, t => peak * 2 * Math.PI * f * Math.Cos(2 * Math.PI * f * t), 1 / f, 2 * peak);

        Assert.Equal(251189, pv, 251189 * 1e-5);
    }

    [Theory]
    [InlineData(0.5, 234140)]
    [InlineData(0.3, 245938)]
    public void Numeric_Triangle_MatchesCheckTable(double riseFraction, double expectedWPerM3)
    {
        // physics-sources.md §8.3 [DERIVED]: the numerical iGSE of a triangle equals the closed form (table above).
        const double f = 100e3, swing = 0.2;
        var period = 1 / f;
        double Rate(double t) => t < riseFraction * period ? swing / (riseFraction * period) : -swing / ((1 - riseFraction) * period);

        var pv = ImprovedSteinmetz.PowerDensityWPerM3(SetA, Rate, period, swing);

        Assert.Equal(expectedWPerM3, pv, expectedWPerM3 * 1e-5);
    }

    [Theory]
    [InlineData(0.2, 1e5, 0)]
    [InlineData(0.2, 1e5, 1)]
    [InlineData(-0.1, 1e5, 0.5)]
    [InlineData(0.2, 0, 0.5)]
    [InlineData(double.NaN, 1e5, 0.5)]
    public void Triangular_OutOfRange_Throws(double swingT, double frequencyHz, double riseFraction) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => ImprovedSteinmetz.TriangularPowerDensityWPerM3(SetA, swingT, frequencyHz, riseFraction));
}
