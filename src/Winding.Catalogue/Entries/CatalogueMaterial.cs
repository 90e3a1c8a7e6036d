using Winding.Core.Materials;

namespace Winding.Catalogue.Entries;

/// <summary>A validated material entry of the catalogue.</summary>
/// <param name="Id">Stable slug id.</param>
/// <param name="Name">Display name by class.</param>
/// <param name="Material">The engine's material.</param>
/// <param name="Source">Provenance of the values.</param>
public sealed record CatalogueMaterial(string Id, string Name, MagneticMaterial Material, string Source);
