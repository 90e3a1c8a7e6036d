using Winding.Web.Display;

namespace Winding.Web.Tests.Display;

public sealed class LengthFormatTests
{
    [Theory]
    // 36 mm = 1.417 in; 23 mm = 0.906 in (÷ 25.4, to 0.001 in).
    [InlineData(36, UnitSystem.Imperial, "1.417 in")]
    [InlineData(23, UnitSystem.Imperial, "0.906 in")]
    [InlineData(36, UnitSystem.Metric, "36.00 mm")]
    public void Dimension_ShowsTheSystemsUnit(double mm, UnitSystem system, string text)
    {
        Assert.Equal(text, LengthFormat.Dimension(mm, system, 2));
    }

    [Fact]
    public void WireSize_InInches_HasTheTablesTenthOfAMil()
    {
        // ASTM B258 gives AWG 24 as 0.0201 in (physics-sources.md §3.1): the formula value 0.51056 mm shows as that.
        Assert.Equal("0.0201 in", LengthFormat.WireSize(0.51056, UnitSystem.Imperial));
        Assert.Equal("0.511 mm", LengthFormat.WireSize(0.51056, UnitSystem.Metric));
    }

    [Theory]
    // 645.16 mm² = 1 in² exactly; 100 mm² = 0.155 in².
    [InlineData(645.16, "1.00 in²")]
    [InlineData(100, "0.155 in²")]
    public void Area_InSquareInches_HasThreeSignificantFigures(double mm2, string text)
    {
        Assert.Equal(text, LengthFormat.Area(mm2, UnitSystem.Imperial, 2));
    }

    [Fact]
    public void Volume_InCubicInches_HasThreeSignificantFigures()
    {
        // 16 387.064 mm³ = 1 in³ exactly.
        Assert.Equal("1.00 in³", LengthFormat.Volume(16387.064, UnitSystem.Imperial, 0));
        Assert.Equal("16387 mm³", LengthFormat.Volume(16387.064, UnitSystem.Metric, 0));
    }

    [Theory]
    // 254 mm = 10 in; 1234 mm = 48.58 in = 4 ft 0.6 in; 304.8 mm = 12 in = 1 ft exactly; 609.5 mm = 23.996 in → 24.0 in.
    [InlineData(254, "10.0 in")]
    [InlineData(1234, "48.6 in (4 ft 0.6 in)")]
    [InlineData(304.8, "12.0 in (1 ft 0.0 in)")]
    [InlineData(609.5, "24.0 in (2 ft 0.0 in)")]
    [InlineData(302.2, "11.9 in")]
    public void CutLength_InInches_AddsFeetAndInchesFromAFoot(double mm, string text)
    {
        Assert.Equal(text, LengthFormat.CutLength(mm, UnitSystem.Imperial));
    }

    [Fact]
    public void CurrentDensity_InImperial_GivesCircularMilsPerAmpere()
    {
        // 4 A/mm²: 1 A needs 0.25 mm² = 0.25 / 5.067075e-4 = 493.4 cmil (NIST SP 811 circular mil, from memory);
        // 4 A/mm² × 645.16 mm²/in² = 2580.64 A/in².
        Assert.Equal("2581 A/in² (493 cmil/A)", LengthFormat.CurrentDensity(4e6, UnitSystem.Imperial));
        Assert.Equal("4.00 A/mm²", LengthFormat.CurrentDensity(4e6, UnitSystem.Metric));
    }

    [Fact]
    public void SkinDepth_InImperial_IsInInches()
    {
        // 12.07 µm = 0.000475 in (÷ 25.4 mm/in).
        Assert.Equal("0.000475 in", LengthFormat.SkinDepth(12.07e-6, UnitSystem.Imperial));
        Assert.Equal("12.1 µm", LengthFormat.SkinDepth(12.07e-6, UnitSystem.Metric));
    }

    [Fact]
    public void PerLength_CoreFactor_ScalesByTheInchToItsPower()
    {
        // C1 = 1 mm⁻¹ = 25.4 in⁻¹; C2 = 1 mm⁻³ = 25.4³ = 16 387.064 in⁻³ (whole numbers are not rounded further).
        Assert.Equal("25.40 in⁻¹", LengthFormat.PerLength(1, 1, UnitSystem.Imperial, "0.#####"));
        Assert.Equal("16387 in⁻³", LengthFormat.PerLength(1, 3, UnitSystem.Imperial, "0.#####"));
        Assert.Equal("1 mm⁻¹", LengthFormat.PerLength(1, 1, UnitSystem.Metric, "0.#####"));
    }

    [Theory]
    // 1 in = 25.4 mm exactly (NIST SP 811): 33.81 mm = 1.3311 in; 0.012 mm = 0.00047 in; 1.5 mm² = 0.002325 in².
    [InlineData("1 layer, 33.81 mm hole left.", "1 layer, 1.331 in hole left.")]
    [InlineData("(δ = 0.012 mm); above about 2", "(δ = 0.0005 in); above about 2")]
    [InlineData("Copper 10 × 1.5 mm² = 15 mm², within", "Copper 10 × 0.00233 in² = 0.0233 in², within")]
    [InlineData("above 4 A/mm² and 2.27 mm⁻¹ stay", "above 4 A/mm² and 2.27 mm⁻¹ stay")]
    [InlineData("no lengths here", "no lengths here")]
    public void Prose_Imperial_WritesEveryMillimetreFigureInInches(string engine, string shown)
    {
        Assert.Equal(shown, LengthFormat.Prose(engine, UnitSystem.Imperial));
    }

    [Fact]
    public void Prose_Metric_LeavesTheEnginesTextAsItIs()
    {
        const string engine = "Only 0.45 mm of window height is left: 1.2 mm² of copper.";

        Assert.Same(engine, LengthFormat.Prose(engine, UnitSystem.Metric));
    }
}
