using Winding.Core.Materials;

namespace Winding.Catalogue.Entries;

/// <summary>A validated material entry of the catalogue.</summary>
/// <param name="Id">Stable slug id.</param>
/// <param name="Name">Display name by class.</param>
/// <param name="Family">Material family, one of <see cref="MaterialFamilies.All"/>.</param>
/// <param name="Material">The engine's material.</param>
/// <param name="Source">Provenance of the values.</param>
/// <param name="BuiltIn">True for an entry shipped with the app (read-only), false for a user entry.</param>
/// <param name="Version">The user entry's saved version (1 and up); 0 for a built-in entry.</param>
public sealed record CatalogueMaterial(string Id, string Name, string Family, MagneticMaterial Material, string Source, bool BuiltIn = true, int Version = 0)
{
    /// <summary>The μs′/μs″ table in increasing frequency; empty when only μi is known.</summary>
    public IReadOnlyList<ComplexPermeabilityPoint> PermeabilityPoints => Material.Permeability.Points;
}
