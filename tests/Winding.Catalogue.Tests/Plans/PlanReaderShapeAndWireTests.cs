using System.Text.Json;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Plans;
using Winding.Core.Geometry;
using Winding.Core.Magnetics;
using Winding.Core.Windings;
using Winding.Core.Wire;

namespace Winding.Catalogue.Tests.Plans;

/// <summary>Inline core shapes, wire forms, placements, wraps, taps and operating fields in plan documents.</summary>
public sealed class PlanReaderShapeAndWireTests
{
    private const string OneWinding = """ "windings": [ { "turns": 5, "wire": { "conductorDiameterMm": 0.5 } } ] """;

    [Fact]
    public void Read_InlineSplitSleeve_BuildsAGappedSleeve()
    {
        var plan = Valid($$"""{ "core": { "shape": "sleeve", "dimensionsMm": { "outerDiameter": 17, "innerDiameter": 7, "length": 28, "residualGap": 0.04 }, "initialPermeability": 250 }, {{OneWinding}} }""");

        var sleeve = Assert.IsType<SleeveCore>(plan.Core.Shape);
        Assert.True(sleeve.IsSplit);
        Assert.Equal(0.04, sleeve.ResidualGap.Millimetres, 9);
    }

    [Fact]
    public void Read_InlineTwoHoleAndBobbin_Build()
    {
        var twoHole = Valid($$"""{ "core": { "shape": "two-hole", "dimensionsMm": { "length": 14, "holeDiameter": 3.5, "holeSpacing": 6, "width": 13, "height": 7.5 }, "initialPermeability": 850 }, {{OneWinding}} }""");
        var bobbin = Valid($$"""{ "core": { "shape": "bobbin", "family": "pot", "dimensionsMm": { "windowBreadth": 7, "windowHeight": 4, "legDiameter": 9 }, "effective": { "areaMm2": 63, "lengthMm": 45 }, "alNh": 250, "initialPermeability": 2000 }, {{OneWinding}} }""");

        Assert.IsType<TwoHoleCore>(twoHole.Core.Shape);
        var pot = Assert.IsType<BobbinCore>(bobbin.Core.Shape);
        Assert.Equal(250e-9, pot.EnteredAl!.Value.HenriesPerTurnSquared, 1e-18);
    }

    [Theory]
    [InlineData("""{ "core": { "shape": "toroid", "dimensionsMm": { "outerDiameter": 10, "innerDiameter": 5, "height": 4, "length": 3 }, "initialPermeability": 125 }, WINDINGS }""", "core.dimensionsMm.length")]
    [InlineData("""{ "core": { "shape": "bobbin", "dimensionsMm": { "windowBreadth": 7, "windowHeight": 4, "legDiameter": 9 }, "initialPermeability": 2000 }, WINDINGS }""", "core.effective")]
    [InlineData("""{ "core": { "shape": "bobbin", "dimensionsMm": { "windowBreadth": 7, "windowHeight": 4, "legDiameter": 9 }, "effective": { "areaMm2": 63, "lengthMm": 45 }, "initialPermeability": 2000, "stack": 2 }, WINDINGS }""", "core.stack")]
    [InlineData("""{ "core": { "shape": "two-hole", "dimensionsMm": { "length": 14, "holeDiameter": 6, "holeSpacing": 5, "width": 13, "height": 7.5 }, "initialPermeability": 850 }, WINDINGS }""", "core.dimensionsMm.holeSpacing")]
    [InlineData("""{ "core": { "shape": "toroid", "dimensionsMm": { "outerDiameter": 10, "innerDiameter": 5, "height": 4 }, "alNh": 100, "initialPermeability": 125 }, WINDINGS }""", "core.alNh")]
    public void Read_ShapeMistakes_NameTheField(string json, string field) => AssertError(json.Replace("WINDINGS", OneWinding, StringComparison.Ordinal), field);

    [Fact]
    public void Read_WireForms_AllBuild()
    {
        var plan = Valid("""
            { "core": { "catalogueId": "toroid-36x23x15-nizn-125" }, "windings": [
              { "turns": 2, "wire": { "metricMm": 0.5, "grade": 2 } },
              { "turns": 2, "wire": { "awg": 24, "build": "heavy" } },
              { "turns": 2, "wire": { "standardId": "metric-0-200-g1" } },
              { "turns": 2, "wire": { "litz": { "strands": 20, "strandDiameterMm": 0.1, "overallDiameterMm": 0.6 } } },
              { "turns": 2, "wire": { "hookUp": { "conductorDiameterMm": 0.6, "insulationThicknessMm": 0.3 } } },
              { "turns": 2, "wire": { "conductorDiameterMm": 0.3, "overallDiameterMm": 0.34, "strandsInHand": 3, "metal": "aluminium" } }
            ] }
            """);

        // IEC 60317-0-1 grade 2 maximum overall diameter of 0.500 mm is 0.566 mm (physics-sources.md §3.3, from memory).
        Assert.Equal(0.566, plan.Windings[0].Wire.ElementOverallDiameter.Millimetres, 9);
        // ASTM B258: AWG 24 = 0.127 mm · 92^(12/39) = 0.51056 mm (physics-sources.md §3.1).
        Assert.Equal(0.51056, plan.Windings[1].Wire.StrandDiameter.Millimetres, 4);
        Assert.Equal(0.226, plan.Windings[2].Wire.ElementOverallDiameter.Millimetres, 9);
        Assert.Equal(WireKind.Litz, plan.Windings[3].Wire.Kind);
        Assert.Equal(1.2, plan.Windings[4].Wire.ElementOverallDiameter.Millimetres, 9);
        Assert.Equal(3, plan.Windings[5].Wire.ElementsInHand);
        Assert.Equal(ConductorMaterial.Aluminium, plan.Windings[5].Wire.Metal);
    }

    [Fact]
    public void Read_CustomAluminiumWithoutOverall_KeepsTheMetalAndTheAssumedEnamel()
    {
        var plan = Valid("""
            { "core": { "catalogueId": "toroid-36x23x15-nizn-125" }, "windings": [
              { "turns": 2, "wire": { "conductorDiameterMm": 0.5, "metal": "aluminium" } },
              { "turns": 2, "wire": { "conductorDiameterMm": 0.5 } }
            ] }
            """);

        Assert.Equal(ConductorMaterial.Aluminium, plan.Windings[0].Wire.Metal);
        Assert.True(plan.Windings[0].Wire.OverallDiameterAssumed);
        // The same assumed grade 1 build as the copper wire of that size (IEC 60317-0-1 via EnamelBuild).
        Assert.Equal(plan.Windings[1].Wire.ElementOverallDiameter, plan.Windings[0].Wire.ElementOverallDiameter);
    }

    [Theory]
    [InlineData("""{ "metricMm": 0.51 }""", "windings[0].wire.metricMm")]
    [InlineData("""{ "metricMm": 0.5, "grade": 4 }""", "windings[0].wire.grade")]
    [InlineData("""{ "awg": 50 }""", "windings[0].wire.awg")]
    [InlineData("""{ "awg": 24, "build": "triple" }""", "windings[0].wire.build")]
    [InlineData("""{ "standardId": "nope" }""", "windings[0].wire.standardId")]
    [InlineData("""{ "awg": 24, "conductorDiameterMm": 0.5 }""", "windings[0].wire")]
    [InlineData("""{ "litz": { "strands": 100, "strandDiameterMm": 0.1, "overallDiameterMm": 0.5 } }""", "windings[0].wire.litz.overallDiameterMm")]
    [InlineData("""{ "conductorDiameterMm": 0.5, "metal": "gold" }""", "windings[0].wire.metal")]
    [InlineData("""{ "conductorDiameterMm": 0.5, "strandsInHand": 0 }""", "windings[0].wire.strandsInHand")]
    public void Read_WireMistakes_NameTheField(string wire, string field) =>
        AssertError($$"""{ "core": { "catalogueId": "toroid-36x23x15-nizn-125" }, "windings": [ { "turns": 4, "wire": {{wire}} } ] }""", field);

    [Fact]
    public void Read_PlacementWrapTapsAndOperating_Build()
    {
        var plan = Valid("""
            { "core": { "catalogueId": "toroid-36x23x15-nizn-125" },
              "windings": [
                { "turns": 6, "wire": { "conductorDiameterMm": 0.5 }, "placement": { "kind": "sector", "startDegrees": 0, "endDegrees": 170 }, "taps": [2, 4] },
                { "turns": 6, "wire": { "conductorDiameterMm": 0.5 }, "placement": { "kind": "bifilar", "winding": 0 }, "insulation": { "material": "ptfe", "thicknessMm": 0.1 } },
                { "turns": 18, "wire": { "conductorDiameterMm": 0.3 }, "placement": { "kind": "over", "winding": 0 }, "rmsCurrentA": 0.5 }
              ],
              "operating": { "minFrequencyHz": 1e5, "maxFrequencyHz": 3e5, "sourceResistanceOhm": 0, "loadResistanceOhm": 10, "driveVoltageRms": 12,
                             "waveform": "pulse", "dutyCycle": 0.4, "ambientTemperatureC": 40, "reactanceFactor": 5 },
              "allowance": { "leadLengthMm": 80, "marginPercent": 10 } }
            """);

        Assert.Equal(PlacementKind.Sector, plan.Windings[0].Placement.Kind);
        Assert.Equal([2, 4], plan.Windings[0].Taps);
        Assert.Equal(PlacementKind.Bifilar, plan.Windings[1].Placement.Kind);
        Assert.Equal(2.1, plan.Windings[1].Wrap!.RelativePermittivity);
        Assert.Equal(0.5, plan.Windings[2].RmsCurrentA);
        Assert.Equal(WaveformShape.Pulse, plan.Operating!.Waveform.Shape);
        Assert.Equal(0.4, plan.Operating.Waveform.DutyCycle);
        Assert.Equal(40, plan.Operating.AmbientTemperatureC);
        Assert.Equal(5, plan.Operating.ReactanceFactor);
        Assert.Equal(0.08, plan.Allowance.LeadLengthPerEndM, 12);
        Assert.Equal(0.1, plan.Allowance.MarginFraction, 12);
    }

    [Theory]
    [InlineData("""{ "kind": "sector", "startDegrees": 200, "endDegrees": 100 }""", "windings[1].placement.endDegrees")]
    [InlineData("""{ "kind": "bifilar", "winding": 0 }""", "windings[1].placement.winding")]
    [InlineData("""{ "kind": "over", "winding": 5 }""", "windings[1].placement.winding")]
    [InlineData("""{ "kind": "sideways" }""", "windings[1].placement.kind")]
    public void Read_PlacementMistakes_NameTheField(string placement, string field) =>
        AssertError($$"""{ "core": { "catalogueId": "toroid-36x23x15-nizn-125" }, "windings": [ { "turns": 4, "wire": { "conductorDiameterMm": 0.5 } }, { "turns": 5, "wire": { "conductorDiameterMm": 0.5 }, "placement": {{placement}} } ] }""", field);

    [Theory]
    [InlineData("""{ "turns": 4, "wire": { "conductorDiameterMm": 0.5 }, "taps": [4] }""", "windings[0].taps[0]")]
    [InlineData("""{ "turns": 4, "wire": { "conductorDiameterMm": 0.5 }, "taps": [2, 2] }""", "windings[0].taps")]
    [InlineData("""{ "turns": 4, "wire": { "conductorDiameterMm": 0.5 }, "insulation": { "material": "cloth", "thicknessMm": 0.1 } }""", "windings[0].insulation.material")]
    [InlineData("""{ "turns": 4, "wire": { "conductorDiameterMm": 0.5 }, "rmsCurrentA": -1 }""", "windings[0].rmsCurrentA")]
    public void Read_WindingMistakes_NameTheField(string winding, string field) =>
        AssertError($$"""{ "core": { "catalogueId": "toroid-36x23x15-nizn-125" }, "windings": [ {{winding}} ] }""", field);

    [Theory]
    [InlineData(""" "waveform": "triangle" """, "operating.waveform")]
    [InlineData(""" "waveform": "pulse" """, "operating.dutyCycle")]
    [InlineData(""" "waveform": "sine", "dutyCycle": 0.5 """, "operating.dutyCycle")]
    [InlineData(""" "ambientTemperatureC": 400 """, "operating.ambientTemperatureC")]
    public void Read_OperatingMistakes_NameTheField(string extra, string field) =>
        AssertError($$"""{ "core": { "catalogueId": "toroid-36x23x15-nizn-125" }, {{OneWinding}}, "operating": { "minFrequencyHz": 1e6, "maxFrequencyHz": 3e7, "sourceResistanceOhm": 50, "loadResistanceOhm": 50, "driveVoltageRms": 1, {{extra}} } }""", field);

    private static Core.Plans.TransformerPlan Valid(string json)
    {
        var result = Read(json);
        Assert.True(result.IsValid, string.Join("; ", result.Errors.Select(e => e.Field + ": " + e.Message)));
        return result.Plan!;
    }

    private static void AssertError(string json, string field)
    {
        var result = Read(json);
        Assert.False(result.IsValid);
        Assert.True(result.Errors.Any(e => e.Field == field), $"no error at {field}: " + string.Join("; ", result.Errors.Select(e => e.Field + ": " + e.Message)));
    }

    private static PlanReadResult Read(string json) =>
        PlanReader.Read(JsonSerializer.Deserialize<PlanDocument>(json, CatalogueJson.Options), CatalogueLoader.Load(Path.Combine(AppContext.BaseDirectory, "cores")));
}
