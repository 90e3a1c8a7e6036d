namespace Winding.Catalogue.Entries;

/// <summary>The JSON form of a material catalogue entry (<c>"kind": "material"</c>), one per file.</summary>
public sealed class MaterialEntryDocument
{
    /// <summary>Always <c>material</c>.</summary>
    public string? Kind { get; set; }

    /// <summary>Stable id: a slug of lower-case letters, digits and hyphens.</summary>
    public string? Id { get; set; }

    /// <summary>Display name by class, e.g. "NiZn, μi 125".</summary>
    public string? Name { get; set; }

    /// <summary>Initial relative permeability μi.</summary>
    public double? InitialPermeability { get; set; }

    /// <summary>Where the values come from.</summary>
    public string? Source { get; set; }
}
