using System.Text.Json;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Plans;
using Winding.Catalogue.Store;
using Winding.Catalogue.Tests.Store;
using Winding.Core.Plans;

namespace Winding.Catalogue.Tests.Plans;

public sealed class PlanStoreTests : IDisposable
{
    private const string TwoWindingPlan = """
        {
          "name": "Balun 1:4",
          "core": { "catalogueId": "toroid-10x5x4-nizn-850" },
          "windings": [
            { "name": "primary", "turns": 6, "wire": { "conductorDiameterMm": 0.3 } },
            { "name": "secondary", "turns": 12, "wire": { "metricMm": 0.25, "grade": 2 }, "placement": { "kind": "over", "winding": 0 } }
          ],
          "operating": { "minFrequencyHz": 1.8e6, "maxFrequencyHz": 30e6, "sourceResistanceOhm": 50, "loadResistanceOhm": 200, "driveVoltageRms": 7.07 },
          "allowance": { "leadLengthMm": 40, "marginPercent": 7.5 },
          "sweep": { "startHz": 1e5, "stopHz": 1e8, "points": 51 }
        }
        """;

    private static readonly CoreCatalogue BuiltIn = CatalogueLoader.Load(Path.Combine(AppContext.BaseDirectory, "cores"));

    private readonly string _data = Path.Combine(Path.GetTempPath(), "winding-plans-" + Guid.NewGuid().ToString("N"));
    private readonly ManualClock _clock = new(new DateTimeOffset(2025, 3, 1, 12, 0, 0, TimeSpan.Zero));

    public PlanStoreTests() => Directory.CreateDirectory(_data);

    public void Dispose() => Directory.Delete(_data, recursive: true);

    [Fact]
    public void CreateThenRead_RoundTrip_KeepsThePlanAndItsMetadata()
    {
        var store = NewStore();
        var t0 = _clock.Now;

        var created = store.Create("  Balun 1:4 für 80 m  ", Plan());
        var read = store.Read(created.Id);

        Assert.Equal((StoreOutcome.Ok, "balun-1-4-fur-80-m", 1), (created.Outcome, created.Id, created.Version));
        Assert.True(File.Exists(PlanFile("balun-1-4-fur-80-m")));
        var saved = read.Plan!;
        Assert.Equal(("balun-1-4-fur-80-m", "Balun 1:4 für 80 m", t0, t0, 1, (string?)null), (saved.Id, saved.Name, saved.CreatedAt, saved.SavedAt, saved.Version, saved.VariantOf));
        Assert.Equal(Json(Plan()), Json(saved.Plan!));
        var file = JsonDocument.Parse(File.ReadAllText(PlanFile(created.Id))).RootElement;
        Assert.Equal(["id", "name", "createdAt", "savedAt", "version", "plan"], file.EnumerateObject().Select(p => p.Name));
    }

    [Fact]
    public void Create_SameName_GetsNumberedIds()
    {
        var store = NewStore();

        var ids = Enumerable.Range(0, 3).Select(_ => store.Create("Balun", Plan()).Id).ToList();
        var empty = store.Create("!!!", Plan());
        var device = store.Create("CON", Plan());

        Assert.Equal(["balun", "balun-2", "balun-3"], ids);
        Assert.Equal("plan", empty.Id);
        Assert.Equal("con-plan", device.Id);
    }

    [Theory]
    [InlineData("")]
    [InlineData("   ")]
    public void Create_BlankName_IsRefused(string name)
    {
        var result = NewStore().Create(name, Plan());

        Assert.Equal(StoreOutcome.Invalid, result.Outcome);
        Assert.Equal("name", Assert.Single(result.Errors).Field);
        Assert.False(Directory.Exists(Path.Combine(_data, "plans")));
    }

    [Fact]
    public void List_IsMostRecentlySavedFirst()
    {
        var store = NewStore();
        store.Create("Alpha", Plan());
        _clock.Advance(TimeSpan.FromMinutes(1));
        store.Create("Bravo", Plan());
        _clock.Advance(TimeSpan.FromMinutes(1));
        store.Save("alpha", Plan(turns: 7), expectedVersion: 1);

        var list = store.List();

        Assert.Equal(StoreOutcome.Ok, list.Outcome);
        Assert.Empty(list.Problems);
        Assert.Equal(
            [new PlanSummary("alpha", "Alpha", _clock.Now, 2, null), new PlanSummary("bravo", "Bravo", _clock.Now.AddMinutes(-1), 1, null)],
            list.Plans);
    }

    [Fact]
    public void List_EmptyDataFolder_IsAnEmptyList()
    {
        var list = NewStore().List();

        Assert.Equal(StoreOutcome.Ok, list.Outcome);
        Assert.Empty(list.Plans);
        Assert.Empty(list.Problems);
    }

    [Fact]
    public void Save_NewVersion_KeepsNameCreationTimeAndVariant()
    {
        var store = NewStore();
        var created = store.Create("Alpha", Plan());
        var t0 = _clock.Now;
        _clock.Advance(TimeSpan.FromHours(1));

        var saved = store.Save(created.Id, Plan(turns: 9), expectedVersion: 1);

        Assert.Equal((StoreOutcome.Ok, 2), (saved.Outcome, saved.Version));
        var read = store.Read("alpha").Plan!;
        Assert.Equal(("Alpha", t0, _clock.Now, 2), (read.Name, read.CreatedAt, read.SavedAt, read.Version));
        Assert.Equal(9, read.Plan!.Windings![0]!.Turns);
    }

    [Fact]
    public void Save_StaleVersion_IsAConflict_AndTheFileIsUnchanged()
    {
        var store = NewStore();
        store.Create("Alpha", Plan());
        store.Save("alpha", Plan(turns: 7), expectedVersion: 1);
        var before = File.ReadAllText(PlanFile("alpha"));

        var stale = store.Save("alpha", Plan(turns: 99), expectedVersion: 1);
        var staleRename = store.Rename("alpha", "Other", expectedVersion: 1);
        var staleDelete = store.Delete("alpha", expectedVersion: 3);

        Assert.Equal((StoreOutcome.Conflict, 2), (stale.Outcome, stale.Version));
        Assert.Contains("changed since you opened it: version 2 is current", stale.Message, StringComparison.Ordinal);
        Assert.Equal(StoreOutcome.Conflict, staleRename.Outcome);
        Assert.Equal(StoreOutcome.Conflict, staleDelete.Outcome);
        Assert.Equal(before, File.ReadAllText(PlanFile("alpha")));
    }

    [Fact]
    public void Save_UnknownPlan_IsNotFound_AndCreatesNothing()
    {
        var result = NewStore().Save("nope", Plan(), expectedVersion: 1);

        Assert.Equal(StoreOutcome.NotFound, result.Outcome);
        Assert.False(File.Exists(PlanFile("nope")));
    }

    [Fact]
    public void Rename_ChangesTheNameNotTheId()
    {
        var store = NewStore();
        store.Create("Alpha", Plan());
        _clock.Advance(TimeSpan.FromMinutes(5));

        var renamed = store.Rename("alpha", "Alpha, wider band", expectedVersion: 1);

        Assert.Equal((StoreOutcome.Ok, "alpha", 2), (renamed.Outcome, renamed.Id, renamed.Version));
        Assert.Equal(new PlanSummary("alpha", "Alpha, wider band", _clock.Now, 2, null), Assert.Single(store.List().Plans));
        Assert.Equal(Json(Plan()), Json(store.Read("alpha").Plan!.Plan!));
        Assert.Equal(StoreOutcome.Invalid, store.Rename("alpha", " ", expectedVersion: 2).Outcome);
    }

    [Fact]
    public void Duplicate_MakesANewPlan_ThatNamesItsOrigin()
    {
        var store = NewStore();
        store.Create("Alpha", Plan());
        store.Save("alpha", Plan(turns: 8), expectedVersion: 1);

        var copy = store.Duplicate("alpha", "Alpha");

        Assert.Equal((StoreOutcome.Ok, "alpha-2", 1), (copy.Outcome, copy.Id, copy.Version));
        var read = store.Read("alpha-2").Plan!;
        Assert.Equal(("Alpha", "alpha", 1), (read.Name, read.VariantOf, read.Version));
        Assert.Equal(8, read.Plan!.Windings![0]!.Turns);
        Assert.Equal(2, store.Read("alpha").Plan!.Version);
        Assert.Equal(StoreOutcome.NotFound, store.Duplicate("nope", "X").Outcome);
    }

    [Fact]
    public void Delete_RemovesThePlan()
    {
        var store = NewStore();
        store.Create("Alpha", Plan());

        var deleted = store.Delete("alpha", expectedVersion: 1);

        Assert.Equal((StoreOutcome.Ok, 1), (deleted.Outcome, deleted.Version));
        Assert.False(File.Exists(PlanFile("alpha")));
        Assert.Equal(StoreOutcome.NotFound, store.Read("alpha").Outcome);
        Assert.Equal(StoreOutcome.NotFound, store.Delete("alpha", expectedVersion: 1).Outcome);
        Assert.Empty(store.List().Plans);
    }

    [Fact]
    public void ExportThenImport_RoundTrip_GivesANewPlanWithTheSameContent()
    {
        var store = NewStore();
        store.Create("Alpha", Plan());
        store.Duplicate("alpha", "Alpha variant");
        var exported = store.Export("alpha-variant");
        _clock.Advance(TimeSpan.FromDays(1));

        var imported = store.Import(exported.Json!);

        Assert.Equal((StoreOutcome.Ok, 1), (exported.Outcome, exported.Version));
        Assert.Equal((StoreOutcome.Ok, "alpha-variant-2", 1), (imported.Outcome, imported.Id, imported.Version));
        var read = store.Read("alpha-variant-2").Plan!;
        Assert.Equal(("Alpha variant", _clock.Now, _clock.Now, (string?)null), (read.Name, read.CreatedAt, read.SavedAt, read.VariantOf));
        Assert.Equal(Json(Plan()), Json(read.Plan!));
    }

    [Theory]
    [InlineData("""{ "name": "X", "plan": { "core": { "catalogueId": "a" } }, "colour": "red" }""", "colour")]
    [InlineData("""{ "name": "X", "plan": { "windings": [ { "turns": 3, "wires": {} } ] } }""", "plan.windings[0].wires")]
    [InlineData("""{ "name": "X", "plan": { "windings": [ { "turns": "three" } ] } }""", "plan.windings[0].turns")]
    [InlineData("""{ "name": "X" }""", "plan")]
    [InlineData("""{ "plan": {} }""", "name")]
    [InlineData("""{ "name": "X", "plan": {""", "plan")]
    [InlineData("null", "")]
    public void Import_BadJson_NamesTheField_AndWritesNothing(string json, string field)
    {
        var result = NewStore().Import(json);

        Assert.Equal(StoreOutcome.Invalid, result.Outcome);
        Assert.Contains(result.Errors, e => e.Field == field);
        Assert.All(result.Errors, e => Assert.False(string.IsNullOrWhiteSpace(e.Message)));
        Assert.False(Directory.Exists(Path.Combine(_data, "plans")));
    }

    [Fact]
    public void Import_BarePlanDocument_IsSavedUnderItsOwnName()
    {
        var store = NewStore();
        var plan = Plan();
        plan.Name = "Bare";

        var result = store.Import(Json(plan));

        Assert.Equal((StoreOutcome.Ok, "bare", 1), (result.Outcome, result.Id, result.Version));
        Assert.Equal(Json(plan), Json(store.Read("bare").Plan!.Plan!));
    }

    [Fact]
    public void Import_BarePlanDocument_WithABadField_NamesIt()
    {
        var result = NewStore().Import("""{ "windings": [ { "turns": "three" } ] }""");

        Assert.Equal(StoreOutcome.Invalid, result.Outcome);
        Assert.Contains(result.Errors, e => e.Field == "windings[0].turns");
        Assert.False(Directory.Exists(Path.Combine(_data, "plans")));
    }

    [Fact]
    public void Import_HostileIdInTheFile_IsIgnored_AndAFreshIdIsMade()
    {
        var store = NewStore();

        var result = store.Import("""{ "id": "../../etc/passwd", "name": "Evil", "version": 40, "plan": {} }""");

        Assert.Equal((StoreOutcome.Ok, "evil", 1), (result.Outcome, result.Id, result.Version));
        Assert.Equal(["evil.json"], Directory.EnumerateFiles(Path.Combine(_data, "plans")).Select(Path.GetFileName));
    }

    [Fact]
    public void List_CorruptFiles_AreProblems_WhileTheRestLists()
    {
        var store = NewStore();
        store.Create("Alpha", Plan());
        var plans = Path.Combine(_data, "plans");
        File.WriteAllText(Path.Combine(plans, "broken.json"), """{ "id": "broken", "name": "B", "version": 1, "savedAt": "2025-01-01T00:00:00Z", "createdAt": "2025-01-01T00:00:00Z", "plan": { "windings": [ { "turns": "x" } ] } }""");
        File.WriteAllText(Path.Combine(plans, "truncated.json"), """{ "id": "trunc""");
        File.WriteAllText(Path.Combine(plans, "moved.json"), File.ReadAllText(PlanFile("alpha")));
        File.WriteAllText(Path.Combine(plans, "Upper.json"), "{}");
        File.WriteAllText(Path.Combine(plans, ".alpha.json.0123.tmp"), "partial");

        var list = store.List();

        Assert.Equal("alpha", Assert.Single(list.Plans).Id);
        Assert.Contains(new CatalogueProblem("broken.json", "$.plan.windings[0].turns", "The value has the wrong type (for example text where a number is expected). (line 1)"), list.Problems);
        Assert.Contains(list.Problems, p => p is { FileName: "truncated.json", JsonPath: "$.id" });
        Assert.Contains(list.Problems, p => p is { FileName: "moved.json", JsonPath: "$.id" } && p.Reason.Contains("'moved'", StringComparison.Ordinal));
        Assert.Contains(list.Problems, p => p is { FileName: "Upper.json", JsonPath: "$" });
        Assert.False(File.Exists(Path.Combine(plans, ".alpha.json.0123.tmp")));
        Assert.Equal(StoreOutcome.Invalid, store.Read("broken").Outcome);
        Assert.Contains(store.Read("broken").Errors, e => e.Field == "plan.windings[0].turns");
        Assert.Equal(StoreOutcome.Invalid, store.Export("broken").Outcome);
    }

    [Fact]
    public void Save_OverACorruptFile_WithTheVersionItStates_RepairsIt()
    {
        var store = NewStore();
        var path = PlanFile("broken");
        Directory.CreateDirectory(Path.GetDirectoryName(path)!);
        File.WriteAllText(path, """{ "id": "broken", "version": 4, "plan": { "windings": 3 } }""");

        var stale = store.Save("broken", Plan(), expectedVersion: 1);
        var repaired = store.Save("broken", Plan(), expectedVersion: 4);

        Assert.Equal(StoreOutcome.Conflict, stale.Outcome);
        Assert.Equal((StoreOutcome.Ok, 5), (repaired.Outcome, repaired.Version));
        Assert.Equal(("broken", 5), (store.Read("broken").Plan!.Name, store.Read("broken").Plan!.Version));
    }

    [Theory]
    [InlineData("../x")]
    [InlineData("..")]
    [InlineData("a/b")]
    [InlineData("a\\b")]
    [InlineData("con")]
    [InlineData("nul")]
    [InlineData("Alpha")]
    [InlineData("")]
    [InlineData("a--b")]
    [InlineData("x.json")]
    [InlineData("aaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaa")]
    public void HostileIds_AreRefused_AndTouchNothing(string id)
    {
        var store = NewStore();
        store.Create("Alpha", Plan());
        var before = Snapshot();

        Assert.Equal(StoreOutcome.Invalid, store.Read(id).Outcome);
        Assert.Equal(StoreOutcome.Invalid, store.Save(id, Plan(), expectedVersion: 1).Outcome);
        Assert.Equal(StoreOutcome.Invalid, store.Rename(id, "X", expectedVersion: 1).Outcome);
        Assert.Equal(StoreOutcome.Invalid, store.Duplicate(id, "X").Outcome);
        Assert.Equal(StoreOutcome.Invalid, store.Delete(id, expectedVersion: 1).Outcome);
        Assert.Equal(StoreOutcome.Invalid, store.Export(id).Outcome);
        Assert.Equal("id", Assert.Single(store.Save(id, Plan(), expectedVersion: 1).Errors).Field);
        Assert.Equal(before, Snapshot());
    }

    [Fact]
    public void Create_VeryLongName_GivesAValidIdWithRoomForASuffix()
    {
        var store = NewStore();
        var name = new string('x', 200);

        var first = store.Create(name, Plan());
        var second = store.Create(name, Plan());

        Assert.Equal(new string('x', 60), first.Id);
        Assert.Equal(new string('x', 60) + "-2", second.Id);
        Assert.Equal(StoreOutcome.Invalid, store.Create(new string('x', 201), Plan()).Outcome);
    }

    [Fact]
    public void SavedPlan_ReadBackThroughPlanReader_EvaluatesTheSame()
    {
        var store = NewStore();
        var before = Evaluate(Plan());

        var id = store.Create("Balun", Plan()).Id;
        var after = Evaluate(store.Read(id).Plan!.Plan!);
        var imported = Evaluate(NewStore().Read(store.Import(store.Export(id).Json!).Id).Plan!.Plan!);

        foreach (var result in new[] { after, imported })
        {
            Assert.Equal(before.Core.InductanceFactor, result.Core.InductanceFactor);
            Assert.Equal(before.Windings.Select(w => (w.InductanceH, w.WireLengthM, w.DcResistanceOhm, w.FillFactor)), result.Windings.Select(w => (w.InductanceH, w.WireLengthM, w.DcResistanceOhm, w.FillFactor)));
            Assert.Equal(before.TurnsRatio, result.TurnsRatio);
            Assert.Equal(before.Magnetizing!.InductanceH, result.Magnetizing!.InductanceH);
            Assert.Equal(before.Parasitics.LeakageInductanceH, result.Parasitics.LeakageInductanceH);
            Assert.Equal(before.Parasitics.InterwindingCapacitanceF, result.Parasitics.InterwindingCapacitanceF);
            Assert.Equal(before.Warnings.Count, result.Warnings.Count);
        }

        Assert.Equal(2.0, before.TurnsRatio);
    }

    private PlanStore NewStore() => new(_data, _clock);

    private string PlanFile(string id) => Path.Combine(_data, "plans", id + ".json");

    private Dictionary<string, string> Snapshot() =>
        Directory.EnumerateFiles(_data, "*", SearchOption.AllDirectories).ToDictionary(f => f, File.ReadAllText, StringComparer.Ordinal);

    private static PlanDocument Plan(int turns = 6)
    {
        var plan = JsonSerializer.Deserialize<PlanDocument>(TwoWindingPlan, CatalogueJson.Options)!;
        plan.Windings![0]!.Turns = turns;
        return plan;
    }

    private static string Json(PlanDocument plan) => JsonSerializer.Serialize(plan, CatalogueJson.Options);

    private static PlanEvaluation Evaluate(PlanDocument plan)
    {
        var read = PlanReader.Read(plan, BuiltIn);
        Assert.True(read.IsValid, string.Join("; ", read.Errors));
        return PlanEvaluator.Evaluate(read.Plan!);
    }
}
