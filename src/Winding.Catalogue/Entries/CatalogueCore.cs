using Winding.Core.Geometry;
using Winding.Core.Windings;

namespace Winding.Catalogue.Entries;

/// <summary>A validated core entry of the catalogue.</summary>
/// <param name="Id">Stable slug id.</param>
/// <param name="Name">Display name.</param>
/// <param name="Shape">Geometry of one core.</param>
/// <param name="Material">The material entry it is made of.</param>
/// <param name="Source">Provenance of the values.</param>
/// <param name="BuiltIn">True for an entry shipped with the app (read-only), false for a user entry.</param>
/// <param name="Version">The user entry's saved version (1 and up); 0 for a built-in entry.</param>
public sealed record CatalogueCore(string Id, string Name, CoreShape Shape, CatalogueMaterial Material, string Source, bool BuiltIn = true, int Version = 0)
{
    /// <summary>AL measured on a wound sample of one such core (<see cref="CoreEntryDocument.MeasuredAlNh"/>), or null.</summary>
    public InductanceFactor? MeasuredAl { get; init; }
}
