namespace Winding.Core.Characterisation;

/// <summary>
/// A material class ranked by how close its initial permeability lies to a measured one
/// (<see cref="CoreCharacterisation.NearestMaterialClasses"/>).
/// </summary>
/// <param name="Id">The class's identifier.</param>
/// <param name="Name">The class's display name.</param>
/// <param name="InitialPermeability">The class's μi.</param>
/// <param name="LogDistance">|ln(μ/μi)|, dimensionless: 0 for a perfect match, ln 2 ≈ 0.693 for a factor of two either way.</param>
public sealed record MaterialClassMatch(string Id, string Name, double InitialPermeability, double LogDistance);
