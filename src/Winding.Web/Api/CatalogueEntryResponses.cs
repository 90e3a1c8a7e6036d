using Winding.Catalogue.Entries;

namespace Winding.Web.Api;

/// <summary>A core in the catalogue API.</summary>
/// <param name="Id">Slug id.</param>
/// <param name="Name">Display name.</param>
/// <param name="Shape">Shape word.</param>
/// <param name="DimensionsMm">Dimensions as stored (mm).</param>
/// <param name="MaterialId">Material id.</param>
/// <param name="AlH">AL of one core in its material, H per turn².</param>
/// <param name="BuiltIn">True for built-in (read-only) entries.</param>
/// <param name="Version">Version (0 for built-ins); send it as If-Match to change or delete the entry.</param>
/// <param name="Source">Where the values come from.</param>
public sealed record CoreEntryResponse(string Id, string Name, string Shape, DimensionsMmDocument? DimensionsMm, string MaterialId, double AlH, bool BuiltIn, int Version, string Source);

/// <summary>A material in the catalogue API.</summary>
/// <param name="Id">Slug id.</param>
/// <param name="Name">Display name.</param>
/// <param name="Family">NiZn, MnZn or iron powder.</param>
/// <param name="InitialPermeability">μi.</param>
/// <param name="Permeability">μ′, μ″ against frequency.</param>
/// <param name="BuiltIn">True for built-in (read-only) entries.</param>
/// <param name="Version">Version (0 for built-ins).</param>
/// <param name="Source">Where the values come from.</param>
public sealed record MaterialEntryResponse(string Id, string Name, string Family, double InitialPermeability, IReadOnlyList<PermeabilityPointResponse> Permeability, bool BuiltIn, int Version, string Source);

/// <summary>A catalogue file that could not be loaded.</summary>
/// <param name="File">File name (user files start with <c>user/</c>).</param>
/// <param name="JsonPath">Where in the file.</param>
/// <param name="Reason">Why.</param>
public sealed record CatalogueProblemResponse(string File, string JsonPath, string Reason);
