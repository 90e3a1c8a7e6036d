using Winding.Core.Wire;

namespace Winding.Core.Tests.Wire;

/// <summary>The combined listing of standard wires: ids, look-up and the values each entry carries.</summary>
public sealed class StandardWireTableTests
{
    [Fact]
    public void Ids_AreUniqueAndRoundTripThroughTryFind()
    {
        var all = StandardWireTable.All;

        Assert.Equal(all.Count, all.Select(w => w.Id).Distinct(StringComparer.Ordinal).Count());
        Assert.All(all, w =>
        {
            Assert.True(StandardWireTable.TryFind(w.Id, out var found));
            Assert.Same(w, found);
            Assert.Matches("^(metric-[0-9]-[0-9]{3}-g[123]|awg-[0-9]{2}-(single|heavy))$", w.Id);
            Assert.StartsWith(w.System == StandardWireSystem.Metric ? "metric-" : "awg-", w.Id, StringComparison.Ordinal);
        });
    }

    [Fact]
    public void All_ListsEveryAvailableGradeAndBuild()
    {
        var metric = MetricEnamelledWireTable.Sizes.Sum(s => s.AvailableGrades.Count);
        var awg = 2 * AwgWireTable.Sizes.Count;

        Assert.Equal(metric + awg, StandardWireTable.All.Count);
        Assert.False(StandardWireTable.TryFind("metric-0-050-g3", out _)); // grade 3 not known below 0.100 mm
        Assert.True(StandardWireTable.TryFind("metric-0-100-g3", out _));
    }

    [Fact]
    public void MetricEntry_CarriesTableValuesAndCopperResistance()
    {
        Assert.True(StandardWireTable.TryFind("metric-0-500-g1", out var wire));

        Assert.Equal(StandardWireSystem.Metric, wire.System);
        Assert.Equal("0.500 mm", wire.SizeLabel);
        Assert.Equal("grade 1", wire.InsulationLabel);
        Assert.Equal("0.500 mm, grade 1", wire.Description);
        Assert.Equal(0.500, wire.ConductorDiameter.Millimetres, 1e-9);
        Assert.Equal(0.544, wire.OverallDiameter.Millimetres, 1e-9); // IEC 60317-0-1 (physics-sources.md §3.3, from memory)
        Assert.Equal(ValueProvenance.FromMemoryCrossChecked, wire.OverallDiameterProvenance);
        // physics-sources.md §3.2 (IEC 60028): d = 0.5 mm, R′(20 °C) = 0.0878096 Ω/m, six significant figures.
        Assert.Equal(0.0878096, wire.ResistancePerMetre20COhmPerM, 0.0878096 * 1e-5);
        Assert.Equal(0.196350, wire.ConductorAreaM2 * 1e6, 0.0000005); // π·(0.5 mm)²/4 = 0.196350 mm² (hand calculation, 6 s.f.)
    }

    [Fact]
    public void AwgEntry_CarriesFormulaDiameterAndBuildLabel()
    {
        Assert.True(StandardWireTable.TryFind("awg-24-heavy", out var wire));

        Assert.Equal(StandardWireSystem.Awg, wire.System);
        Assert.Equal("AWG 24", wire.SizeLabel);
        Assert.Equal("heavy build", wire.InsulationLabel);
        Assert.Equal(0.51056, wire.ConductorDiameter.Millimetres, 0.000005); // physics-sources.md §3.1
        Assert.Equal(0.0842151, wire.ResistancePerMetre20COhmPerM, 0.0842151 * 1e-5); // physics-sources.md §3.1
        Assert.Equal(ValueProvenance.FromMemory, wire.OverallDiameterProvenance);
    }

    [Fact]
    public void ToWindingWire_BuildsTheSameWireAsTheTableFactories()
    {
        Assert.True(StandardWireTable.TryFind("metric-0-315-g3", out var metric));
        Assert.True(StandardWireTable.TryFind("awg-30-single", out var awg));

        Assert.Equal(MetricEnamelledWireTable.Wire(metric.ConductorDiameter, MetricWireGrade.Grade3), metric.ToWindingWire());
        Assert.Equal(AwgWireTable.Wire(30, AwgBuild.Single), awg.ToWindingWire());
        Assert.Equal(0.384, metric.ToWindingWire().ElementOverallDiameter.Millimetres, 1e-9); // physics-sources.md §3.3, from memory
        Assert.Equal(3, metric.ToWindingWire().InHand(3).ParallelConductors);
    }

    [Theory]
    [InlineData("")]
    [InlineData("AWG-24-heavy")]
    [InlineData("metric-0-300-g1")]
    [InlineData("awg-45-single")]
    [InlineData("metric-0.500-g1")]
    public void TryFind_UnknownId_ReturnsFalse(string id)
    {
        Assert.False(StandardWireTable.TryFind(id, out var wire));
        Assert.Null(wire);
    }

    [Fact]
    public void All_OverallAboveConductor()
    {
        Assert.All(StandardWireTable.All, w => Assert.True(w.OverallDiameter > w.ConductorDiameter, w.Id));
    }
}
