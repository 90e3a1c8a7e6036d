using System.Text.Json;
using Winding.Catalogue.Entries;
using Winding.Catalogue.Validation;

namespace Winding.Catalogue.Loading;

/// <summary>
/// Loads a catalogue folder: every <c>*.json</c> file below it (JSON Schema files <c>*.schema.json</c> excluded) holds one
/// entry, a core (<c>"kind": "core"</c>) or a material (<c>"kind": "material"</c>). A bad file is reported by file name,
/// JSON path and reason, and everything else still loads.
/// </summary>
public static class CatalogueLoader
{
    /// <summary>Permeability range accepted for a material, 1 to 100 000.</summary>
    public const double MaximumPermeability = 100_000;

    /// <summary>Loads the catalogue in <paramref name="directory"/>.</summary>
    public static CoreCatalogue Load(string directory)
    {
        ArgumentNullException.ThrowIfNull(directory);
        var problems = new List<CatalogueProblem>();
        if (!Directory.Exists(directory))
        {
            problems.Add(new CatalogueProblem(directory, "$", "The catalogue folder does not exist."));
            return new CoreCatalogue([], [], problems);
        }

        var materials = new Dictionary<string, CatalogueMaterial>(StringComparer.Ordinal);
        var coreDocuments = new List<(string File, CoreEntryDocument Document)>();
        var seenIds = new Dictionary<string, string>(StringComparer.Ordinal);
        var files = Directory.EnumerateFiles(directory, "*.json", SearchOption.AllDirectories)
            .Where(f => !f.EndsWith(".schema.json", StringComparison.OrdinalIgnoreCase))
            .Select(f => (Full: f, Relative: Path.GetRelativePath(directory, f).Replace('\\', '/')))
            .OrderBy(f => f.Relative, StringComparer.Ordinal);

        foreach (var (full, relative) in files)
        {
            string text;
            try
            {
                text = File.ReadAllText(full);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                problems.Add(new CatalogueProblem(relative, "$", "The file could not be read: " + e.Message));
                continue;
            }

            string? kind;
            try
            {
                using var json = JsonDocument.Parse(text, new JsonDocumentOptions { CommentHandling = JsonCommentHandling.Skip, AllowTrailingCommas = true });
                if (json.RootElement.ValueKind != JsonValueKind.Object)
                {
                    problems.Add(new CatalogueProblem(relative, "$", "The file must hold one JSON object."));
                    continue;
                }

                kind = json.RootElement.TryGetProperty("kind", out var k) && k.ValueKind == JsonValueKind.String ? k.GetString() : null;
            }
            catch (JsonException e)
            {
                problems.Add(new CatalogueProblem(relative, JsonErrorText.PathOf(e), "Not valid JSON: " + JsonErrorText.ReasonOf(e)));
                continue;
            }

            try
            {
                switch (kind)
                {
                    case "material":
                        var materialDocument = JsonSerializer.Deserialize<MaterialEntryDocument>(text, CatalogueJson.Options)!;
                        var material = ToMaterial(relative, materialDocument, problems);
                        if (material is not null && Register(relative, material.Id, seenIds, problems))
                        {
                            materials.Add(material.Id, material);
                        }

                        break;
                    case "core":
                        coreDocuments.Add((relative, JsonSerializer.Deserialize<CoreEntryDocument>(text, CatalogueJson.Options)!));
                        break;
                    default:
                        problems.Add(new CatalogueProblem(relative, "$.kind", "Missing or unknown kind: use \"core\" or \"material\"."));
                        break;
                }
            }
            catch (JsonException e)
            {
                problems.Add(new CatalogueProblem(relative, JsonErrorText.PathOf(e), JsonErrorText.ReasonOf(e)));
            }
        }

        var cores = new List<CatalogueCore>();
        foreach (var (file, document) in coreDocuments)
        {
            var core = ToCore(file, document, materials, problems);
            if (core is not null && Register(file, core.Id, seenIds, problems))
            {
                cores.Add(core);
            }
        }

        return new CoreCatalogue(cores, materials.Values, problems);
    }

    private static bool Register(string file, string id, Dictionary<string, string> seenIds, List<CatalogueProblem> problems)
    {
        if (seenIds.TryGetValue(id, out var other))
        {
            problems.Add(new CatalogueProblem(file, "$.id", $"The id '{id}' is already used by {other}."));
            return false;
        }

        seenIds.Add(id, file);
        return true;
    }

    private static CatalogueMaterial? ToMaterial(string file, MaterialEntryDocument document, List<CatalogueProblem> problems)
    {
        var validator = new FieldValidator();
        CheckCommon(validator, document.Id, document.Name);
        var material = MaterialRules.Validate(validator, document);
        if (!validator.IsValid || material is null)
        {
            Report(file, validator, problems);
            return null;
        }

        return new CatalogueMaterial(document.Id!, document.Name!, document.Family!, material, document.Source!);
    }

    private static CatalogueCore? ToCore(string file, CoreEntryDocument document, Dictionary<string, CatalogueMaterial> materials, List<CatalogueProblem> problems)
    {
        var validator = new FieldValidator();
        CheckCommon(validator, document.Id, document.Name);
        var shape = CoreShapeRules.Validate(validator, string.Empty, document.Shape, document.Family, document.DimensionsMm, document.Effective, document.AlNh);
        CatalogueMaterial? material = null;
        if (string.IsNullOrEmpty(document.MaterialId))
        {
            validator.Add("materialId", "Required: the id of the material this core is made of.");
        }
        else if (!materials.TryGetValue(document.MaterialId, out material))
        {
            validator.Add("materialId", $"No material with the id '{document.MaterialId}' is in the catalogue.");
        }

        if (!validator.IsValid || shape is null || material is null)
        {
            Report(file, validator, problems);
            return null;
        }

        return new CatalogueCore(document.Id!, document.Name!, shape, material, document.Source ?? string.Empty);
    }

    private static void CheckCommon(FieldValidator validator, string? id, string? name)
    {
        if (!EntryId.IsValid(id))
        {
            validator.Add("id", $"'{id}' is not a valid id: {EntryId.Rule}.");
        }

        if (string.IsNullOrWhiteSpace(name) || name.Length > 120)
        {
            validator.Add("name", "Required: a name of 1 to 120 characters.");
        }
    }

    private static void Report(string file, FieldValidator validator, List<CatalogueProblem> problems)
    {
        foreach (var error in validator.Errors)
        {
            problems.Add(new CatalogueProblem(file, "$." + error.Field, error.Message));
        }
    }
}
