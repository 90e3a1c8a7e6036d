using Winding.Catalogue.Loading;

namespace Winding.Catalogue.Store;

/// <summary>The words and folder names of <see cref="CatalogueEntryKind"/>.</summary>
public static class CatalogueEntryKinds
{
    /// <summary>The <c>kind</c> word in files: <c>material</c> or <c>core</c>.</summary>
    public static string Word(this CatalogueEntryKind kind) => kind switch
    {
        CatalogueEntryKind.Material => "material",
        CatalogueEntryKind.Core => "core",
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "Use Material or Core."),
    };

    /// <summary>The folder of the kind in the user catalogue and its history: <c>materials</c> or <c>cores</c>.</summary>
    public static string Folder(this CatalogueEntryKind kind) => kind switch
    {
        CatalogueEntryKind.Material => CatalogueLoader.UserMaterialsFolder,
        CatalogueEntryKind.Core => CatalogueLoader.UserCoresFolder,
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "Use Material or Core."),
    };

    /// <summary>Reads a kind word (<c>material</c>, <c>core</c>) or folder name (<c>materials</c>, <c>cores</c>), as from a URL.</summary>
    public static bool TryParse(string? text, out CatalogueEntryKind kind)
    {
        switch (text)
        {
            case "material" or "materials":
                kind = CatalogueEntryKind.Material;
                return true;
            case "core" or "cores":
                kind = CatalogueEntryKind.Core;
                return true;
            default:
                kind = default;
                return false;
        }
    }
}
