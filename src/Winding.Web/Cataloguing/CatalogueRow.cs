namespace Winding.Web.Cataloguing;

/// <summary>One core in the catalogue table.</summary>
/// <param name="Id">Entry id.</param>
/// <param name="Name">Display name.</param>
/// <param name="Shape">Shape word.</param>
/// <param name="SizeMm">Characteristic size for sorting: outer diameter of rings, width of two-hole cores, √Ae of bobbins, mm.</param>
/// <param name="MaterialId">Material id.</param>
/// <param name="MaterialName">Material name.</param>
/// <param name="MaterialFamily">Material family (NiZn, MnZn, iron powder).</param>
/// <param name="AlNh">AL of one core, nH per turn².</param>
/// <param name="WindowAreaMm2">Window area, mm².</param>
/// <param name="BuiltIn">True for built-in entries.</param>
public sealed record CatalogueRow(
    string Id,
    string Name,
    string Shape,
    double SizeMm,
    string MaterialId,
    string MaterialName,
    string MaterialFamily,
    double AlNh,
    double WindowAreaMm2,
    bool BuiltIn);
