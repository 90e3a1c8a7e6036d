using Winding.Catalogue.Entries;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Validation;

namespace Winding.Catalogue.Tests.Validation;

/// <summary>
/// Material files are checked field by field: a bad file is reported with its name, the JSON path and the reason, and
/// the rest of the catalogue still loads. The values in <see cref="Good"/> are made up for the test.
/// </summary>
public sealed class MaterialRulesTests : IDisposable
{
    private const string Good = """
        {
          "kind": "material",
          "id": "m",
          "name": "NiZn, μi 100",
          "family": "NiZn",
          "initialPermeability": 100,
          "permeability": [
            { "frequencyHz": 1000000, "real": 100, "imaginary": 2 },
            { "frequencyHz": 10000000, "real": 90, "imaginary": 20 },
            { "frequencyHz": 100000000, "real": 30, "imaginary": 40 }
          ],
          "saturationFluxDensityT": { "at25C": 0.35, "at100C": 0.3 },
          "steinmetz": { "k": 2, "alpha": 1.4, "beta": 2.3, "minFrequencyHz": 500000, "maxFrequencyHz": 5000000, "minFluxDensityT": 0.002, "maxFluxDensityT": 0.05 },
          "resistivityOhmM": 100000,
          "curieTemperatureC": 300,
          "alTolerancePercent": 20,
          "source": "Made up for a test."
        }
        """;

    private readonly string _directory = Path.Combine(Path.GetTempPath(), "winding-materials-" + Guid.NewGuid().ToString("N"));

    public MaterialRulesTests() => Directory.CreateDirectory(_directory);

    public void Dispose() => Directory.Delete(_directory, recursive: true);

    [Fact]
    public void Load_FullMaterial_BuildsTheEngineMaterialFromEveryField()
    {
        Write("m.json", Good);

        var catalogue = CatalogueLoader.Load(_directory);

        Assert.Empty(catalogue.Problems);
        var entry = catalogue.MaterialsById["m"];
        var material = entry.Material;
        Assert.Equal(MaterialFamilies.NickelZinc, entry.Family);
        Assert.Equal("Made up for a test.", entry.Source);
        Assert.Equal(100, material.InitialPermeability);
        Assert.Equal([1e6, 1e7, 1e8], entry.PermeabilityPoints.Select(p => p.FrequencyHz));
        Assert.Equal([100, 90, 30], entry.PermeabilityPoints.Select(p => p.MuPrime));
        Assert.Equal([2, 20, 40], entry.PermeabilityPoints.Select(p => p.MuDoublePrime));
        Assert.Equal(0.35, material.Saturation!.At25CT);
        Assert.Equal(0.3, material.Saturation.At100CT);
        var steinmetz = material.Steinmetz!;
        Assert.Equal([2, 1.4, 2.3, 5e5, 5e6, 0.002, 0.05], new[] { steinmetz.CoefficientK, steinmetz.Alpha, steinmetz.Beta, steinmetz.MinFrequencyHz, steinmetz.MaxFrequencyHz, steinmetz.MinPeakFluxDensityT, steinmetz.MaxPeakFluxDensityT });
        Assert.Equal(1e5, material.ResistivityOhmM);
        Assert.Equal(300, material.CurieTemperatureC);
        Assert.Equal(0.2, material.AlTolerance, 12);
    }

    [Fact]
    public void Load_MinimalMaterial_HasConstantPermeabilityAndTheDefaultTolerance()
    {
        Write("m.json", """{ "kind": "material", "id": "m", "name": "MnZn, μi 3000", "family": "MnZn", "initialPermeability": 3000, "source": "Made up." }""");

        var material = CatalogueLoader.Load(_directory).MaterialsById["m"];

        Assert.Empty(material.PermeabilityPoints);
        Assert.False(material.Material.HasPermeabilityTable);
        Assert.Null(material.Material.Saturation);
        Assert.Null(material.Material.Steinmetz);
        Assert.Equal(0.25, material.Material.AlTolerance, 12); // ±25 % when none is stated: physics-sources.md §2.3, common practice
    }

    [Theory]
    // The table
    [InlineData("{ \"frequencyHz\": 100000000, \"real\": 30", "{ \"frequencyHz\": 5000000, \"real\": 30", "$.permeability[2].frequencyHz", "must increase")]
    [InlineData("{ \"frequencyHz\": 100000000, \"real\": 30", "{ \"frequencyHz\": 10000000, \"real\": 30", "$.permeability[2].frequencyHz", "must increase")]
    [InlineData("\"real\": 90, \"imaginary\": 20", "\"real\": 90, \"imaginary\": -20", "$.permeability[1].imaginary", "never negative")]
    [InlineData("\"real\": 90, \"imaginary\": 20", "\"real\": 0, \"imaginary\": 20", "$.permeability[1].real", "out of range")]
    [InlineData("{ \"frequencyHz\": 1000000, \"real\": 100, \"imaginary\": 2 }", "{ \"frequencyHz\": 0, \"real\": 100, \"imaginary\": 2 }", "$.permeability[0].frequencyHz", "out of range")]
    [InlineData("{ \"frequencyHz\": 1000000, \"real\": 100, \"imaginary\": 2 }", "{ \"frequencyHz\": 1000000, \"real\": 100 }", "$.permeability[0].imaginary", "Required")]
    [InlineData("{ \"frequencyHz\": 10000000, \"real\": 90, \"imaginary\": 20 }", "null", "$.permeability[1]", "Required")]
    [InlineData("{ \"frequencyHz\": 1000000, \"real\": 100, \"imaginary\": 2 }", "{ \"frequencyHz\": 1000000, \"real\": 1000, \"imaginary\": 2 }", "$.permeability[0].real", "far from μi")]
    [InlineData("{ \"frequencyHz\": 1000000, \"real\": 100, \"imaginary\": 2 }", "{ \"frequencyHz\": 1000000, \"mu\": 100, \"imaginary\": 2 }", "$.permeability[0].mu", "Unknown field")]
    [InlineData("\"real\": 90,", "\"real\": \"ninety\",", "$.permeability[1].real", "wrong type")]
    // Saturation
    [InlineData("\"at100C\": 0.3", "\"at100C\": 0.4", "$.saturationFluxDensityT.at100C", "cannot exceed")]
    [InlineData("\"at25C\": 0.35, ", "", "$.saturationFluxDensityT.at25C", "Required")]
    [InlineData("\"at25C\": 0.35", "\"at25C\": 4", "$.saturationFluxDensityT.at25C", "out of range")]
    // Steinmetz
    [InlineData("\"maxFrequencyHz\": 5000000", "\"maxFrequencyHz\": 400000", "$.steinmetz.maxFrequencyHz", "above the lowest")]
    [InlineData("\"maxFluxDensityT\": 0.05", "\"maxFluxDensityT\": 0.001", "$.steinmetz.maxFluxDensityT", "above the lowest")]
    [InlineData("\"maxFluxDensityT\": 0.05", "\"maxFluxDensityT\": 0.5", "$.steinmetz.maxFluxDensityT", "saturates")]
    [InlineData("\"alpha\": 1.4", "\"alpha\": 0", "$.steinmetz.alpha", "out of range")]
    [InlineData("\"k\": 2", "\"k\": -2", "$.steinmetz.k", "out of range")]
    [InlineData("\"beta\": 2.3, ", "", "$.steinmetz.beta", "Required")]
    // Single values
    [InlineData("\"resistivityOhmM\": 100000", "\"resistivityOhmM\": 0", "$.resistivityOhmM", "out of range")]
    [InlineData("\"curieTemperatureC\": 300", "\"curieTemperatureC\": -10", "$.curieTemperatureC", "out of range")]
    [InlineData("\"curieTemperatureC\": 300", "\"curieTemperatureC\": 90", "$.curieTemperatureC", "at 100 °C")]
    [InlineData("\"alTolerancePercent\": 20", "\"alTolerancePercent\": 120", "$.alTolerancePercent", "out of range")]
    [InlineData("\"initialPermeability\": 100", "\"initialPermeability\": 0.5", "$.initialPermeability", "out of range")]
    [InlineData("\"family\": \"NiZn\"", "\"family\": \"ceramic\"", "$.family", "Unknown family")]
    [InlineData("\"family\": \"NiZn\",", "", "$.family", "Required")]
    [InlineData("\"source\": \"Made up for a test.\"", "\"source\": \"   \"", "$.source", "Required")]
    [InlineData(",\n  \"source\": \"Made up for a test.\"", "", "$.source", "Required")]
    public void Load_BadMaterial_IsReportedByFilePathAndReason_AndTheRestLoads(string find, string replace, string path, string reasonPart)
    {
        var bad = Good.Replace("\"id\": \"m\"", "\"id\": \"bad\"", StringComparison.Ordinal);
        Assert.Contains(find, bad, StringComparison.Ordinal); // the edit must apply, or the case tests nothing
        Write("materials/bad.json", bad.Replace(find, replace, StringComparison.Ordinal));
        Write("materials/good.json", Good);
        Write("cores/on-bad.json", Core("on-bad", "bad"));
        Write("cores/on-good.json", Core("on-good", "m"));

        var catalogue = CatalogueLoader.Load(_directory);

        Assert.Equal(["m"], catalogue.Materials.Select(m => m.Id));
        Assert.Equal(["on-good"], catalogue.Cores.Select(c => c.Id));
        var problem = Assert.Single(catalogue.Problems, p => p.FileName == "materials/bad.json");
        Assert.Equal(path, problem.JsonPath);
        Assert.Contains(reasonPart, problem.Reason, StringComparison.OrdinalIgnoreCase);
        var orphan = Assert.Single(catalogue.Problems, p => p.FileName == "cores/on-bad.json");
        Assert.Equal("$.materialId", orphan.JsonPath);
    }

    [Fact]
    public void Load_TableOfOnePoint_IsRefused()
    {
        Write("m.json", """{ "kind": "material", "id": "m", "name": "NiZn, μi 100", "family": "NiZn", "initialPermeability": 100, "permeability": [ { "frequencyHz": 1000000, "real": 100, "imaginary": 2 } ], "source": "Made up." }""");

        var problem = Assert.Single(CatalogueLoader.Load(_directory).Problems);

        Assert.Equal("$.permeability", problem.JsonPath);
        Assert.Contains("at least 2 points", problem.Reason, StringComparison.Ordinal);
    }

    [Fact]
    public void Validate_SeveralBadFields_ReportsEachOne()
    {
        var document = new MaterialEntryDocument
        {
            Family = "NiZn",
            InitialPermeability = 100,
            Source = "x",
            Permeability = [new() { FrequencyHz = 2e6, Real = 100, Imaginary = 1 }, new() { FrequencyHz = 1e6, Real = 100, Imaginary = -1 }],
            SaturationFluxDensityT = new() { At25C = 0.3, At100C = 0.35 },
        };
        var validator = new FieldValidator();

        var material = MaterialRules.Validate(validator, document);

        Assert.Null(material);
        Assert.Equal(
            ["permeability[1].frequencyHz", "permeability[1].imaginary", "saturationFluxDensityT.at100C"],
            validator.Errors.Select(e => e.Field).Order(StringComparer.Ordinal));
    }

    private static string Core(string id, string material) =>
        $$"""{ "kind": "core", "id": "{{id}}", "name": "Toroid 10 × 5 × 4 mm", "shape": "toroid", "dimensionsMm": { "outerDiameter": 10, "innerDiameter": 5, "height": 4 }, "materialId": "{{material}}" }""";

    private void Write(string relative, string text)
    {
        var path = Path.Combine(_directory, relative);
        Directory.CreateDirectory(Path.GetDirectoryName(path)!);
        File.WriteAllText(path, text);
    }
}
