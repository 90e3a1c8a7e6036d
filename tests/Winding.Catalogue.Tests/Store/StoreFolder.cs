using Winding.Catalogue.Store;

namespace Winding.Catalogue.Tests.Store;

/// <summary>
/// A temporary data folder and a tiny built-in catalogue (one material, one core) for store tests, deleted afterwards.
/// </summary>
internal sealed class StoreFolder : IDisposable
{
    public const string BuiltInMaterial = """{ "kind": "material", "id": "builtin-m", "name": "NiZn, μi 125", "family": "NiZn", "initialPermeability": 125, "source": "test" }""";

    public const string BuiltInCore = """{ "kind": "core", "id": "builtin-core", "name": "Toroid 10", "shape": "toroid", "dimensionsMm": { "outerDiameter": 10, "innerDiameter": 5, "height": 4 }, "materialId": "builtin-m", "source": "test" }""";

    public StoreFolder()
    {
        Root = Path.Combine(Path.GetTempPath(), "winding-store-" + Guid.NewGuid().ToString("N"));
        BuiltIn = Path.Combine(Root, "builtin");
        Data = Path.Combine(Root, "data");
        Directory.CreateDirectory(Path.Combine(BuiltIn, "materials"));
        File.WriteAllText(Path.Combine(BuiltIn, "materials", "builtin-m.json"), BuiltInMaterial);
        File.WriteAllText(Path.Combine(BuiltIn, "builtin-core.json"), BuiltInCore);
        Directory.CreateDirectory(Data);
    }

    public string Root { get; }

    public string BuiltIn { get; }

    public string Data { get; }

    public ManualClock Clock { get; } = new(new DateTimeOffset(2025, 3, 1, 12, 0, 0, TimeSpan.Zero));

    public string Catalogue => Path.Combine(Data, "catalogue");

    public UserCatalogueStore NewStore() => new(Data, BuiltIn, Clock);

    public string UserFile(string relative) => Path.Combine(Catalogue, relative);

    /// <summary>Every file below the root with its content, to prove that nothing changed.</summary>
    public IReadOnlyDictionary<string, string> Snapshot() =>
        Directory.EnumerateFiles(Root, "*", SearchOption.AllDirectories).ToDictionary(f => Path.GetRelativePath(Root, f), File.ReadAllText, StringComparer.Ordinal);

    public void Dispose() => Directory.Delete(Root, recursive: true);

    public static string Material(string id, int mu, string name = "NiZn test") =>
        $$"""{ "kind": "material", "id": "{{id}}", "name": "{{name}}", "family": "NiZn", "initialPermeability": {{mu}}, "source": "test" }""";

    public static string Core(string id, string materialId, int outerMm = 20, string name = "Toroid test") =>
        $$"""{ "kind": "core", "id": "{{id}}", "name": "{{name}}", "shape": "toroid", "dimensionsMm": { "outerDiameter": {{outerMm}}, "innerDiameter": 10, "height": 5 }, "materialId": "{{materialId}}", "source": "test" }""";
}
