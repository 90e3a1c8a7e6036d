using Winding.Core.Thermal;

namespace Winding.Core.Tests.Thermal;

/// <summary>
/// Temperature rise in still air. Expected values: computed in physics-sources.md §10 (script t10_thermal.py) from
/// (a) McLyman 2004 ch. 6, ΔT = 450·ψ^0.826 (from memory), (b) the ferrite-core rule ΔT = (mW/cm²)^0.833 (read in
/// Zurek, Encyclopedia Magnetica) and (d) ΔT = P/(h·A) with h = 12 W/(m²·K) (common practice, no source). Printed to six
/// significant figures, hence 1e-5 relative. The relations themselves are only good to ±30 % or worse.
/// </summary>
public sealed class TemperatureRiseTests
{
    private const double Relative = 1e-5;

    [Theory]
    // P (W), A (cm²) → (a) McLyman, (b) rule, (d) h = 12 (K)
    [InlineData(0.1, 2, 37.8932, 26.0161, 41.6667)]
    [InlineData(0.3, 10, 24.8493, 16.9997, 25.0000)]
    [InlineData(1.0, 10, 67.1757, 46.3447, 83.3333)]
    [InlineData(2.0, 30, 48.0575, 33.0610, 55.5556)]
    public void Estimate_MatchesCheckTable(double powerW, double areaCm2, double mcLymanK, double ruleK, double convectionK)
    {
        var rise = TemperatureRise.Estimate(powerW, areaCm2 * 1e-4);

        Assert.Equal(mcLymanK, rise.RiseK, mcLymanK * Relative);
        Assert.Equal(ruleK, rise.FerriteCoreRuleRiseK, ruleK * Relative);
        Assert.Equal(convectionK, rise.ConvectionRiseK, convectionK * Relative);
        Assert.Equal(TemperatureRiseMethod.SurfaceDissipation, TemperatureRise.PrimaryMethod);
    }

    [Theory]
    // physics-sources.md §10: allowed power for ΔT = 40 K on A = 10 cm².
    [InlineData(TemperatureRiseMethod.SurfaceDissipation, 0.533849)]
    [InlineData(TemperatureRiseMethod.FerriteCoreRule, 0.837995)]
    [InlineData(TemperatureRiseMethod.ConvectionCoefficient, 0.48)]
    public void AllowedPower_MatchesCheckValues(TemperatureRiseMethod method, double expectedW) =>
        Assert.Equal(expectedW, TemperatureRise.AllowedPowerW(method, 40, 10e-4), expectedW * Relative);

    [Fact]
    public void Estimate_NoPower_NoRise()
    {
        var rise = TemperatureRise.Estimate(0, 3e-4);

        Assert.Equal(0, rise.RiseK);
        Assert.Equal(0, rise.FerriteCoreRuleRiseK);
        Assert.Equal(0, rise.ConvectionRiseK);
    }

    [Theory]
    [InlineData(-0.1, 1e-3)]
    [InlineData(double.NaN, 1e-3)]
    [InlineData(1, 0)]
    [InlineData(1, double.PositiveInfinity)]
    public void Estimate_OutOfRange_Throws(double powerW, double areaM2) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => TemperatureRise.Estimate(powerW, areaM2));
}
