using Winding.Catalogue.Entries;

namespace Winding.Catalogue.Tests.Entries;

/// <summary>
/// The JSON Schemas shipped in <c>cores/schemas/</c> are generated from the entry documents. Regenerate them with
/// <c>WINDING_WRITE_SCHEMAS=1 dotnet test tests/Winding.Catalogue.Tests --filter EntrySchemasTests</c>.
/// </summary>
public sealed class EntrySchemasTests
{
    private const string WriteVariable = "WINDING_WRITE_SCHEMAS";

    [Fact]
    public void ShippedSchemas_MatchTheEntryDocuments()
    {
        var shipped = ShippedSchemaFolder();
        if (Environment.GetEnvironmentVariable(WriteVariable) == "1")
        {
            EntrySchemas.WriteTo(shipped);
        }

        foreach (var (name, expected) in EntrySchemas.All())
        {
            var path = Path.Combine(shipped, name);
            var actual = File.Exists(path) ? File.ReadAllText(path).ReplaceLineEndings("\n") : "(missing)";
            Assert.True(expected == actual,
                $"{path} is stale: the entry documents changed. Regenerate the schemas with " +
                $"`{WriteVariable}=1 dotnet test tests/Winding.Catalogue.Tests --filter EntrySchemasTests` and commit them.");
        }
    }

    [Fact]
    public void Schemas_DescribeTheFilesStrictly()
    {
        using var core = System.Text.Json.JsonDocument.Parse(EntrySchemas.Core());
        using var material = System.Text.Json.JsonDocument.Parse(EntrySchemas.Material());

        Assert.False(core.RootElement.GetProperty("additionalProperties").GetBoolean());
        Assert.Equal("core", core.RootElement.GetProperty("properties").GetProperty("kind").GetProperty("const").GetString());
        Assert.True(core.RootElement.GetProperty("properties").GetProperty("dimensionsMm").TryGetProperty("properties", out _));
        Assert.Contains("initialPermeability", material.RootElement.GetProperty("required").EnumerateArray().Select(e => e.GetString()));
        Assert.True(material.RootElement.GetProperty("properties").TryGetProperty("version", out _));
    }

    /// <summary>The repository's <c>cores/schemas</c> (found above the test output), else the copy next to the tests.</summary>
    private static string ShippedSchemaFolder()
    {
        for (var directory = new DirectoryInfo(AppContext.BaseDirectory); directory is not null; directory = directory.Parent)
        {
            if (File.Exists(Path.Combine(directory.FullName, "Winding.sln")))
            {
                return Path.Combine(directory.FullName, "cores", EntrySchemas.Folder);
            }
        }

        return Path.Combine(AppContext.BaseDirectory, "cores", EntrySchemas.Folder);
    }
}
