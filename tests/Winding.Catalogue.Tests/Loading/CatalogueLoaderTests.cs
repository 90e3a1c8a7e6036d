using Winding.Catalogue.Loading;

namespace Winding.Catalogue.Tests.Loading;

public sealed class CatalogueLoaderTests : IDisposable
{
    private readonly string _directory = Path.Combine(Path.GetTempPath(), "winding-catalogue-" + Guid.NewGuid().ToString("N"));

    public CatalogueLoaderTests() => Directory.CreateDirectory(_directory);

    public void Dispose() => Directory.Delete(_directory, recursive: true);

    [Fact]
    public void Load_BadFiles_AreReportedByFilePathAndReason_AndTheRestLoads()
    {
        Write("materials/good.json", """{ "kind": "material", "id": "good", "name": "NiZn, μi 125", "family": "NiZn", "initialPermeability": 125, "source": "test" }""");
        Write("ok.json", Core("ok", 36, 23, 15, "good"));
        Write("broken.json", """{ "kind": "core", "id": "broken", """);
        Write("inverted.json", Core("inverted", 10, 12, 4, "good"));
        Write("typo.json", """{ "kind": "core", "id": "typo", "name": "T", "shape": "toroid", "dimensionsMm": { "outerDiameter": 10, "innerDiameter": 5, "hieght": 4 }, "materialId": "good" }""");
        Write("orphan.json", Core("orphan", 10, 5, 4, "missing"));
        Write("wrongtype.json", """{ "kind": "material", "id": "wrongtype", "name": "M", "family": "NiZn", "initialPermeability": "lots", "source": "test" }""");
        Write("unknown.json", """{ "kind": "widget", "id": "w" }""");
        Write("zz-dup.json", Core("ok", 20, 10, 5, "good"));
        Write("Bad Id.json", Core("Bad Id", 20, 10, 5, "good"));

        var catalogue = CatalogueLoader.Load(_directory);

        Assert.Equal(["ok"], catalogue.Cores.Select(c => c.Id));
        Assert.Equal(["good"], catalogue.Materials.Select(m => m.Id));
        AssertProblem(catalogue, "broken.json", "$", "line 1");
        AssertProblem(catalogue, "inverted.json", "$.dimensionsMm.innerDiameter", "smaller than the outer diameter");
        AssertProblem(catalogue, "typo.json", "$.dimensionsMm", "hieght");
        AssertProblem(catalogue, "orphan.json", "$.materialId", "missing");
        AssertProblem(catalogue, "wrongtype.json", "$.initialPermeability", "wrong type");
        AssertProblem(catalogue, "unknown.json", "$.kind", "core");
        AssertProblem(catalogue, "zz-dup.json", "$.id", "already used");
        AssertProblem(catalogue, "Bad Id.json", "$.id", "lower-case");
    }

    [Fact]
    public void Load_MissingFolder_IsAProblemNotAnException()
    {
        var catalogue = CatalogueLoader.Load(Path.Combine(_directory, "nowhere"));

        Assert.Empty(catalogue.Cores);
        Assert.Single(catalogue.Problems);
    }

    private static void AssertProblem(CoreCatalogue catalogue, string file, string pathStart, string reasonPart)
    {
        var problem = Assert.Single(catalogue.Problems, p => p.FileName == file);
        Assert.StartsWith(pathStart, problem.JsonPath, StringComparison.Ordinal);
        Assert.Contains(reasonPart, problem.Reason, StringComparison.OrdinalIgnoreCase);
    }

    private static string Core(string id, double od, double inner, double h, string material) =>
        $$"""{ "kind": "core", "id": "{{id}}", "name": "Toroid", "shape": "toroid", "dimensionsMm": { "outerDiameter": {{od}}, "innerDiameter": {{inner}}, "height": {{h}} }, "materialId": "{{material}}" }""";

    private void Write(string relative, string text)
    {
        var path = Path.Combine(_directory, relative);
        Directory.CreateDirectory(Path.GetDirectoryName(path)!);
        File.WriteAllText(path, text);
    }
}
