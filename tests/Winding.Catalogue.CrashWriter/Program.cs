using System.Globalization;
using Winding.Catalogue.Store;

// Saves catalogue entries through UserCatalogueStore in a tight loop until the process is killed. Usage:
//   dotnet Winding.Catalogue.CrashWriter.dll <data folder> <built-in catalogue folder>
// Prints "ready" once the entries exist, then "<kind> <id> <version>" after every committed save, and "FAIL ..." when a
// save is refused. Every saved entry's name ends in " v<version>", so a reader can check that content and version agree.
if (args.Length != 2)
{
    Console.Error.WriteLine("usage: <data folder> <built-in catalogue folder>");
    return 2;
}

var store = new UserCatalogueStore(args[0], args[1], TimeProvider.System);
var entries = new (CatalogueEntryKind Kind, string Id)[]
{
    (CatalogueEntryKind.Material, CrashEntries.MaterialId),
    (CatalogueEntryKind.Core, "crash-core-1"),
    (CatalogueEntryKind.Core, "crash-core-2"),
    (CatalogueEntryKind.Core, "crash-core-3"),
};

foreach (var (kind, id) in entries)
{
    if (store.Read(kind, id).Outcome == StoreOutcome.NotFound)
    {
        var created = store.Create(kind, CrashEntries.Json(kind, id, 1));
        if (!created.Succeeded)
        {
            Console.WriteLine($"FAIL create {id}: {created.Message}");
            return 1;
        }
    }
}

Console.WriteLine("ready");
for (var round = 0; ; round++)
{
    var (kind, id) = entries[round % entries.Length];
    var current = store.Read(kind, id);
    if (current.Version is not { } version)
    {
        Console.WriteLine($"FAIL read {id}: {current.Message}");
        return 1;
    }

    var saved = store.Update(kind, id, CrashEntries.Json(kind, id, version + 1), version);
    Console.WriteLine(saved.Succeeded
        ? string.Create(CultureInfo.InvariantCulture, $"{kind.Word()} {id} {saved.Version}")
        : $"FAIL update {id}: {saved.Message}");
}

/// <summary>The entries the crash writer saves.</summary>
internal static class CrashEntries
{
    /// <summary>The id of the material the cores use.</summary>
    public const string MaterialId = "crash-material";

    /// <summary>An entry whose name ends in " v{version}" (the store sets the saved version itself).</summary>
    public static string Json(CatalogueEntryKind kind, string id, int version)
    {
        if (kind == CatalogueEntryKind.Core)
        {
            var outer = 20 + (version % 10);
            return string.Create(CultureInfo.InvariantCulture,
                $$"""{ "kind": "core", "id": "{{id}}", "name": "Crash core v{{version}}", "shape": "toroid", "dimensionsMm": { "outerDiameter": {{outer}}, "innerDiameter": 10, "height": 5 }, "materialId": "{{MaterialId}}", "source": "crash test" }""");
        }

        // A long table makes each write take long enough to be cut by a kill now and then.
        var rows = string.Join(", ", Enumerable.Range(0, 60).Select(i => string.Create(CultureInfo.InvariantCulture,
            $$"""{ "frequencyHz": {{1000 * (i + 1)}}, "real": 100, "imaginary": {{0.01 * (i + 1) + version * 1e-6}} }""")));
        return string.Create(CultureInfo.InvariantCulture,
            $$"""{ "kind": "material", "id": "{{id}}", "name": "Crash material v{{version}}", "family": "NiZn", "initialPermeability": 100, "permeability": [ {{rows}} ], "source": "crash test" }""");
    }
}
