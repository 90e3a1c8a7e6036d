using Winding.Core.Parasitics;

namespace Winding.Core.Tests.Parasitics;

/// <summary>
/// Leakage inductance. Overlaid windings: L = μ0·N²·MLT·(Σc + Σa/3)/(M²·b_w) (McLyman 2004 / Snelling 1988, from
/// memory), checked against physics-sources.md §6.1 cases A–D, which the note's script confirms by integrating the MMF
/// profile. Two-wire line: L′ = (μ0/π)·arcosh(D/d) (Ramo, Whinnery, Van Duzer, from memory). Sectored windings: no
/// published formula (physics-sources.md §6.2); only the estimate's arithmetic and a wide plausibility band are tested.
/// Tolerances: half a unit in the last printed digit.
/// </summary>
public sealed class LeakageInductanceTests
{
    [Fact]
    public void OverlaidLayersH_CaseA_PrimaryThenSecondary()
    {
        // physics-sources.md §6.1 case A (P|S): N = 20, MLT = 25 mm, a1 = a2 = 0.4 mm, c = 0.1 mm, b_w = 20 mm → 230.383 nH.
        var h = LeakageInductance.OverlaidLayersH(20, 25e-3, 20e-3, 0.4e-3, 0.4e-3, 0.1e-3);

        Assert.Equal(230.383, h * 1e9, 5e-4);
    }

    [Fact]
    public void OverlaidLayersH_CaseB_SplitPrimaryTwoInterfaces()
    {
        // physics-sources.md §6.1 case B (P/2|S|P/2): as A with the primary split into two 0.2 mm halves (total build
        // 0.4 mm), a 0.1 mm gap at each of the M = 2 interfaces → 73.3038 nH, 0.318182 × case A.
        var b = LeakageInductance.OverlaidLayersH(20, 25e-3, 20e-3, 0.4e-3, 0.4e-3, 0.1e-3, interfaces: 2);
        var a = LeakageInductance.OverlaidLayersH(20, 25e-3, 20e-3, 0.4e-3, 0.4e-3, 0.1e-3);

        Assert.Equal(73.3038, b * 1e9, 5e-5);
        Assert.Equal(0.318182, b / a, 5e-7);
    }

    [Fact]
    public void OverlaidLayersH_CaseC()
    {
        // physics-sources.md §6.1 case C: N = 10, MLT = 20 mm, a1 = a2 = 0.25 mm, c = 0.05 mm, b_w = 10 mm → 54.4543 nH.
        var h = LeakageInductance.OverlaidLayersH(10, 20e-3, 10e-3, 0.25e-3, 0.25e-3, 0.05e-3);

        Assert.Equal(54.4543, h * 1e9, 5e-5);
    }

    [Fact]
    public void OverlaidLayersH_CaseD_UnequalBuilds()
    {
        // physics-sources.md §6.1 case D: N = 50, MLT = 40 mm, a1 = 0.6 mm, a2 = 0.3 mm, c = 1.0 mm, b_w = 15 mm → 10.8909 µH.
        var h = LeakageInductance.OverlaidLayersH(50, 40e-3, 15e-3, 0.6e-3, 0.3e-3, 1.0e-3);

        Assert.Equal(10.8909, h * 1e6, 5e-5);
    }

    [Fact]
    public void OverlaidLayersH_ZeroGap_IsAllowed()
    {
        // Touching windings: c = 0 leaves only Σa/3. Case A without its gap: 230.383 nH × (0.8/3)/(0.1 + 0.8/3) =
        // 230.383 × 8/11 = 167.551 nH (physics-sources.md §6.1 case A, scaled by hand).
        var h = LeakageInductance.OverlaidLayersH(20, 25e-3, 20e-3, 0.4e-3, 0.4e-3, 0);

        Assert.Equal(167.551, h * 1e9, 1e-3);
    }

    [Fact]
    public void TwoWireLinePerMetreHPerM_SpacingTwiceTheDiameter()
    {
        // L′ = (μ0/π)·arcosh(D/d) (Ramo, Whinnery, Van Duzer, from memory). D/d = 2: arcosh 2 = ln(2 + √3) = 1.3169579
        // (mathematical identity), μ0/π = 0.4 µH/m → L′ = 0.526783 µH/m.
        var perMetre = LeakageInductance.TwoWireLinePerMetreHPerM(2e-3, 1e-3);

        Assert.Equal(0.526783, perMetre * 1e6, 5e-7);
    }

    [Fact]
    public void TwoWireLinePerMetreHPerM_TouchingConductors_IsZero()
    {
        // arcosh(1) = 0: touching conductors have no external inductance between them (the formula, Ramo et al.).
        Assert.Equal(0, LeakageInductance.TwoWireLinePerMetreHPerM(1e-3, 1e-3));
    }

    [Fact]
    public void SectoredEstimateH_WorkedByHand()
    {
        // Our derived estimate (no published source, physics-sources.md §6.2): 10 + 10 turns, each enclosing a 6 mm × 11 mm
        // mean turn (a 5 mm × 10 mm section grown by a 0.5 mm build) over a 25 mm arc: each μ0·100·66 mm²/25 mm =
        // 1.2566371 µH/m × 0.264 m = 331.752 nH; the sum referred to the first winding, 663.504 nH (by hand).
        var h = LeakageInductance.SectoredEstimateH(10, 66e-6, 25e-3, 10, 66e-6, 25e-3);

        Assert.Equal(663.504, h * 1e9, 1e-3);
    }

    [Fact]
    public void SectoredEstimateH_ReferredToFirst_DependsOnSecondOnlyThroughItsShape()
    {
        // Referral by (N1/N2)² (physics-sources.md §6.1, "referral to the other winding") cancels the second winding's
        // N2² in μ0·N2²·A/ℓ: the result is μ0·N1²·(A1/ℓ1 + A2/ℓ2) whatever N2 is.
        var five = LeakageInductance.SectoredEstimateH(10, 66e-6, 25e-3, 5, 40e-6, 20e-3);
        var forty = LeakageInductance.SectoredEstimateH(10, 66e-6, 25e-3, 40, 40e-6, 20e-3);

        Assert.Equal(five, forty, five * 1e-14);
    }

    [Fact]
    public void SectoredEstimateH_RingCore_IsWellAboveTheOverlaidEstimate()
    {
        // Plausibility band only. physics-sources.md §6.2 (common practice, no source): sectored leakage is "often one to
        // two orders of magnitude" above overlaid; widened by the estimate's factor of about 3 to 3…300.
        // Ring 25 × 15 × 10 mm, 10 + 10 turns, 0.5 mm builds. Overlaid (§6.2 practice): b_w = π·15 mm, MLT = 34 mm,
        // c = 0.05 mm. Sectored: 6 mm × 11 mm enclosed, two 25 mm arcs on the 62.8 mm mean circumference.
        var overlaid = LeakageInductance.OverlaidLayersH(10, 34e-3, Math.PI * 15e-3, 0.5e-3, 0.5e-3, 0.05e-3);
        var sectored = LeakageInductance.SectoredEstimateH(10, 66e-6, 25e-3, 10, 66e-6, 25e-3);

        var ratio = sectored / overlaid;
        Assert.InRange(ratio, 3, 300);
    }

    [Theory]
    [InlineData(0, 25e-3, 20e-3, 0.4e-3, 0.4e-3, 0.1e-3, 1, "turns")]
    [InlineData(20, 0, 20e-3, 0.4e-3, 0.4e-3, 0.1e-3, 1, "meanTurnLengthM")]
    [InlineData(20, 25e-3, double.NaN, 0.4e-3, 0.4e-3, 0.1e-3, 1, "breadthM")]
    [InlineData(20, 25e-3, 20e-3, 0, 0.4e-3, 0.1e-3, 1, "firstBuildM")]
    [InlineData(20, 25e-3, 20e-3, 0.4e-3, double.PositiveInfinity, 0.1e-3, 1, "secondBuildM")]
    [InlineData(20, 25e-3, 20e-3, 0.4e-3, 0.4e-3, -1e-6, 1, "gapM")]
    [InlineData(20, 25e-3, 20e-3, 0.4e-3, 0.4e-3, 0.1e-3, 0, "interfaces")]
    public void OverlaidLayersH_InvalidArgument_Throws(int n, double mlt, double bw, double a1, double a2, double c, int m, string name)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => LeakageInductance.OverlaidLayersH(n, mlt, bw, a1, a2, c, m));
        Assert.Equal(name, ex.ParamName);
    }

    [Theory]
    [InlineData(0.9e-3, 1e-3, "centreSpacingM")]
    [InlineData(double.NaN, 1e-3, "centreSpacingM")]
    [InlineData(2e-3, 0, "conductorDiameterM")]
    [InlineData(2e-3, double.NegativeInfinity, "conductorDiameterM")]
    public void TwoWireLinePerMetreHPerM_InvalidArgument_Throws(double spacing, double diameter, string name)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => LeakageInductance.TwoWireLinePerMetreHPerM(spacing, diameter));
        Assert.Equal(name, ex.ParamName);
    }

    [Theory]
    [InlineData(0, 1e-5, 1e-2, 1, 1e-5, 1e-2, "firstTurns")]
    [InlineData(1, 0, 1e-2, 1, 1e-5, 1e-2, "firstEnclosedAreaM2")]
    [InlineData(1, 1e-5, double.NaN, 1, 1e-5, 1e-2, "firstArcLengthM")]
    [InlineData(1, 1e-5, 1e-2, -3, 1e-5, 1e-2, "secondTurns")]
    [InlineData(1, 1e-5, 1e-2, 1, -1e-5, 1e-2, "secondEnclosedAreaM2")]
    [InlineData(1, 1e-5, 1e-2, 1, 1e-5, 0, "secondArcLengthM")]
    public void SectoredEstimateH_InvalidArgument_Throws(int n1, double a1, double l1, int n2, double a2, double l2, string name)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => LeakageInductance.SectoredEstimateH(n1, a1, l1, n2, a2, l2));
        Assert.Equal(name, ex.ParamName);
    }
}
