using MathNet.Numerics;
using Winding.Core.Conductors;
using Winding.Core.Quantities;
using Winding.Core.Wire;

namespace Winding.Core.Tests.Conductors;

/// <summary>
/// Exact Rac/Rdc and X_int/Rdc of an isolated round wire (Kelvin-function form, Ramo et al. / Dwight, from memory).
/// Expected values: physics-sources.md §4.2 Kelvin-function table and worked wires [DERIVED there with scipy's Kelvin
/// functions and the complex-Bessel form, agreeing to all printed digits]; the classic NBS C74 / Terman table column is
/// from memory.
/// </summary>
public sealed class IsolatedWireSkinEffectTests
{
    // physics-sources.md §4.2, Kelvin-function table: x, Rac/Rdc, X_int/Rdc, printed to 6 decimals (tolerance 5e-7).
    [Theory]
    [InlineData(0.5, 1.000325, 0.031245)]
    [InlineData(1, 1.005187, 0.124676)]
    [InlineData(1.5, 1.025824, 0.277625)]
    [InlineData(2, 1.078159, 0.480568)]
    [InlineData(2.5, 1.175379, 0.713645)]
    [InlineData(3, 1.318095, 0.950812)]
    [InlineData(4, 1.677869, 1.372646)]
    [InlineData(5, 2.042725, 1.737400)]
    [InlineData(7, 2.743190, 2.451294)]
    [InlineData(10, 3.798576, 3.520241)]
    [InlineData(20, 7.327672, 7.063948)]
    [InlineData(50, 17.930320, 17.674941)]
    [InlineData(100, 35.606665, 35.353994)]
    public void Evaluate_MatchesKelvinFunctionTable(double x, double racPerRdc, double xintPerRdc)
    {
        var z = IsolatedWireSkinEffect.Evaluate(x);

        Assert.Equal(SkinEffectMethod.KelvinFunctions, z.Method);
        Assert.Equal(racPerRdc, z.ResistanceRatio, 5e-7);
        Assert.Equal(xintPerRdc, z.InternalReactanceRatio, 5e-7);
    }

    // physics-sources.md §4.2, "classic table [MEM]" column (NBS Circular C74 / Terman 1943, from memory); tolerance half
    // a unit in the last printed digit.
    [Theory]
    [InlineData(0.5, 1.0003, 5e-5)]
    [InlineData(1, 1.005, 5e-4)]
    [InlineData(2, 1.078, 5e-4)]
    [InlineData(4, 1.678, 5e-4)]
    [InlineData(10, 3.799, 5e-4)]
    [InlineData(50, 17.93, 5e-3)]
    [InlineData(100, 35.61, 5e-3)]
    public void ResistanceRatio_MatchesClassicTableFromMemory(double x, double racPerRdc, double tolerance)
    {
        Assert.Equal(racPerRdc, IsolatedWireSkinEffect.ResistanceRatio(x), tolerance);
    }

    // physics-sources.md §4.2, worked wires (copper, 20 °C): d, f, x, Rac/Rdc; tolerances half a unit in the last digit.
    [Theory]
    [InlineData(0.5, 100e3, 1.6918, 5e-5, 1.04126, 5e-6)]
    [InlineData(0.5, 1e6, 5.34994, 5e-6, 2.16631, 5e-6)]
    [InlineData(0.2, 1e6, 2.13998, 5e-6, 1.10052, 5e-6)]
    [InlineData(1.0, 100e3, 3.3836, 5e-5, 1.4498, 5e-5)]
    [InlineData(0.1, 10e6, 3.3836, 5e-5, 1.4498, 5e-5)]
    [InlineData(2.588, 100e3, 8.75675, 5e-6, 3.36075, 5e-6)]
    public void WorkedWires_MatchCheckValues(double diameterMm, double frequencyHz, double x, double xTolerance, double racPerRdc, double racTolerance)
    {
        var delta = SkinDepth.Of(ConductorMaterial.Copper, frequencyHz);
        var argument = IsolatedWireSkinEffect.Argument(Length.FromMillimetres(diameterMm), delta);

        Assert.Equal(x, argument, xTolerance);
        Assert.Equal(racPerRdc, IsolatedWireSkinEffect.ResistanceRatio(argument), racTolerance);
    }

    [Fact]
    public void MathNetKelvinFunctions_OverflowAtLargeX_WhichIsWhyTheAsymptoteIsUsed()
    {
        // Documents the behaviour the class remarks rely on: the unscaled ratio is NaN by x = 700 and ber itself is not
        // finite at x = 1000.
        const double x = 700;
        var berPrime = SpecialFunctions.KelvinBerPrime(x);
        var beiPrime = SpecialFunctions.KelvinBeiPrime(x);
        var unscaled = x / 2 * (SpecialFunctions.KelvinBer(x) * beiPrime - SpecialFunctions.KelvinBei(x) * berPrime) / (berPrime * berPrime + beiPrime * beiPrime);

        Assert.True(double.IsNaN(unscaled));
        Assert.False(double.IsFinite(SpecialFunctions.KelvinBer(1000)));
        Assert.True(double.IsFinite(IsolatedWireSkinEffect.ResistanceRatio(700)));
        Assert.True(double.IsFinite(IsolatedWireSkinEffect.ResistanceRatio(1000)));
    }

    [Theory]
    [InlineData(IsolatedWireSkinEffect.SmallArgumentLimit)]
    [InlineData(IsolatedWireSkinEffect.LargeArgumentLimit)]
    public void BranchSwitches_AreContinuousToTheTablePrecision(double limit)
    {
        // The table of physics-sources.md §4.2 prints 6 decimals: the jump at each switch must stay below 5e-7.
        var below = IsolatedWireSkinEffect.Evaluate(Math.BitDecrement(limit));
        var at = IsolatedWireSkinEffect.Evaluate(limit);

        Assert.NotEqual(below.Method, at.Method);
        Assert.Equal(below.ResistanceRatio, at.ResistanceRatio, 5e-7);
        Assert.Equal(below.InternalReactanceRatio, at.InternalReactanceRatio, 5e-7);
    }

    [Theory]
    [InlineData(1e3)]
    [InlineData(1e4)]
    [InlineData(1e6)]
    public void LargeX_ApproachesThePublishedAsymptote(double x)
    {
        // physics-sources.md §4.2: Rac/Rdc → x/(2√2) + 1/4 for large x. The published two-term form leaves an error of
        // order 0.133/x (the next term of Hankel's expansion), hence the tolerance 0.14/x.
        var asymptote = x / (2 * Math.Sqrt(2)) + 0.25;

        Assert.Equal(asymptote, IsolatedWireSkinEffect.ResistanceRatio(x), 0.14 / x);
    }

    [Theory]
    [InlineData(0.01, 1.0000000000520833)]
    [InlineData(0.05, 1.0000000325520833)]
    public void SmallX_FollowsTheSeries(double x, double expected)
    {
        // physics-sources.md §4.2: Rac/Rdc ≈ 1 + x⁴/192 for small x; expected = 1 + x⁴/192 evaluated by hand.
        var z = IsolatedWireSkinEffect.Evaluate(x);

        Assert.Equal(SkinEffectMethod.SmallArgumentSeries, z.Method);
        Assert.Equal(expected, z.ResistanceRatio, 1e-15);
    }

    [Fact]
    public void Zero_GivesDcValues()
    {
        var z = IsolatedWireSkinEffect.Evaluate(0);

        Assert.Equal(1, z.ResistanceRatio);
        Assert.Equal(0, z.InternalReactanceRatio);
    }

    [Theory]
    [InlineData(-1e-9)]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    public void Evaluate_InvalidX_Throws(double x)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => IsolatedWireSkinEffect.Evaluate(x));
        Assert.Equal("x", ex.ParamName);
    }
}
