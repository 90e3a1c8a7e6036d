using CsCheck;
using Winding.Core.Wire;

namespace Winding.Core.Tests.Wire;

/// <summary>
/// AWG conductor diameters by the ASTM B258 formula d = 0.127 mm · 92^((36 − n)/39), checked against the formula
/// column of physics-sources.md §3.1 (script t03_wire.py), and the magnet-wire builds of the table.
/// </summary>
public sealed class AwgWireTableTests
{
    [Theory]
    // gauge, d (mm, formula column, 5 decimals), area (mm², 6 s.f.), R′ at 20 °C (Ω/m, 5–6 s.f.): physics-sources.md §3.1
    [InlineData(10, 2.58819, 5.26115, 0.00327711)]
    [InlineData(20, 0.81182, 0.517619, 0.033309)]
    [InlineData(22, 0.64380, 0.325534, 0.0529634)]
    [InlineData(24, 0.51056, 0.20473, 0.0842151)]
    [InlineData(26, 0.40489, 0.128756, 0.133907)]
    [InlineData(28, 0.32109, 0.0809755, 0.212921)]
    [InlineData(30, 0.25464, 0.050926, 0.338557)]
    [InlineData(32, 0.20194, 0.0320277, 0.538327)]
    [InlineData(36, 0.12700, 0.0126677, 1.36105)]
    [InlineData(40, 0.07987, 0.00501036, 3.44114)]
    public void ConductorDiameter_MatchesAstmB258FormulaColumn(int gauge, double diameterMm, double areaMm2, double ohmPerMetre)
    {
        // Diameters are printed to 0.00001 mm (tolerance half of that); areas and resistances to 5–6 significant
        // figures (half a unit in the fifth figure of 0.033309 or 0.20473 is at most 2.5e-5 relative).
        Assert.Equal(diameterMm, AwgWireTable.ConductorDiameter(gauge).Millimetres, 0.000005);

        Assert.True(StandardWireTable.TryFind($"awg-{gauge}-heavy", out var wire));
        Assert.Equal(areaMm2, wire.ConductorAreaM2 * 1e6, areaMm2 * 2.5e-5);
        Assert.Equal(ohmPerMetre, wire.ResistancePerMetre20COhmPerM, ohmPerMetre * 2.5e-5);
    }

    [Theory]
    // ASTM B258 table, inches to 0.1 mil (physics-sources.md §3.1, from memory): the formula rounds to these values.
    [InlineData(10, 0.1019)]
    [InlineData(20, 0.0320)]
    [InlineData(24, 0.0201)]
    [InlineData(30, 0.0100)]
    [InlineData(32, 0.0080)]
    [InlineData(40, 0.0031)]
    public void ConductorDiameter_RoundsToAstmB258TableInches(int gauge, double inches)
    {
        Assert.Equal(inches, AwgWireTable.ConductorDiameter(gauge).Millimetres / 25.4, 0.00005);
    }

    [Fact]
    public void ConductorDiameter_DefiningPointsOfTheGauge()
    {
        // The AWG definition (ASTM B258, physics-sources.md §3.1): AWG 36 is 0.005 in, AWG 0000 (n = −3) is 0.46 in.
        Assert.Equal(0.005 * 25.4, AwgWireTable.ConductorDiameter(36).Millimetres, 1e-12);
        Assert.Equal(0.46 * 25.4, AwgWireTable.ConductorDiameter(-3).Millimetres, 1e-9);
    }

    [Fact]
    public void ConductorDiameter_SixGaugesHalveTheDiameter()
    {
        // physics-sources.md §3.1: the diameter ratio for 6 gauges is 2.005032 (7 significant figures).
        Assert.Equal(2.005032, AwgWireTable.ConductorDiameter(20).Metres / AwgWireTable.ConductorDiameter(26).Metres, 5e-7);
    }

    [Fact]
    public void Wire_Awg24HeavyBuild_HasTheTabulatedOverallDiameter()
    {
        // NEMA MW 1000 heavy build, AWG 24: maximum overall diameter 0.0223 in = 0.56642 mm (from memory).
        var wire = AwgWireTable.Wire(24, AwgBuild.Heavy);

        Assert.Equal("AWG 24, heavy build", wire.Description);
        Assert.Equal(0.56642, wire.ElementOverallDiameter.Millimetres, 1e-9);
        Assert.Equal(0.51056, wire.StrandDiameter.Millimetres, 0.000005); // physics-sources.md §3.1
        Assert.Same(ConductorMaterial.Copper, wire.Metal);
        Assert.False(wire.OverallDiameterAssumed);
    }

    [Fact]
    public void Rows_CoverAwg10To44WithOverallAboveConductorAndHeavyAboveSingle()
    {
        Assert.Equal(Enumerable.Range(10, 35), AwgWireTable.Sizes.Select(s => s.Gauge));
        foreach (var size in AwgWireTable.Sizes)
        {
            Assert.True(size.SingleBuildMaximumOverallDiameter > size.ConductorDiameter, size.Label);
            Assert.True(size.HeavyBuildMaximumOverallDiameter > size.SingleBuildMaximumOverallDiameter, size.Label);
        }
    }

    [Fact]
    public void Rows_AllDiametersDecreaseWithGauge()
    {
        var sizes = AwgWireTable.Sizes;
        for (var i = 1; i < sizes.Count; i++)
        {
            Assert.True(sizes[i].ConductorDiameter < sizes[i - 1].ConductorDiameter, sizes[i].Label);
            Assert.True(sizes[i].SingleBuildMaximumOverallDiameter < sizes[i - 1].SingleBuildMaximumOverallDiameter, sizes[i].Label);
            Assert.True(sizes[i].HeavyBuildMaximumOverallDiameter < sizes[i - 1].HeavyBuildMaximumOverallDiameter, sizes[i].Label);
        }
    }

    [Fact]
    public void ConductorDiameter_DecreasesWithGaugeAndAreaHalvesEveryThreeGauges()
    {
        // ASTM B258 formula: one gauge is a factor 92^(1/39) in diameter, so three gauges are close to half the area
        // (physics-sources.md §3.1 gives d(n)/d(n+3) = 1.415991).
        Gen.Int[-3, 53].Sample(n =>
        {
            var d = AwgWireTable.ConductorDiameter(n).Metres;
            Assert.True(AwgWireTable.ConductorDiameter(n + 1).Metres < d);
            Assert.Equal(1.415991, d / AwgWireTable.ConductorDiameter(n + 3).Metres, 5e-7);
        });
    }

    [Fact]
    public void TryFind_OutsideTheTable_ReturnsFalse()
    {
        Assert.False(AwgWireTable.TryFind(9, out _));
        Assert.False(AwgWireTable.TryFind(45, out _));
        Assert.True(AwgWireTable.TryFind(44, out var thinnest));
        Assert.Equal(44, thinnest.Gauge);
    }

    [Fact]
    public void Factories_RejectOutOfRangeArguments()
    {
        Assert.Equal("gauge", Assert.Throws<ArgumentOutOfRangeException>(() => AwgWireTable.Wire(9, AwgBuild.Single)).ParamName);
        Assert.Equal("build", Assert.Throws<ArgumentOutOfRangeException>(() => AwgWireTable.Wire(24, (AwgBuild)7)).ParamName);
        Assert.Equal("gauge", Assert.Throws<ArgumentOutOfRangeException>(() => AwgWireTable.ConductorDiameter(57)).ParamName);
        Assert.Equal("gauge", Assert.Throws<ArgumentOutOfRangeException>(() => AwgWireTable.ConductorDiameter(-4)).ParamName);
    }

    [Fact]
    public void Wire_SingleBuild_IsThinnerThanHeavyBuild()
    {
        Gen.Int[AwgWireTable.FirstGauge, AwgWireTable.LastGauge].Sample(n =>
        {
            var single = AwgWireTable.Wire(n, AwgBuild.Single);
            var heavy = AwgWireTable.Wire(n, AwgBuild.Heavy);
            Assert.Equal(single.StrandDiameter, heavy.StrandDiameter);
            Assert.True(single.ElementOverallDiameter < heavy.ElementOverallDiameter);
        });
    }
}
