using System.Text.Json;
using Winding.Catalogue.Entries;

namespace Winding.Catalogue.Loading;

/// <summary>
/// Reads the text of one catalogue entry: one JSON object whose <c>kind</c> says whether it is a core or a material,
/// deserialised strictly (unknown fields refused). The first error is returned by JSON path and reason.
/// </summary>
internal static class EntryParser
{
    private static readonly JsonDocumentOptions DocumentOptions = new() { CommentHandling = JsonCommentHandling.Skip, AllowTrailingCommas = true };

    /// <summary>Parses <paramref name="text"/>.</summary>
    public static EntryParseResult Parse(string text)
    {
        string? kind;
        try
        {
            using var json = JsonDocument.Parse(text, DocumentOptions);
            if (json.RootElement.ValueKind != JsonValueKind.Object)
            {
                return EntryParseResult.Failed("$", "The file must hold one JSON object.");
            }

            kind = json.RootElement.TryGetProperty("kind", out var k) && k.ValueKind == JsonValueKind.String ? k.GetString() : null;
        }
        catch (JsonException e)
        {
            return EntryParseResult.Failed(JsonErrorText.PathOf(e), "Not valid JSON: " + JsonErrorText.ReasonOf(e));
        }

        try
        {
            return kind switch
            {
                "material" => new EntryParseResult(kind, JsonSerializer.Deserialize<MaterialEntryDocument>(text, CatalogueJson.Options)!, null, null, null),
                "core" => new EntryParseResult(kind, null, JsonSerializer.Deserialize<CoreEntryDocument>(text, CatalogueJson.Options)!, null, null),
                _ => EntryParseResult.Failed("$.kind", "Missing or unknown kind: use \"core\" or \"material\"."),
            };
        }
        catch (JsonException e)
        {
            return EntryParseResult.Failed(JsonErrorText.PathOf(e), JsonErrorText.ReasonOf(e));
        }
    }

    /// <summary>A JSON path (<c>$.a.b</c>) as a field path (<c>a.b</c>, empty for the whole document).</summary>
    public static string FieldOf(string jsonPath) =>
        jsonPath == "$" ? string.Empty : jsonPath.StartsWith("$.", StringComparison.Ordinal) ? jsonPath[2..] : jsonPath.TrimStart('$');
}
