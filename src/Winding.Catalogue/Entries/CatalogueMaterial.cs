using Winding.Core.Materials;

namespace Winding.Catalogue.Entries;

/// <summary>A validated material entry of the catalogue.</summary>
/// <param name="Id">Stable slug id.</param>
/// <param name="Name">Display name by class.</param>
/// <param name="Family">Material family, one of <see cref="MaterialFamilies.All"/>.</param>
/// <param name="Material">The engine's material.</param>
/// <param name="Source">Provenance of the values.</param>
public sealed record CatalogueMaterial(string Id, string Name, string Family, MagneticMaterial Material, string Source)
{
    /// <summary>The μs′/μs″ table in increasing frequency; empty when only μi is known.</summary>
    public IReadOnlyList<ComplexPermeabilityPoint> PermeabilityPoints => Material.Permeability.Points;
}
