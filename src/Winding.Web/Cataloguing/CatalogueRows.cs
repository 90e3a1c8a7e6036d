using Winding.Catalogue.Entries;
using Winding.Catalogue.Loading;
using Winding.Core.Geometry;
using Winding.Core.Plans;

namespace Winding.Web.Cataloguing;

/// <summary>Builds the catalogue table's rows: each core with its AL (one core, from its material) and window.</summary>
public static class CatalogueRows
{
    /// <summary>Rows for every core of <paramref name="catalogue"/>.</summary>
    public static IReadOnlyList<CatalogueRow> For(CoreCatalogue catalogue)
    {
        ArgumentNullException.ThrowIfNull(catalogue);
        return [.. catalogue.Cores.Select(For)];
    }

    /// <summary>The row of one core.</summary>
    public static CatalogueRow For(CatalogueCore core)
    {
        ArgumentNullException.ThrowIfNull(core);
        var planCore = new PlanCore(core.Shape, 1, core.Material.Material);
        return new CatalogueRow(
            core.Id,
            core.Name,
            core.Shape.ShapeName,
            SizeMm(core.Shape),
            core.Material.Id,
            core.Material.Name,
            core.Material.Family,
            planCore.InductanceFactor.NanohenriesPerTurnSquared,
            core.Shape.WindowAreaM2 * 1e6,
            core.BuiltIn);
    }

    private static double SizeMm(CoreShape shape) => shape switch
    {
        ToroidCore t => t.OuterDiameter.Millimetres,
        SleeveCore s => s.OuterDiameter.Millimetres,
        TwoHoleCore h => h.Width.Millimetres,
        BobbinCore b => Math.Sqrt(b.EffectiveAreaM2) * 1e3,
        _ => 0,
    };
}
