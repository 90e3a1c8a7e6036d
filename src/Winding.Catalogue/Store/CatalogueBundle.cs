using System.Text.Json;

namespace Winding.Catalogue.Store;

/// <summary>
/// The JSON form of an exported user catalogue: every user entry as saved (with its version), materials first. Entries
/// are kept as raw JSON so that one bad entry in an imported bundle is refused alone.
/// </summary>
public sealed class CatalogueBundle
{
    /// <summary>The format word, always <see cref="FormatName"/>.</summary>
    public const string FormatName = "winding-catalogue-bundle";

    /// <summary>Always <see cref="FormatName"/>.</summary>
    public string? Format { get; set; }

    /// <summary>Format version, 1.</summary>
    public int? FormatVersion { get; set; }

    /// <summary>When the bundle was exported.</summary>
    public DateTimeOffset? ExportedAt { get; set; }

    /// <summary>Material entries (<c>"kind": "material"</c>).</summary>
    public List<JsonElement>? Materials { get; set; }

    /// <summary>Core entries (<c>"kind": "core"</c>).</summary>
    public List<JsonElement>? Cores { get; set; }
}
