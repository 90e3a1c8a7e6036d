using System.Text.Json;
using System.Text.Json.Nodes;
using System.Text.Json.Schema;
using Winding.Catalogue.Loading;

namespace Winding.Catalogue.Entries;

/// <summary>
/// JSON Schemas (draft 2020-12) of the catalogue entry files, generated from <see cref="CoreEntryDocument"/> and
/// <see cref="MaterialEntryDocument"/> with the catalogue's JSON settings, so they always match what the loader reads.
/// They are shipped beside the data as <c>cores/schemas/core.schema.json</c> and <c>cores/schemas/material.schema.json</c>
/// for editors; a test regenerates them and fails when the shipped files are stale. The schemas describe the shape
/// (names and types, unknown fields refused); ranges and cross-field rules are the validators' job.
/// </summary>
public static class EntrySchemas
{
    /// <summary>The folder, relative to the built-in catalogue folder, that holds the schemas.</summary>
    public const string Folder = "schemas";

    /// <summary>File name of the core schema.</summary>
    public const string CoreFileName = "core.schema.json";

    /// <summary>File name of the material schema.</summary>
    public const string MaterialFileName = "material.schema.json";

    private static readonly string[] CommonRequired = ["kind", "id", "name"];

    private static readonly JsonSerializerOptions WriteOptions = new() { WriteIndented = true, Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping };

    /// <summary>The schema of a core entry file, as indented JSON text ending in a newline.</summary>
    public static string Core() => Generate(typeof(CoreEntryDocument), "core", ["shape", "dimensionsMm", "materialId"], "Winding catalogue core entry",
        "One core of the catalogue (\"kind\": \"core\"): shape, dimensions in millimetres, the material it is made of and where the values come from.");

    /// <summary>The schema of a material entry file, as indented JSON text ending in a newline.</summary>
    public static string Material() => Generate(typeof(MaterialEntryDocument), "material", ["family", "initialPermeability", "source"], "Winding catalogue material entry",
        "One material of the catalogue (\"kind\": \"material\"): family, permeability, saturation, losses and where the values come from.");

    /// <summary>The schemas by file name.</summary>
    public static IReadOnlyDictionary<string, string> All() =>
        new Dictionary<string, string>(StringComparer.Ordinal) { [CoreFileName] = Core(), [MaterialFileName] = Material() };

    private static string Generate(Type type, string kind, string[] required, string title, string description)
    {
        var exporter = new JsonSchemaExporterOptions { TreatNullObliviousAsNonNullable = false };
        var generated = CatalogueJson.Options.GetJsonSchemaAsNode(type, exporter).AsObject();
        var schema = new JsonObject
        {
            ["$schema"] = "https://json-schema.org/draft/2020-12/schema",
            ["title"] = title,
            ["description"] = description,
        };
        foreach (var (name, value) in generated.ToList())
        {
            generated.Remove(name);
            schema[name] = value;
        }

        // A file holds one object; the words the validators accept are listed so that editors can offer them.
        schema["type"] = "object";
        var properties = schema["properties"]!.AsObject();
        properties["kind"]!["const"] = kind;
        if (type == typeof(CoreEntryDocument))
        {
            properties["shape"]!["enum"] = new JsonArray([.. CoreShapes.All.Select(s => (JsonNode)s)]);
        }
        else
        {
            properties["family"]!["enum"] = new JsonArray([.. MaterialFamilies.All.Select(s => (JsonNode)s)]);
        }

        // The fields the validators require (a file missing one is refused when loaded).
        schema["required"] = new JsonArray([.. CommonRequired.Concat(required).Select(r => (JsonNode)r)]);
        return schema.ToJsonString(WriteOptions).ReplaceLineEndings("\n") + "\n";
    }

    /// <summary>Writes both schemas to <paramref name="directory"/> (created when missing).</summary>
    public static void WriteTo(string directory)
    {
        Directory.CreateDirectory(directory);
        foreach (var (name, text) in All())
        {
            File.WriteAllText(Path.Combine(directory, name), text);
        }
    }
}
