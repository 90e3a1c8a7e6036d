using Winding.Core.Conductors;
using Winding.Core.Quantities;
using Winding.Core.Wire;

namespace Winding.Core.Tests.Conductors;

/// <summary>
/// F_R of a winding. Solid and hook-up wire: Dowell with the round-wire porosity conversion, checked against the worked
/// examples of physics-sources.md §5 (script t05_dowell.py; tolerance half a unit in the last printed digit). Litz:
/// strand skin effect against the worked wires of §4.2, and the bundle proximity term against Sullivan's formula
/// (1999, from memory) evaluated by hand.
/// </summary>
public sealed class WindingAcResistanceTests
{
    // physics-sources.md §5 worked example: d = 0.5 mm bare, t = 0.544 mm (grade-1 maximum overall diameter, touching).
    [Theory]
    [InlineData(10e3, 1, 1.01186, 5e-6)]
    [InlineData(10e3, 2, 1.05632, 5e-6)]
    [InlineData(10e3, 3, 1.13043, 5e-6)]
    [InlineData(10e3, 4, 1.23417, 5e-6)]
    [InlineData(100e3, 1, 1.79855, 5e-6)]
    [InlineData(100e3, 2, 4.70394, 5e-6)]
    [InlineData(100e3, 3, 9.54625, 5e-6)]
    [InlineData(100e3, 4, 16.3255, 5e-5)]
    [InlineData(1e6, 1, 6.05158, 5e-6)]
    [InlineData(1e6, 2, 18.1124, 5e-5)]
    [InlineData(1e6, 3, 38.2137, 5e-5)]
    [InlineData(1e6, 4, 66.3555, 5e-5)]
    public void Enamelled0p5_MatchesDowellWorkedExample(double frequencyHz, int layers, double expected, double tolerance)
    {
        var wire = WindingWire.Enamelled(Length.FromMillimetres(0.5));

        var result = WindingAcResistance.Evaluate(wire, layers, frequencyHz);

        Assert.Equal(AcResistanceMethod.DowellRoundWire, result.Method);
        Assert.Equal(0.544, result.Pitch.Millimetres, 1e-12);
        Assert.Equal(expected, result.RacPerRdc, tolerance);
    }

    [Theory]
    [InlineData(10e3, 0.605155, 5e-7)]
    [InlineData(100e3, 1.91367, 5e-6)]
    [InlineData(1e6, 6.05155, 5e-6)]
    public void Enamelled0p5_DeltaMatchesDowellWorkedExample(double frequencyHz, double expected, double tolerance)
    {
        // physics-sources.md §5 worked example, column Δ.
        var result = WindingAcResistance.Evaluate(WindingWire.Enamelled(Length.FromMillimetres(0.5)), 1, frequencyHz);

        Assert.Equal(expected, result.DowellDelta, tolerance);
    }

    [Theory]
    [InlineData(1, 2.33534, 5e-6)]
    [InlineData(2, 7.01899, 5e-6)]
    [InlineData(3, 14.8251, 5e-5)]
    [InlineData(4, 25.7536, 5e-5)]
    public void Enamelled0p2At1MHz_MatchesSecondDowellExample(int layers, double expected, double tolerance)
    {
        // physics-sources.md §5 second example: d = 0.2 mm, t = 0.226 mm, 1 MHz → Δ = 2.37521.
        var result = WindingAcResistance.Evaluate(WindingWire.Enamelled(Length.FromMillimetres(0.2)), layers, 1e6);

        Assert.Equal(2.37521, result.DowellDelta, 5e-6);
        Assert.Equal(expected, result.RacPerRdc, tolerance);
    }

    [Fact]
    public void HookUpWireOfTheSamePitch_GivesTheSameDowellFactor()
    {
        // A 0.5 mm conductor with 0.022 mm insulation has a 0.544 mm pitch: physics-sources.md §5, 100 kHz, p = 3.
        var wire = WindingWire.HookUp(Length.FromMillimetres(0.5), Length.FromMillimetres(0.022));

        Assert.Equal(9.54625, WindingAcResistance.Evaluate(wire, 3, 100e3).RacPerRdc, 5e-6);
    }

    [Fact]
    public void ExplicitPitch_OverridesTheOverallDiameter()
    {
        // physics-sources.md §5: the factor depends on d and t only; a 0.6 mm build wound at 0.544 mm gives the table.
        var wire = WindingWire.Solid(Length.FromMillimetres(0.5), Length.FromMillimetres(0.6));

        var result = WindingAcResistance.Evaluate(wire, 2, 1e6, elementPitch: Length.FromMillimetres(0.544));

        Assert.Equal(18.1124, result.RacPerRdc, 5e-5);
    }

    [Fact]
    public void ElementsInHand_CountAsConductorsOfTheLayer()
    {
        // Documented choice: k elements in hand add conductors to each layer at the element pitch, not layers, so the
        // factor is that of one element at the same pitch (physics-sources.md §5, 100 kHz, p = 2).
        var wire = WindingWire.Enamelled(Length.FromMillimetres(0.5)).InHand(3);

        Assert.Equal(4.70394, WindingAcResistance.Evaluate(wire, 2, 100e3).RacPerRdc, 5e-6);
    }

    [Fact]
    public void SkinAndProximityParts_SplitDowellsTwoTerms()
    {
        // physics-sources.md §5, 1 MHz: p = 1 gives 6.05158 (the skin part); p = 4 gives 66.3555 in total.
        var result = WindingAcResistance.Evaluate(WindingWire.Enamelled(Length.FromMillimetres(0.5)), 4, 1e6);

        Assert.Equal(6.05158, result.SkinFactor, 5e-6);
        Assert.Equal(66.3555 - 6.05158, result.ProximityFactor, 6e-5);
    }

    [Fact]
    public void SkinDepthRatio_IsDiameterOverSkinDepth()
    {
        // physics-sources.md §4.1: δ(1 MHz, 20 °C) = 66.0855 µm, so 0.5 mm / δ = 7.56596 (by hand).
        var result = WindingAcResistance.Evaluate(WindingWire.Enamelled(Length.FromMillimetres(0.5)), 1, 1e6);

        Assert.Equal(66.0855, result.SkinDepth.Millimetres * 1e3, 5e-5);
        Assert.Equal(7.56596, result.SkinDepthRatio, 5e-5);
    }

    [Fact]
    public void Litz_StrandSkinFactor_MatchesIsolatedWireWorkedValue()
    {
        // physics-sources.md §4.2 worked wire: 0.1 mm at 10 MHz → x = 3.3836, Rac/Rdc = 1.4498. δ = 20.8981 µm (§4.1),
        // so d/δ = 0.1/0.0208981 = 4.78512 (by hand).
        var wire = WindingWire.Litz(20, Length.FromMillimetres(0.1), Length.FromMillimetres(0.6));

        var result = WindingAcResistance.Evaluate(wire, 1, 10e6);

        Assert.Equal(AcResistanceMethod.LitzStrandSkinAndWindingProximity, result.Method);
        Assert.Equal(1.4498, result.SkinFactor, 5e-5);
        Assert.Equal(4.78512, result.SkinDepthRatio, 5e-5);
        Assert.True(double.IsNaN(result.DowellDelta));
    }

    [Theory]
    [InlineData(20, 0.1, 0.6, 2, 100e3, 0.119782)]
    [InlineData(100, 0.05, 0.8, 3, 500e3, 1.48046)]
    public void Litz_BundleProximity_MatchesSullivanFormula(int strands, double strandMm, double pitchMm, int layers, double frequencyHz, double expected)
    {
        // Sullivan 1999 (IEEE TPEL 14(2), from memory): F_R − 1 = (π·ω·μ0·N·n)²·d⁶·k/(768·ρ²·b²) with N/b = p/t,
        // k = 1, μ0 = 4π×10⁻⁷ H/m, ρ = 1/58 µΩ·m, evaluated by hand in this ω, ρ form (the code uses the δ form).
        // Six significant figures.
        var wire = WindingWire.Litz(strands, Length.FromMillimetres(strandMm), Length.FromMillimetres(pitchMm));

        var result = WindingAcResistance.Evaluate(wire, layers, frequencyHz);

        Assert.Equal(expected, result.ProximityFactor, expected * 5e-6);
    }

    [Fact]
    public void AcResistanceOhm_ScalesTheDcResistance()
    {
        // physics-sources.md §5, 100 kHz, p = 3: F_R = 9.54625; for Rdc = 0.150484 Ω (§11) Rac = 1.43656 Ω (by hand).
        var result = WindingAcResistance.Evaluate(WindingWire.Enamelled(Length.FromMillimetres(0.5)), 3, 100e3);

        Assert.Equal(1.43656, result.AcResistanceOhm(0.150484), 5e-6);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(-5)]
    [InlineData(double.NaN)]
    [InlineData(2e12)]
    public void Evaluate_InvalidFrequency_Throws(double frequencyHz)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(
            () => WindingAcResistance.Evaluate(WindingWire.Enamelled(Length.FromMillimetres(0.5)), 1, frequencyHz));
        Assert.Equal("frequencyHz", ex.ParamName);
    }

    [Fact]
    public void Evaluate_PitchBelowStrand_Throws()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(
            () => WindingAcResistance.Evaluate(WindingWire.Enamelled(Length.FromMillimetres(0.5)), 1, 1e5, elementPitch: Length.FromMillimetres(0.4)));
        Assert.Equal("elementPitch", ex.ParamName);
    }

    [Fact]
    public void Evaluate_ZeroLayers_Throws()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(
            () => WindingAcResistance.Evaluate(WindingWire.Enamelled(Length.FromMillimetres(0.5)), 0, 1e5));
        Assert.Equal("layers", ex.ParamName);
    }
}
