namespace Winding.Catalogue.Store;

/// <summary>The two kinds of catalogue entry a user can keep.</summary>
public enum CatalogueEntryKind
{
    /// <summary>A material (<c>"kind": "material"</c>, stored under <c>materials/</c>).</summary>
    Material,

    /// <summary>A core (<c>"kind": "core"</c>, stored under <c>cores/</c>).</summary>
    Core,
}
