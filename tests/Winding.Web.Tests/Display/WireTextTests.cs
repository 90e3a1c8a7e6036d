using Winding.Core.Quantities;
using Winding.Core.Wire;
using Winding.Web.Display;

namespace Winding.Web.Tests.Display;

public sealed class WireTextTests
{
    private static Length Mm(double value) => Length.FromMillimetres(value);

    [Fact]
    public void Describe_Metric_IsTheEnginesDescription()
    {
        var wire = AwgWireTable.Wire(24, AwgBuild.Heavy);

        Assert.Equal(wire.Description, WireText.Describe(wire, UnitSystem.Metric));
    }

    [Fact]
    public void Describe_ImperialCustomWireOfAnAwgSize_IsThatGauge()
    {
        // 0.0201 in typed = 0.51054 mm: AWG 24 by ASTM B258 (0.0201 in in its table, physics-sources.md §3.1).
        var wire = WindingWire.Solid(Mm(0.51054), Mm(0.0223 * 25.4));

        Assert.Equal("AWG 24 (0.0201 in) over 0.0223 in", WireText.Describe(wire, UnitSystem.Imperial));
    }

    [Fact]
    public void Describe_ImperialMetricGrade_KeepsTheGradeAndGivesInches()
    {
        // 0.500 mm is no AWG size; shown as its metric grade with 0.500 mm = 0.0197 in.
        var wire = StandardWireTable.All.Single(w => w.Id == "metric-0-500-g1").ToWindingWire();

        var text = WireText.Describe(wire, UnitSystem.Imperial);

        Assert.StartsWith(wire.Description, text, StringComparison.Ordinal);
        Assert.Contains("0.0197 in over", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Describe_ImperialAwgStandardWire_KeepsItsBuild()
    {
        var wire = AwgWireTable.Wire(30, AwgBuild.Single);

        Assert.StartsWith("AWG 30, single build · 0.0100 in over", WireText.Describe(wire, UnitSystem.Imperial), StringComparison.Ordinal);
    }

    [Fact]
    public void Describe_ImperialLitz_NamesTheStrandGauge()
    {
        // AWG 40 strands: 0.127 mm · 92^(−4/39) = 0.07987 mm = 0.0031 in (ASTM B258; physics-sources.md §3.1).
        var wire = WindingWire.Litz(20, AwgWireTable.ConductorDiameter(40), Mm(0.5));

        Assert.Equal("Litz 20 × AWG 40 (0.0031 in), 0.0197 in overall", WireText.Describe(wire, UnitSystem.Imperial));
    }

    [Fact]
    public void Describe_ImperialHookUp_GivesTheInsulationInInches()
    {
        // 0.254 mm of insulation = 0.0100 in.
        var wire = WindingWire.HookUp(Mm(0.5), Mm(0.254));

        Assert.Equal("hook-up wire 0.0197 in, 0.0100 in insulation", WireText.Describe(wire, UnitSystem.Imperial));
    }

    [Fact]
    public void Label_ImperialStandardWire_AddsItsConductorInInches()
    {
        var wire = StandardWireTable.All.Single(w => w.Id == "awg-24-single");

        Assert.Equal("AWG 24, single build (0.0201 in)", WireText.Label(wire, UnitSystem.Imperial));
        Assert.Equal("AWG 24, single build", WireText.Label(wire, UnitSystem.Metric));
    }
}
