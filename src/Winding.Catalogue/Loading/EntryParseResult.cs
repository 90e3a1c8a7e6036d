using Winding.Catalogue.Entries;

namespace Winding.Catalogue.Loading;

/// <summary>The outcome of reading one entry's text: its kind and document, or where and why it failed.</summary>
/// <param name="Kind"><c>core</c> or <c>material</c>; null when the text could not be read.</param>
/// <param name="Material">The material document (kind <c>material</c>).</param>
/// <param name="Core">The core document (kind <c>core</c>).</param>
/// <param name="ErrorPath">JSON path of the error, or null when the text was read.</param>
/// <param name="ErrorReason">Plain words, or null when the text was read.</param>
internal sealed record EntryParseResult(string? Kind, MaterialEntryDocument? Material, CoreEntryDocument? Core, string? ErrorPath, string? ErrorReason)
{
    /// <summary>True when a document was read.</summary>
    public bool Succeeded => ErrorPath is null;

    /// <summary>The entry's id as written (may be invalid).</summary>
    public string? Id => Material?.Id ?? Core?.Id;

    /// <summary>The version as written in the file, if any.</summary>
    public int? Version => Material?.Version ?? Core?.Version;

    /// <summary>A failed read.</summary>
    public static EntryParseResult Failed(string path, string reason) => new(null, null, null, path, reason);
}
