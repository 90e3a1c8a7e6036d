using System.Text.Json;
using System.Text.Json.Nodes;
using Winding.Catalogue.Entries;
using Winding.Catalogue.Loading;

namespace Winding.Catalogue.Tests.Loading;

/// <summary>Every built-in file names its schema, uses only the schema's fields, has its required ones, and round-trips.</summary>
public sealed class BuiltInFilesAgainstSchemaTests
{
    private static readonly string Cores = Path.Combine(AppContext.BaseDirectory, "cores");

    public static TheoryData<string> Files()
    {
        var data = new TheoryData<string>();
        foreach (var file in Directory.EnumerateFiles(Cores, "*.json", SearchOption.AllDirectories).Where(f => !f.EndsWith(".schema.json", StringComparison.Ordinal)).Order(StringComparer.Ordinal))
        {
            data.Add(Path.GetRelativePath(Cores, file));
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(Files))]
    public void BuiltInFile_FitsItsSchema_AndRoundTrips(string relative)
    {
        var text = File.ReadAllText(Path.Combine(Cores, relative));
        var node = JsonNode.Parse(text)!.AsObject();
        var kind = node["kind"]!.GetValue<string>();
        var schemaName = kind == "material" ? "material" : "core";
        Assert.Equal($"../schemas/{schemaName}.schema.json", node["$schema"]!.GetValue<string>());
        var schema = JsonNode.Parse(File.ReadAllText(Path.Combine(Cores, "schemas", schemaName + ".schema.json")))!.AsObject();
        var properties = schema["properties"]!.AsObject();
        foreach (var (name, _) in node)
        {
            Assert.True(properties.ContainsKey(name), $"{relative}: '{name}' is not in the {schemaName} schema");
        }

        foreach (var required in schema["required"]?.AsArray().Select(r => r!.GetValue<string>()) ?? [])
        {
            Assert.True(node.ContainsKey(required), $"{relative}: required '{required}' is missing");
        }

        string once;
        string twice;
        if (kind == "material")
        {
            once = JsonSerializer.Serialize(JsonSerializer.Deserialize<MaterialEntryDocument>(text, CatalogueJson.Options), CatalogueJson.Options);
            twice = JsonSerializer.Serialize(JsonSerializer.Deserialize<MaterialEntryDocument>(once, CatalogueJson.Options), CatalogueJson.Options);
        }
        else
        {
            once = JsonSerializer.Serialize(JsonSerializer.Deserialize<CoreEntryDocument>(text, CatalogueJson.Options), CatalogueJson.Options);
            twice = JsonSerializer.Serialize(JsonSerializer.Deserialize<CoreEntryDocument>(once, CatalogueJson.Options), CatalogueJson.Options);
        }

        Assert.Equal(once, twice);
    }
}
