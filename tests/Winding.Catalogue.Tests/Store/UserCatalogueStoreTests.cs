using System.Text.Json;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Store;

namespace Winding.Catalogue.Tests.Store;

public sealed class UserCatalogueStoreTests : IDisposable
{
    private readonly StoreFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void CreateUpdateHistoryRestore_RoundTrip_KeepsEveryVersionWithItsTime()
    {
        var store = _folder.NewStore();
        var t0 = _folder.Clock.Now;

        var created = store.Create(CatalogueEntryKind.Material, StoreFolder.Material("my-m", 100, "First"));
        _folder.Clock.Advance(TimeSpan.FromHours(1));
        var updated = store.Update(CatalogueEntryKind.Material, "my-m", StoreFolder.Material("my-m", 200, "Second"), expectedVersion: 1);

        Assert.Equal((StoreOutcome.Ok, 1), (created.Outcome, created.Version));
        Assert.Equal((StoreOutcome.Ok, 2), (updated.Outcome, updated.Version));
        Assert.True(File.Exists(_folder.UserFile("history/materials/my-m/1.json")));
        var saved = JsonDocument.Parse(File.ReadAllText(_folder.UserFile("materials/my-m.json"))).RootElement;
        Assert.Equal(2, saved.GetProperty("version").GetInt32());
        Assert.Equal("Second", saved.GetProperty("name").GetString());

        var history = store.History(CatalogueEntryKind.Material, "my-m");
        Assert.Equal(
            [new EntryVersion(2, t0.AddHours(1), true), new EntryVersion(1, t0, false)],
            history.Versions);

        _folder.Clock.Advance(TimeSpan.FromHours(1));
        var restored = store.Restore(CatalogueEntryKind.Material, "my-m", version: 1, expectedVersion: 2);

        Assert.Equal((StoreOutcome.Ok, 3), (restored.Outcome, restored.Version));
        var material = store.Load().MaterialsById["my-m"];
        Assert.Equal(("First", 100.0, 3, false), (material.Name, material.Material.InitialPermeability, material.Version, material.BuiltIn));
        Assert.Equal([3, 2, 1], store.History(CatalogueEntryKind.Material, "my-m").Versions.Select(v => v.Version));
        Assert.Contains("First", store.Read(CatalogueEntryKind.Material, "my-m", version: 1).Json, StringComparison.Ordinal);
    }

    [Fact]
    public void Update_StaleVersion_IsAConflict_AndNothingIsOverwritten()
    {
        var store = _folder.NewStore();
        store.Create(CatalogueEntryKind.Material, StoreFolder.Material("my-m", 100));
        store.Update(CatalogueEntryKind.Material, "my-m", StoreFolder.Material("my-m", 150), expectedVersion: 1);
        var before = _folder.Snapshot();

        var stale = store.Update(CatalogueEntryKind.Material, "my-m", StoreFolder.Material("my-m", 999), expectedVersion: 1);
        var staleDelete = store.Delete(CatalogueEntryKind.Material, "my-m", expectedVersion: 1);

        Assert.Equal((StoreOutcome.Conflict, 2), (stale.Outcome, stale.Version));
        Assert.Contains("changed since you opened it: version 2 is current", stale.Message, StringComparison.Ordinal);
        Assert.Equal(StoreOutcome.Conflict, staleDelete.Outcome);
        Assert.Equal(before, _folder.Snapshot());
        Assert.Equal(150, store.Load().MaterialsById["my-m"].Material.InitialPermeability);
    }

    [Fact]
    public void BuiltInEntries_AreReadOnly_AndTheirIdsCannotBeReused()
    {
        var store = _folder.NewStore();
        var before = _folder.Snapshot();

        var update = store.Update(CatalogueEntryKind.Material, "builtin-m", StoreFolder.Material("builtin-m", 300), expectedVersion: 0);
        var delete = store.Delete(CatalogueEntryKind.Core, "builtin-core", expectedVersion: 0);
        var create = store.Create(CatalogueEntryKind.Material, StoreFolder.Material("builtin-m", 300));
        var createOtherKind = store.Create(CatalogueEntryKind.Core, StoreFolder.Core("builtin-m", "builtin-m"));

        Assert.Equal(StoreOutcome.ReadOnly, update.Outcome);
        Assert.Contains("built-in entries are read-only: clone it", update.Message, StringComparison.Ordinal);
        Assert.Equal(StoreOutcome.ReadOnly, delete.Outcome);
        Assert.Equal(StoreOutcome.AlreadyExists, create.Outcome);
        Assert.Contains("built-in", create.Message, StringComparison.Ordinal);
        Assert.Equal(StoreOutcome.AlreadyExists, createOtherKind.Outcome);
        Assert.Equal(before, _folder.Snapshot());
    }

    [Fact]
    public void Create_ExistingUserId_IsRefused_WithItsVersion()
    {
        var store = _folder.NewStore();
        store.Create(CatalogueEntryKind.Material, StoreFolder.Material("my-m", 100));

        var again = store.Create(CatalogueEntryKind.Material, StoreFolder.Material("my-m", 120));
        var asCore = store.Create(CatalogueEntryKind.Core, StoreFolder.Core("my-m", "builtin-m"));

        Assert.Equal((StoreOutcome.AlreadyExists, 1), (again.Outcome, again.Version));
        Assert.Contains("already have a material 'my-m'", again.Message, StringComparison.Ordinal);
        Assert.Equal(StoreOutcome.AlreadyExists, asCore.Outcome);
    }

    [Fact]
    public void Clone_FromBuiltInAndFromUser_MakesVersionOneUserEntries()
    {
        var store = _folder.NewStore();

        var fromBuiltIn = store.Clone(CatalogueEntryKind.Core, "builtin-core", "my-core", "My toroid");
        var fromUser = store.Clone(CatalogueEntryKind.Core, "my-core", "my-core-2", "My toroid 2");
        var taken = store.Clone(CatalogueEntryKind.Core, "builtin-core", "my-core", "Again");
        var missing = store.Clone(CatalogueEntryKind.Material, "builtin-core", "x", "Wrong kind");

        Assert.Equal((StoreOutcome.Ok, 1), (fromBuiltIn.Outcome, fromBuiltIn.Version));
        Assert.Equal((StoreOutcome.Ok, 1), (fromUser.Outcome, fromUser.Version));
        Assert.Equal(StoreOutcome.AlreadyExists, taken.Outcome);
        Assert.Equal(StoreOutcome.NotFound, missing.Outcome);
        var catalogue = store.Load();
        Assert.Empty(catalogue.Problems);
        var core = catalogue.CoresById["my-core-2"];
        Assert.Equal(("My toroid 2", "builtin-m", false, 1), (core.Name, core.Material.Id, core.BuiltIn, core.Version));
        Assert.True(catalogue.CoresById["builtin-core"].BuiltIn);
        Assert.Equal(0, catalogue.CoresById["builtin-core"].Version);
    }

    [Fact]
    public void Delete_KeepsTheLastVersionInHistory_RefusesAMaterialInUse_AndRestoreBringsItBack()
    {
        var store = _folder.NewStore();
        store.Create(CatalogueEntryKind.Material, StoreFolder.Material("my-m", 100));
        store.Create(CatalogueEntryKind.Core, StoreFolder.Core("my-core", "my-m"));

        var inUse = store.Delete(CatalogueEntryKind.Material, "my-m", expectedVersion: 1);
        var coreDeleted = store.Delete(CatalogueEntryKind.Core, "my-core", expectedVersion: 1);
        var materialDeleted = store.Delete(CatalogueEntryKind.Material, "my-m", expectedVersion: 1);

        Assert.Equal(StoreOutcome.InUse, inUse.Outcome);
        Assert.Contains("my-core", inUse.Message, StringComparison.Ordinal);
        Assert.True(coreDeleted.Succeeded);
        Assert.True(materialDeleted.Succeeded);
        Assert.False(File.Exists(_folder.UserFile("materials/my-m.json")));
        Assert.True(File.Exists(_folder.UserFile("history/materials/my-m/1.json")));
        Assert.DoesNotContain(store.Load().Materials, m => !m.BuiltIn);
        Assert.Equal([new EntryVersion(1, _folder.Clock.Now, false)], store.History(CatalogueEntryKind.Material, "my-m").Versions);

        var restored = store.Restore(CatalogueEntryKind.Material, "my-m", version: 1, expectedVersion: 0);
        var recreated = store.Create(CatalogueEntryKind.Core, StoreFolder.Core("my-core", "my-m"));

        Assert.Equal((StoreOutcome.Ok, 2), (restored.Outcome, restored.Version));
        Assert.Equal((StoreOutcome.Ok, 2), (recreated.Outcome, recreated.Version));
        Assert.True(File.Exists(_folder.UserFile("history/cores/my-core/1.json")));
    }

    [Theory]
    [InlineData("../x")]
    [InlineData("a/b")]
    [InlineData("a\\b")]
    [InlineData("..")]
    [InlineData("con")]
    [InlineData("nul")]
    [InlineData("lpt1")]
    [InlineData("Upper")]
    [InlineData("/etc/passwd")]
    [InlineData("")]
    [InlineData("aaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaa")]
    public void HostileIds_AreRefused_AndNothingIsWritten(string id)
    {
        var store = _folder.NewStore();
        store.Create(CatalogueEntryKind.Material, StoreFolder.Material("my-m", 100));
        var before = _folder.Snapshot();
        var json = StoreFolder.Material("my-m", 100).Replace("\"my-m\"", JsonSerializer.Serialize(id), StringComparison.Ordinal);

        var results = new[]
        {
            store.Create(CatalogueEntryKind.Material, json),
            store.Update(CatalogueEntryKind.Material, id, json, 1),
            store.Delete(CatalogueEntryKind.Material, id, 1),
            store.Restore(CatalogueEntryKind.Material, id, 1, 1),
            store.Clone(CatalogueEntryKind.Material, "my-m", id, "Copy"),
            store.Clone(CatalogueEntryKind.Material, id, "copy", "Copy"),
        };

        Assert.All(results, r => Assert.Equal(StoreOutcome.Invalid, r.Outcome));
        Assert.Equal(StoreOutcome.Invalid, store.History(CatalogueEntryKind.Material, id).Outcome);
        Assert.Equal(StoreOutcome.Invalid, store.Read(CatalogueEntryKind.Material, id).Outcome);
        Assert.Equal(before, _folder.Snapshot());
        Assert.False(File.Exists(Path.Combine(_folder.Data, "x.json")));
    }

    [Fact]
    public void InvalidContent_IsRefused_WithFieldPaths()
    {
        var store = _folder.NewStore();

        var range = store.Create(CatalogueEntryKind.Material, StoreFolder.Material("my-m", -5));
        var broken = store.Create(CatalogueEntryKind.Material, """{ "kind": "material", "id": "my-m", """);
        var unknown = store.Create(CatalogueEntryKind.Core, StoreFolder.Core("my-core", "builtin-m").Replace("\"height\"", "\"hieght\"", StringComparison.Ordinal));
        var orphan = store.Create(CatalogueEntryKind.Core, StoreFolder.Core("my-core", "nowhere"));
        var wrongKind = store.Create(CatalogueEntryKind.Core, StoreFolder.Material("my-m", 100));
        store.Create(CatalogueEntryKind.Material, StoreFolder.Material("my-m", 100));
        var renamed = store.Update(CatalogueEntryKind.Material, "my-m", StoreFolder.Material("other", 100), 1);

        Assert.Equal("initialPermeability", Assert.Single(range.Errors).Field);
        Assert.Equal(StoreOutcome.Invalid, broken.Outcome);
        Assert.Contains("line", Assert.Single(broken.Errors).Message, StringComparison.Ordinal);
        Assert.StartsWith("dimensionsMm", Assert.Single(unknown.Errors).Field, StringComparison.Ordinal);
        Assert.Equal("materialId", Assert.Single(orphan.Errors).Field);
        Assert.Equal("kind", Assert.Single(wrongKind.Errors).Field);
        Assert.Equal("id", Assert.Single(renamed.Errors).Field);
        Assert.Equal(["builtin-m", "my-m"], store.Load().Materials.Select(m => m.Id).Order(StringComparer.Ordinal));
    }

    [Fact]
    public void Load_CorruptUserFiles_AreReportedByFileJsonPathAndReason_AndTheRestLoads()
    {
        var store = _folder.NewStore();
        store.Create(CatalogueEntryKind.Material, StoreFolder.Material("my-m", 100));
        store.Create(CatalogueEntryKind.Core, StoreFolder.Core("good", "builtin-m"));
        File.WriteAllText(_folder.UserFile("cores/broken.json"), """{ "kind": "core", "id": "broken", """);
        File.WriteAllText(_folder.UserFile("cores/inverted.json"), StoreFolder.Core("inverted", "my-m", outerMm: 8));
        File.WriteAllText(_folder.UserFile("materials/builtin-m.json"), StoreFolder.Material("builtin-m", 100));
        File.WriteAllText(_folder.UserFile("cores/misnamed.json"), StoreFolder.Core("other-name", "my-m"));
        File.WriteAllText(_folder.UserFile("cores/.good.json.0123.tmp"), "{ half");

        var catalogue = store.Load();

        Assert.Equal(["builtin-core", "good"], catalogue.Cores.Select(c => c.Id).Order(StringComparer.Ordinal));
        Assert.Equal(["builtin-m", "my-m"], catalogue.Materials.Select(m => m.Id).Order(StringComparer.Ordinal));
        Assert.Equal(125, catalogue.MaterialsById["builtin-m"].Material.InitialPermeability);
        AssertProblem(catalogue, "user/cores/broken.json", "$", "line 1");
        AssertProblem(catalogue, "user/cores/inverted.json", "$.dimensionsMm.innerDiameter", "smaller than the outer diameter");
        AssertProblem(catalogue, "user/materials/builtin-m.json", "$.id", "built-in");
        AssertProblem(catalogue, "user/cores/misnamed.json", "$.id", "named after its id");
        Assert.Equal(4, catalogue.Problems.Count);
        Assert.False(File.Exists(_folder.UserFile("cores/.good.json.0123.tmp")), "leftover temporary files are cleaned at load");
    }

    [Fact]
    public void ImportDryRun_ChangesNothing_AndReportsAddedChangedAndRefused_ThenImportApplies()
    {
        using var other = new StoreFolder();
        var source = other.NewStore();
        source.Create(CatalogueEntryKind.Material, StoreFolder.Material("shared-m", 300));
        source.Create(CatalogueEntryKind.Material, StoreFolder.Material("new-m", 400));
        source.Create(CatalogueEntryKind.Core, StoreFolder.Core("new-core", "new-m"));
        source.Create(CatalogueEntryKind.Core, StoreFolder.Core("same-core", "builtin-m"));
        var bundle = JsonDocument.Parse(source.ExportBundle()).RootElement;
        var materials = bundle.GetProperty("materials").EnumerateArray().Select(e => e.GetRawText())
            .Append(StoreFolder.Material("builtin-m", 10))
            .Append(StoreFolder.Material("bad-m", -1));
        var cores = bundle.GetProperty("cores").EnumerateArray().Select(e => e.GetRawText())
            .Append(StoreFolder.Core("orphan-core", "missing-m"));
        var json = $$"""{ "format": "winding-catalogue-bundle", "formatVersion": 1, "materials": [{{string.Join(",", materials)}}], "cores": [{{string.Join(",", cores)}}] }""";

        var store = _folder.NewStore();
        store.Create(CatalogueEntryKind.Material, StoreFolder.Material("shared-m", 100));
        store.Update(CatalogueEntryKind.Material, "shared-m", StoreFolder.Material("shared-m", 200), 1);
        store.Create(CatalogueEntryKind.Core, StoreFolder.Core("same-core", "builtin-m"));
        var before = _folder.Snapshot();

        var dryRun = store.ImportBundle(json, dryRun: true);

        Assert.Equal(before, _folder.Snapshot());
        Assert.True(dryRun.DryRun);
        Assert.Equal(StoreOutcome.Ok, dryRun.Outcome);
        Assert.Equal(["new-m", "new-core"], dryRun.Added.Select(i => i.Id));
        Assert.Equal([1, 1], dryRun.Added.Select(i => i.NewVersion));
        var changed = Assert.Single(dryRun.Changed);
        Assert.Equal(("shared-m", 2, 3), (changed.Id, changed.OldVersion, changed.NewVersion));
        Assert.Equal("same-core", Assert.Single(dryRun.Unchanged).Id);
        Assert.Equal(["builtin-m", "bad-m", "orphan-core"], dryRun.Refused.Select(i => i.Id));
        Assert.Contains("built-in", dryRun.Refused[0].Errors[0].Message, StringComparison.Ordinal);
        Assert.Equal("initialPermeability", dryRun.Refused[1].Errors[0].Field);
        Assert.Equal("materialId", dryRun.Refused[2].Errors[0].Field);

        var applied = store.ImportBundle(json, dryRun: false);

        Assert.False(applied.DryRun);
        Assert.Equal(
            dryRun.Items.Select(i => (i.Kind, i.Id, i.Action, i.OldVersion, i.NewVersion, i.Errors.Count)),
            applied.Items.Select(i => (i.Kind, i.Id, i.Action, i.OldVersion, i.NewVersion, i.Errors.Count)));
        var catalogue = store.Load();
        Assert.Empty(catalogue.Problems);
        Assert.Equal((300.0, 3), (catalogue.MaterialsById["shared-m"].Material.InitialPermeability, catalogue.MaterialsById["shared-m"].Version));
        Assert.Equal("new-m", catalogue.CoresById["new-core"].Material.Id);
        Assert.True(File.Exists(_folder.UserFile("history/materials/shared-m/2.json")));
        Assert.Equal(1, catalogue.CoresById["same-core"].Version);
        Assert.Equal(125, catalogue.MaterialsById["builtin-m"].Material.InitialPermeability);
    }

    [Fact]
    public void ImportBundle_NotABundle_IsRefusedAsAWhole()
    {
        var store = _folder.NewStore();

        var notJson = store.ImportBundle("{ nope", dryRun: false);
        var wrongFormat = store.ImportBundle("""{ "format": "other", "formatVersion": 1 }""", dryRun: false);

        Assert.Equal(StoreOutcome.Invalid, notJson.Outcome);
        Assert.Equal(StoreOutcome.Invalid, wrongFormat.Outcome);
        Assert.Equal("format", Assert.Single(wrongFormat.Errors).Field);
        Assert.Empty(wrongFormat.Items);
    }

    [Fact]
    public void ExportBundle_ReimportedIntoTheSameStore_IsAllUnchanged()
    {
        var store = _folder.NewStore();
        store.Create(CatalogueEntryKind.Material, StoreFolder.Material("my-m", 100));
        store.Create(CatalogueEntryKind.Core, StoreFolder.Core("my-core", "my-m"));

        var report = store.ImportBundle(store.ExportBundle(), dryRun: false);

        Assert.Equal([ImportAction.Unchanged, ImportAction.Unchanged], report.Items.Select(i => i.Action));
        Assert.Equal(1, store.Load().CoresById["my-core"].Version);
    }

    private static void AssertProblem(CoreCatalogue catalogue, string file, string pathStart, string reasonPart)
    {
        var problem = Assert.Single(catalogue.Problems, p => p.FileName == file);
        Assert.StartsWith(pathStart, problem.JsonPath, StringComparison.Ordinal);
        Assert.Contains(reasonPart, problem.Reason, StringComparison.OrdinalIgnoreCase);
    }
}
