using Winding.Core.Parasitics;

namespace Winding.Core.Tests.Parasitics;

/// <summary>
/// Stray capacitances. Expected values are the worked checks of physics-sources.md §7 (scripts t07): §7.1 series
/// dielectric layers (electrostatics), §7.2 the energy-method self-capacitance of layered windings (Snelling 1988 /
/// Dalessandro et al. 2007, from memory, confirmed there by the energy integral), §7.3 the Massarini–Kazimierczuk 1997
/// turn-to-turn capacitance (formulas from memory, see the note's "could not verify" item 3) and the exact ladder
/// solution. Two-wire line: Ramo, Whinnery, Van Duzer (from memory). Tolerances: half a unit in the last printed digit
/// unless stated.
/// </summary>
public sealed class CapacitanceTests
{
    private const double Area600Mm2 = 600e-6;

    private static readonly DielectricLayer Enamel = new(0.020e-3, 3.5);
    private static readonly DielectricLayer Tape = new(0.050e-3, 3.2);
    private static readonly DielectricLayer Air = new(0.050e-3, 1.0);

    [Fact]
    public void LayeredPlateF_EnamelTapeAndAir()
    {
        // physics-sources.md §7.1: A = 600 mm², enamel 2 × 0.020 mm (ε 3.5) + tape 0.050 mm (ε 3.2) + air 0.050 mm
        // → 68.9457 pF; effective ε_r of the stack 1.81692.
        DielectricLayer[] stack = [Enamel, Enamel, Tape, Air];

        Assert.Equal(68.9457, Capacitance.LayeredPlateF(Area600Mm2, stack) * 1e12, 5e-5);
        Assert.Equal(1.81692, Capacitance.EffectivePermittivity(stack), 5e-6);
    }

    [Fact]
    public void LayeredPlateF_WithoutTheAirLayer()
    {
        // physics-sources.md §7.1: the same stack without the air layer → 196.370 pF.
        Assert.Equal(196.370, Capacitance.LayeredPlateF(Area600Mm2, [Enamel, Enamel, Tape]) * 1e12, 5e-4);
    }

    [Fact]
    public void LayeredPlateF_AirOnly()
    {
        // physics-sources.md §7.1: air only, 0.14 mm → 37.9465 pF.
        Assert.Equal(37.9465, Capacitance.LayeredPlateF(Area600Mm2, [new DielectricLayer(0.14e-3, 1.0)]) * 1e12, 5e-5);
    }

    [Fact]
    public void LayeredPlateF_ZeroThicknessLayer_ChangesNothing()
    {
        // A layer of zero thickness adds t/ε = 0 to the series sum (physics-sources.md §7.1, the formula): still 37.9465 pF.
        DielectricLayer[] stack = [new(0, 3.5), new(0.14e-3, 1.0), new(0, 1.0)];

        Assert.Equal(37.9465, Capacitance.LayeredPlateF(Area600Mm2, stack) * 1e12, 5e-5);
    }

    [Theory]
    [InlineData(2, 16.6667, 12.5)]
    [InlineData(3, 14.8148, 11.1111)]
    [InlineData(4, 12.5, 9.375)]
    [InlineData(5, 10.6667, 8)]
    [InlineData(10, 6, 4.5)]
    public void MultilayerSelfF_LayerToLayer50pF_MatchesTable(int layers, double zWindingPf, double flybackPf)
    {
        // physics-sources.md §7.2 check table, C_l = 50 pF.
        Assert.Equal(zWindingPf, Capacitance.MultilayerSelfF(50e-12, layers) * 1e12, 5e-5);
        Assert.Equal(flybackPf, Capacitance.MultilayerSelfF(50e-12, layers, flyback: true) * 1e12, 5e-5);
    }

    [Fact]
    public void MultilayerSelfF_OneLayer_IsZero()
    {
        // (n − 1)/n² = 0 for n = 1: a single layer has no layer-to-layer capacitance (physics-sources.md §7.2).
        Assert.Equal(0, Capacitance.MultilayerSelfF(50e-12, 1));
        Assert.Equal(0, Capacitance.MultilayerSelfF(50e-12, 1, flyback: true));
    }

    [Theory]
    [InlineData(0.25e-3, 0.272e-3, 20e-3, 0.219977, 2.55917)]
    [InlineData(0.25e-3, 0.283e-3, 20e-3, 0.266967, 1.99240)]
    [InlineData(0.10e-3, 0.1085e-3, 15e-3, 0.216332, 1.96007)]
    [InlineData(0.50e-3, 0.531e-3, 30e-3, 0.185668, 4.73128)]
    public void TurnToTurnF_MatchesCheckTable(double rc, double ro, double lt, double thetaRad, double cttPf)
    {
        // physics-sources.md §7.3 check table (Massarini & Kazimierczuk 1997, from memory), ε_r = 3.5.
        Assert.Equal(thetaRad, Capacitance.CoatingAngleRad(rc, ro, 3.5), 5e-7);
        Assert.Equal(cttPf, Capacitance.TurnToTurnF(rc, ro, 3.5, lt) * 1e12, 5e-6);
    }

    [Theory]
    [InlineData(0.25e-3, 0.272e-3, 20e-3, 127.959)]
    [InlineData(0.25e-3, 0.283e-3, 20e-3, 99.620)]
    [InlineData(0.10e-3, 0.1085e-3, 15e-3, 130.671)]
    [InlineData(0.50e-3, 0.531e-3, 30e-3, 157.709)]
    public void TurnToTurnF_PerMetre_MatchesCheckTable(double rc, double ro, double lt, double pfPerM)
    {
        // physics-sources.md §7.3 check table, last column (C_tt per length).
        Assert.Equal(pfPerM, Capacitance.TurnToTurnF(rc, ro, 3.5, lt) / lt * 1e12, 5e-4);
    }

    [Theory]
    [InlineData(2, 2.55917, 5.11834)]
    [InlineData(3, 1.27959, 3.83876)]
    [InlineData(5, 0.639793, 3.51886)]
    [InlineData(10, 0.284352, 3.49592)]
    [InlineData(20, 0.134693, 3.49589)]
    [InlineData(50, 0.052228, 3.49589)]
    public void SingleLayerSelfF_Ctt2p55917_MatchesTable(int turns, double noCorePf, double conductiveCorePf)
    {
        // physics-sources.md §7.3, single layer with C_tt = 2.55917 pF. The table was computed from the unrounded C_tt,
        // so the tolerance is the printed half unit plus C_tt's own rounding (5e-6 pF × at most 2).
        Assert.Equal(noCorePf, Capacitance.SingleLayerSelfF(2.55917e-12, turns, conductiveCore: false) * 1e12, 1e-5);
        Assert.Equal(conductiveCorePf, Capacitance.SingleLayerSelfF(2.55917e-12, turns, conductiveCore: true) * 1e12, 1.5e-5);
    }

    [Theory]
    [InlineData(2, 2.000, 5e-4)]
    [InlineData(3, 1.500, 5e-4)]
    [InlineData(5, 1.375, 5e-4)]
    [InlineData(10, 1.366038, 5e-7)]
    [InlineData(20, 1.366025, 5e-7)]
    public void SingleLayerSelfF_ConductiveCore_MatchesExactLadderRatios(int turns, double ratio, double tolerance)
    {
        // physics-sources.md §7.3 [DERIVED]: exact nodal solution of the ladder (series C_tt, C_tc = 2·C_tt to a
        // floating core), C_s/C_tt.
        Assert.Equal(ratio, Capacitance.SingleLayerSelfF(1e-12, turns, conductiveCore: true) / 1e-12, tolerance);
    }

    [Theory]
    [InlineData(41)]
    [InlineData(1000)]
    [InlineData(100_000)]
    [InlineData(int.MaxValue)]
    public void SingleLayerSelfF_ConductiveCore_ManyTurns_IsTheInfiniteLadderLimit(int turns)
    {
        // physics-sources.md §7.3 [DERIVED]: the infinite ladder gives x² − 2x − 2 = 0, C_s = (1 + √3)/2·C_tt =
        // 1.3660254037844386·C_tt.
        Assert.Equal(1.3660254037844386, Capacitance.SingleLayerSelfF(1, turns, conductiveCore: true), 1e-15);
    }

    [Fact]
    public void SingleLayerSelfF_ConductiveCore_ExactMeetsLimitAtTheSwitch()
    {
        // The documented switch: at SingleLayerExactMaxTurns the exact ladder already equals the limit to 1e-9
        // relative (it is within 2.4e-11 at N = 20, physics-sources.md §7.3 ladder values and the (2 − √3)^N decay).
        var exact = Capacitance.SingleLayerSelfF(1, Capacitance.SingleLayerExactMaxTurns, conductiveCore: true);
        var limit = Capacitance.SingleLayerSelfF(1, Capacitance.SingleLayerExactMaxTurns + 1, conductiveCore: true);

        Assert.Equal(limit, exact, 1e-9);
    }

    [Fact]
    public void SingleLayerSelfF_OneTurn_IsZero()
    {
        // One turn has no neighbour, so no turn-to-turn capacitance (brief for the engine; C_tt/(N − 1) is undefined).
        Assert.Equal(0, Capacitance.SingleLayerSelfF(2.55917e-12, 1, conductiveCore: false));
        Assert.Equal(0, Capacitance.SingleLayerSelfF(2.55917e-12, 1, conductiveCore: true));
    }

    [Fact]
    public void TwoWireLinePerMetreFPerM_SpacingTwiceTheDiameterInAir()
    {
        // C′ = π·ε0·ε/arcosh(D/d) (Ramo et al., from memory). D/d = 2: arcosh 2 = ln(2 + √3) = 1.3169579, π·ε0 =
        // 27.81625 pF/m → C′ = 21.1216 pF/m.
        var perMetre = Capacitance.TwoWireLinePerMetreFPerM(2e-3, 1e-3, 1);

        Assert.Equal(21.1216, perMetre * 1e12, 5e-5);
    }

    [Fact]
    public void TwoWireLine_SpacingTwiceTheDiameterInAir_Has158OhmImpedance()
    {
        // Z0 = √(L′/C′) = (η0/π)·arcosh(D/d) ≈ 120·arcosh(D/d) Ω in air (Ramo et al., from memory): 120 × 1.31696 =
        // 158.0 Ω; "120" stands for η0/π = 119.917, so ±0.15 Ω.
        var l = LeakageInductance.TwoWireLinePerMetreHPerM(2e-3, 1e-3);
        var c = Capacitance.TwoWireLinePerMetreFPerM(2e-3, 1e-3, 1);

        Assert.Equal(158.0, Math.Sqrt(l / c), 0.15);
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2.3)]
    [InlineData(3.5)]
    public void TwoWireLine_WaveSpeedIsLightSpeedOverRootPermittivity(double permittivity)
    {
        // Physical identity of a TEM line: L′·C′ = μ0·ε0·ε_eff, i.e. the wave speed 1/√(L′C′) = c0/√ε_eff with
        // c0 = 299 792 458 m/s (SI, exact); CODATA μ0·ε0 = 1/c0² to 1e-10.
        var l = LeakageInductance.TwoWireLinePerMetreHPerM(3.7e-3, 0.8e-3);
        var c = Capacitance.TwoWireLinePerMetreFPerM(3.7e-3, 0.8e-3, permittivity);

        Assert.Equal(299_792_458 / Math.Sqrt(permittivity), 1 / Math.Sqrt(l * c), 1e-9 * 299_792_458);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(double.NaN)]
    public void LayeredPlateF_InvalidArea_Throws(double area)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Capacitance.LayeredPlateF(area, [Air]));
        Assert.Equal("areaM2", ex.ParamName);
    }

    [Theory]
    [InlineData(-1e-6, 1)]
    [InlineData(double.NaN, 1)]
    [InlineData(1e-5, 0.5)]
    [InlineData(1e-5, double.PositiveInfinity)]
    [InlineData(0, 1)]
    public void LayeredPlateF_InvalidLayers_Throw(double thickness, double permittivity)
    {
        // The last row: a stack without any thickness would have infinite capacitance.
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Capacitance.LayeredPlateF(1e-4, [new DielectricLayer(thickness, permittivity)]));
        Assert.Equal("layers", ex.ParamName);
    }

    [Fact]
    public void LayeredPlateF_NoLayers_Throws()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Capacitance.LayeredPlateF(1e-4, []));
        Assert.Throws<ArgumentNullException>(() => Capacitance.LayeredPlateF(1e-4, null!));
    }

    [Theory]
    [InlineData(0, 2, "layerToLayerF")]
    [InlineData(double.NaN, 2, "layerToLayerF")]
    [InlineData(50e-12, 0, "layers")]
    public void MultilayerSelfF_InvalidArgument_Throws(double cl, int layers, string name)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Capacitance.MultilayerSelfF(cl, layers));
        Assert.Equal(name, ex.ParamName);
    }

    [Theory]
    [InlineData(0, 0.3e-3, 3.5, 20e-3, "conductorRadiusM")]
    [InlineData(0.25e-3, 0.25e-3, 3.5, 20e-3, "outerRadiusM")]
    [InlineData(0.25e-3, 0.2e-3, 3.5, 20e-3, "outerRadiusM")]
    [InlineData(0.25e-3, double.NaN, 3.5, 20e-3, "outerRadiusM")]
    [InlineData(0.25e-3, 0.3e-3, 0.9, 20e-3, "coatingPermittivity")]
    [InlineData(0.25e-3, 0.3e-3, 3.5, 0, "turnLengthM")]
    public void TurnToTurnF_InvalidArgument_Throws(double rc, double ro, double permittivity, double lt, string name)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Capacitance.TurnToTurnF(rc, ro, permittivity, lt));
        Assert.Equal(name, ex.ParamName);
    }

    [Fact]
    public void TurnToTurnF_OutsideTheArccosDomain_ThrowsWithTheReason()
    {
        // θ* = arccos(1 − ln(r_o/r_c)/ε_r) needs ln(r_o/r_c) ≤ 2·ε_r: with ε_r = 1, r_o/r_c = e^2.1 is outside.
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Capacitance.TurnToTurnF(1e-3, 1e-3 * Math.Exp(2.1), 1, 20e-3));
        Assert.Equal("outerRadiusM", ex.ParamName);
        Assert.Contains("2·ε_r", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void TurnToTurnF_CoatingThickerThanTheCell_UsesTheWholeCellCoatingTerm()
    {
        // Our extension (documented): for θ* > π/6 the whole cell −π/6…π/6 is coating-dominated,
        // C_tt = ε0·l_t·ε_r·(π/6)/ln(r_o/r_c). Insulated wire r_c = 0.5 mm, r_o = 1.0 mm, ε_r = 3.5, l_t = 20 mm:
        // 8.8541878 pF/m × 0.02 m × 3.5 × 0.5235988/0.6931472 = 0.468188 pF (by hand).
        Assert.True(Capacitance.CoatingAngleRad(0.5e-3, 1.0e-3, 3.5) > Math.PI / 6);
        Assert.Equal(0.468188, Capacitance.TurnToTurnF(0.5e-3, 1.0e-3, 3.5, 20e-3) * 1e12, 5e-6);
    }

    [Theory]
    [InlineData(0, 2, "turnToTurnF")]
    [InlineData(double.PositiveInfinity, 2, "turnToTurnF")]
    [InlineData(1e-12, 0, "turns")]
    public void SingleLayerSelfF_InvalidArgument_Throws(double ctt, int turns, string name)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Capacitance.SingleLayerSelfF(ctt, turns, conductiveCore: true));
        Assert.Equal(name, ex.ParamName);
    }

    [Theory]
    [InlineData(1e-3, 1e-3, 1, "centreSpacingM")]
    [InlineData(0.5e-3, 1e-3, 1, "centreSpacingM")]
    [InlineData(2e-3, 0, 1, "conductorDiameterM")]
    [InlineData(2e-3, 1e-3, 0.99, "effectivePermittivity")]
    [InlineData(2e-3, 1e-3, double.NaN, "effectivePermittivity")]
    public void TwoWireLinePerMetreFPerM_InvalidArgument_Throws(double spacing, double diameter, double permittivity, string name)
    {
        // D = d (touching) would give an infinite capacitance, so the spacing must exceed the diameter.
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Capacitance.TwoWireLinePerMetreFPerM(spacing, diameter, permittivity));
        Assert.Equal(name, ex.ParamName);
    }
}
