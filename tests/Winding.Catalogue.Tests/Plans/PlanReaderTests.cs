using System.Text.Json;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Plans;

namespace Winding.Catalogue.Tests.Plans;

public sealed class PlanReaderTests
{
    private static readonly CoreCatalogue BuiltIn = CatalogueLoader.Load(Path.Combine(AppContext.BaseDirectory, "cores"));

    [Fact]
    public void Read_CatalogueCore_BuildsThePlan()
    {
        var result = Read("""{ "core": { "catalogueId": "toroid-10x5x4-nizn-850" }, "windings": [ { "turns": 10, "wire": { "conductorDiameterMm": 0.2 } } ] }""");

        Assert.True(result.IsValid);
        Assert.Equal(850, result.Plan!.Core.Material.InitialPermeability);
        Assert.Equal(1, result.Plan.Core.StackCount);
        Assert.True(result.Plan.Windings[0].Wire.OverallDiameterAssumed);
    }

    [Theory]
    [InlineData("""{ "windings": [ { "turns": 1, "wire": { "conductorDiameterMm": 0.2 } } ] }""", "core")]
    [InlineData("""{ "core": { "catalogueId": "nope" }, "windings": [ { "turns": 1, "wire": { "conductorDiameterMm": 0.2 } } ] }""", "core.catalogueId")]
    [InlineData("""{ "core": { "shape": "toroid", "dimensionsMm": { "outerDiameter": 10, "innerDiameter": 10, "height": 4 }, "initialPermeability": 125 }, "windings": [ { "turns": 1, "wire": { "conductorDiameterMm": 0.2 } } ] }""", "core.dimensionsMm.innerDiameter")]
    [InlineData("""{ "core": { "shape": "pot", "dimensionsMm": { "outerDiameter": 10, "innerDiameter": 5, "height": 4 }, "initialPermeability": 125 }, "windings": [ { "turns": 1, "wire": { "conductorDiameterMm": 0.2 } } ] }""", "core.shape")]
    [InlineData("""{ "core": { "shape": "toroid", "dimensionsMm": { "outerDiameter": 10, "innerDiameter": 5, "height": 4 } }, "windings": [ { "turns": 1, "wire": { "conductorDiameterMm": 0.2 } } ] }""", "core.materialId")]
    [InlineData("""{ "core": { "shape": "toroid", "dimensionsMm": { "outerDiameter": 10, "innerDiameter": 5, "height": 4 }, "initialPermeability": 0.5 }, "windings": [ { "turns": 1, "wire": { "conductorDiameterMm": 0.2 } } ] }""", "core.initialPermeability")]
    [InlineData("""{ "core": { "catalogueId": "toroid-10x5x4-nizn-850", "stack": 0 }, "windings": [ { "turns": 1, "wire": { "conductorDiameterMm": 0.2 } } ] }""", "core.stack")]
    [InlineData("""{ "core": { "catalogueId": "toroid-10x5x4-nizn-850" }, "windings": [] }""", "windings")]
    [InlineData("""{ "core": { "catalogueId": "toroid-10x5x4-nizn-850" }, "windings": [ { "turns": 0, "wire": { "conductorDiameterMm": 0.2 } } ] }""", "windings[0].turns")]
    [InlineData("""{ "core": { "catalogueId": "toroid-10x5x4-nizn-850" }, "windings": [ { "turns": 3, "wire": { } } ] }""", "windings[0].wire")]
    [InlineData("""{ "core": { "catalogueId": "toroid-10x5x4-nizn-850" }, "windings": [ { "turns": 3, "wire": { "conductorDiameterMm": 0.5, "overallDiameterMm": 0.4 } } ] }""", "windings[0].wire.overallDiameterMm")]
    [InlineData("""{ "core": { "catalogueId": "toroid-10x5x4-nizn-850" }, "windings": [ { "turns": 3, "wire": { "conductorDiameterMm": 0.5 } } ], "operating": { "minFrequencyHz": 3e6, "maxFrequencyHz": 1e6, "sourceResistanceOhm": 50, "loadResistanceOhm": 50, "driveVoltageRms": 1 } }""", "operating.maxFrequencyHz")]
    [InlineData("""{ "core": { "catalogueId": "toroid-10x5x4-nizn-850" }, "windings": [ { "turns": 3, "wire": { "conductorDiameterMm": 0.5 } } ], "operating": { "minFrequencyHz": 1e6, "maxFrequencyHz": 3e6, "sourceResistanceOhm": 50, "loadResistanceOhm": 0, "driveVoltageRms": 1 } }""", "operating.loadResistanceOhm")]
    public void Read_InvalidDocument_NamesTheField(string json, string field)
    {
        var result = Read(json);

        Assert.False(result.IsValid);
        Assert.Contains(result.Errors, e => e.Field == field);
        Assert.All(result.Errors, e => Assert.False(string.IsNullOrWhiteSpace(e.Message)));
    }

    [Fact]
    public void Read_NullDocument_IsAnErrorNotAnException()
    {
        Assert.False(PlanReader.Read(null, BuiltIn).IsValid);
    }

    private static PlanReadResult Read(string json) =>
        PlanReader.Read(JsonSerializer.Deserialize<PlanDocument>(json, CatalogueJson.Options), BuiltIn);
}
