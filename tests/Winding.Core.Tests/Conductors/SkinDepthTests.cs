using Winding.Core.Conductors;
using Winding.Core.Wire;

namespace Winding.Core.Tests.Conductors;

/// <summary>
/// δ = √(ρ/(π·f·μ0·μr)) for IEC 60028 copper. Expected values: physics-sources.md §4.1 skin-depth table (script
/// t04), computed from the textbook formula (Ramo, Whinnery, Van Duzer, from memory) with μ0 = 4π×10⁻⁷ H/m; our CODATA
/// μ0 differs by 5.5×10⁻¹⁰ relative. Tolerance: half a unit in the last printed digit.
/// </summary>
public sealed class SkinDepthTests
{
    [Theory]
    [InlineData(50, 9.3459, 5e-5)]
    [InlineData(60, 8.5316, 5e-5)]
    [InlineData(1e3, 2.08981, 5e-6)]
    [InlineData(10e3, 0.660855, 5e-7)]
    [InlineData(100e3, 0.208981, 5e-7)]
    [InlineData(1e6, 0.0660855, 5e-8)]
    [InlineData(10e6, 0.0208981, 5e-8)]
    [InlineData(30e6, 0.0120655, 5e-8)]
    [InlineData(100e6, 0.00660855, 5e-9)]
    public void Of_CopperAt20C_MatchesSkinDepthTable(double frequencyHz, double expectedMm, double toleranceMm)
    {
        var delta = SkinDepth.Of(ConductorMaterial.Copper, frequencyHz);

        Assert.Equal(expectedMm, delta.Millimetres, toleranceMm);
    }

    [Fact]
    public void Of_CopperAt100CAnd1MHz_MatchesSkinDepthTable()
    {
        // physics-sources.md §4.1: at 100 °C and 1 MHz, δ = 75.7652 µm (ρ(T) per IEC 60028, α20 = 0.00393 /K).
        Assert.Equal(75.7652, SkinDepth.Of(ConductorMaterial.Copper, 1e6, 100).Millimetres * 1e3, 5e-5);
    }

    [Fact]
    public void Of_CopperAt60Hz_IsAbout8Point5Millimetres()
    {
        // physics-sources.md §4.1 [READ]: "At 60 Hz in copper, skin depth is about 8.5 mm" (Wikipedia, "Skin effect");
        // "about" read as ±0.05 mm.
        Assert.Equal(8.5, SkinDepth.Of(ConductorMaterial.Copper, 60).Millimetres, 0.05);
    }

    [Fact]
    public void FromResistivity_RelativePermeabilityFour_HalvesTheSkinDepth()
    {
        // δ ∝ 1/√μr follows directly from the formula's published form (Ramo et al., from memory).
        var one = SkinDepth.FromResistivity(1e-7, 1e4).Metres;
        var four = SkinDepth.FromResistivity(1e-7, 1e4, 4).Metres;

        Assert.Equal(one / 2, four, one * 1e-14);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(-1)]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    public void Of_InvalidFrequency_Throws(double frequencyHz)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => SkinDepth.Of(ConductorMaterial.Copper, frequencyHz));
        Assert.Equal("frequencyHz", ex.ParamName);
    }

    [Theory]
    [InlineData(double.NaN)]
    [InlineData(-300)]
    public void Of_InvalidTemperature_Throws(double temperatureC)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => SkinDepth.Of(ConductorMaterial.Copper, 1e6, temperatureC));
        Assert.Equal("temperatureC", ex.ParamName);
    }
}
