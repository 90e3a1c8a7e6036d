using System.Text.Json;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Plans;
using Winding.Catalogue.Store;
using Winding.Catalogue.Tests.Store;

namespace Winding.Catalogue.Tests.Plans;

/// <summary>A core's measured AL in the catalogue, and the bench record kept with a plan.</summary>
public sealed class PlanBenchAndMeasuredAlTests : IDisposable
{
    private const string MeasuredCore =
        """{ "kind": "core", "id": "my-core", "name": "Toroid test", "shape": "toroid", "dimensionsMm": { "outerDiameter": 20, "innerDiameter": 10, "height": 5 }, "materialId": "builtin-m", "measuredAlNh": 410, "source": "measured" }""";

    private readonly StoreFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void UserCore_MeasuredAl_LoadsAsTheCoresMeasuredAl()
    {
        var store = _folder.NewStore();
        var created = store.Create(CatalogueEntryKind.Core, MeasuredCore);

        Assert.True(created.Succeeded, created.Message);
        Assert.Equal(410e-9, store.Load().CoresById["my-core"].MeasuredAl!.Value.HenriesPerTurnSquared, 15);
    }

    [Theory]
    [InlineData("0")]
    [InlineData("-5")]
    [InlineData("2e7")]
    public void UserCore_MeasuredAlOutOfRange_IsRefusedAtItsField(string al)
    {
        var store = _folder.NewStore();

        var created = store.Create(CatalogueEntryKind.Core, MeasuredCore.Replace("410", al, StringComparison.Ordinal));

        Assert.False(created.Succeeded);
        Assert.Contains(created.Errors, e => e.Field == "measuredAlNh");
    }

    [Fact]
    public void Plan_CatalogueCoreWithMeasuredAl_UsesItPerCoreOfTheStack_AndThePlansOwnMeasuredAlWins()
    {
        var store = _folder.NewStore();
        store.Create(CatalogueEntryKind.Core, MeasuredCore);
        var catalogue = store.Load();

        // Identical cores side by side add their AL: AL = μ0·μe·Ae/le with Ae doubled and le the same (IEC 60205).
        var stacked = PlanReader.Read(Plan("""{ "catalogueId": "my-core", "stack": 2 }"""), catalogue);
        var own = PlanReader.Read(Plan("""{ "catalogueId": "my-core" }""", """, "measured": { "alNh": 300 }"""), catalogue);
        var otherMaterial = PlanReader.Read(Plan("""{ "catalogueId": "my-core", "initialPermeability": 40 }"""), catalogue);

        Assert.Equal(820e-9, stacked.Plan!.Core.InductanceFactor.HenriesPerTurnSquared, 15);
        Assert.Equal(300e-9, own.Plan!.Core.InductanceFactor.HenriesPerTurnSquared, 15);
        Assert.Null(otherMaterial.Plan!.Core.MeasuredAl);
    }

    [Theory]
    [InlineData("""{ "measuredOn": "3 May", "values": { "w0-inductance": 1e-4 } }""", "bench.measuredOn")]
    [InlineData("""{ "values": { "W0 inductance": 1e-4 } }""", "bench.values")]
    [InlineData("""{ "values": { "w0-inductance": -1e-4 } }""", "bench.values.w0-inductance")]
    [InlineData("""{ "values": { "w0-inductance": 0 } }""", "bench.values.w0-inductance")]
    [InlineData("""{ "values": { "srf": null } }""", "bench.values.srf")]
    [InlineData("""{ "planVersion": 0, "values": { "srf": 1e6 } }""", "bench.planVersion")]
    public void Plan_BadBenchRecord_NamesTheField(string bench, string field)
    {
        var read = PlanReader.Read(Plan("""{ "catalogueId": "toroid-10x5x4-nizn-850" }""", ", \"bench\": " + bench), BuiltIn);

        Assert.False(read.IsValid);
        Assert.Contains(read.Errors, e => e.Field == field);
    }

    [Fact]
    public void PlanStore_BenchRecord_RoundTripsAndTheReaderAcceptsIt()
    {
        var plans = new PlanStore(_folder.Data, _folder.Clock);
        var document = Plan("""{ "catalogueId": "toroid-10x5x4-nizn-850" }""",
            """, "bench": { "measuredOn": "2025-03-01", "planVersion": 2, "values": { "w0-inductance": 1.234567e-4, "srf": 3.1e6 } }""");

        var created = plans.Create("Bench plan", document);
        var read = plans.Read(created.Id).Plan!.Plan!;

        Assert.True(PlanReader.Read(read, BuiltIn).IsValid);
        Assert.Equal("2025-03-01", read.Bench!.MeasuredOn);
        Assert.Equal(2, read.Bench.PlanVersion);
        Assert.Equal(new Dictionary<string, double?> { ["w0-inductance"] = 1.234567e-4, ["srf"] = 3.1e6 }, read.Bench.Values);
    }

    private static readonly CoreCatalogue BuiltIn = CatalogueLoader.Load(Path.Combine(AppContext.BaseDirectory, "cores"));

    private static PlanDocument Plan(string core, string more = "") => JsonSerializer.Deserialize<PlanDocument>(
        $$"""{ "core": {{core}}, "windings": [ { "turns": 5, "wire": { "conductorDiameterMm": 0.3 } } ]{{more}} }""", CatalogueJson.Options)!;
}
