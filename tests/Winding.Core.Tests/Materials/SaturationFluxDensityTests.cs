using Winding.Core.Materials;

namespace Winding.Core.Tests.Materials;

/// <summary>
/// B_sat at a temperature: linear between the 25 °C and 100 °C values, held beyond them (common practice, no source).
/// The pair 0.50 T / 0.38 T is a generic MnZn power ferrite within physics-sources.md §8.2 (common practice, from memory).
/// </summary>
public sealed class SaturationFluxDensityTests
{
    private static readonly SaturationFluxDensity MnZnPower = SaturationFluxDensity.Create(0.50, 0.38);

    [Theory]
    [InlineData(25, 0.50)]
    [InlineData(100, 0.38)]
    [InlineData(62.5, 0.44)] // half-way in temperature, half-way in value
    [InlineData(40, 0.476)] // 15/75 of the way: 0.50 − 0.2·0.12
    [InlineData(-40, 0.50)] // held
    [InlineData(150, 0.38)] // held
    public void AtTemperature_InterpolatesLinearlyAndHoldsTheEnds(double temperatureC, double expectedT) =>
        Assert.Equal(expectedT, MnZnPower.AtTemperatureT(temperatureC), 1e-12);

    [Theory]
    [InlineData(0, 0.38)]
    [InlineData(0.5, -0.1)]
    [InlineData(3.1, 0.38)]
    [InlineData(double.NaN, 0.38)]
    public void Create_OutOfRange_Throws(double at25, double at100) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => SaturationFluxDensity.Create(at25, at100));

    [Fact]
    public void AtTemperature_NaN_Throws() =>
        Assert.Throws<ArgumentOutOfRangeException>(() => MnZnPower.AtTemperatureT(double.NaN));
}
