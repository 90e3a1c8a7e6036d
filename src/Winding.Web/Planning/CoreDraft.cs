using Winding.Catalogue.Entries;

namespace Winding.Web.Planning;

/// <summary>
/// A core typed on the plan page (texts, not yet validated): shape, caliper dimensions in the plan document's field
/// names (<c>outerDiameter</c> …, plain numbers in mm), entered effective parameters and AL where the shape takes them,
/// and what the material is taken from. Read through the same <see cref="Winding.Catalogue.Plans.PlanReader"/> as the API.
/// </summary>
public sealed class CoreDraft
{
    /// <summary>The dimension fields each shape shows, in the plan document's names (see <see cref="DimensionsMmDocument"/>).</summary>
    public static IReadOnlyDictionary<string, IReadOnlyList<string>> DimensionsByShape { get; } = new Dictionary<string, IReadOnlyList<string>>(StringComparer.Ordinal)
    {
        [CoreShapes.Toroid] = ["outerDiameter", "innerDiameter", "height", "coatingThickness"],
        [CoreShapes.Sleeve] = ["outerDiameter", "innerDiameter", "length", "residualGap"],
        [CoreShapes.TwoHole] = ["length", "holeDiameter", "holeSpacing", "width", "height"],
        [CoreShapes.Bobbin] = ["windowBreadth", "windowHeight", "legDiameter", "legWidth", "legDepth", "bobbinWall"],
    };

    /// <summary>The shape word (<see cref="CoreShapes"/>).</summary>
    public string Shape { get; set; } = CoreShapes.Toroid;

    /// <summary>Bobbin family (empty: not given).</summary>
    public string Family { get; set; } = string.Empty;

    /// <summary>Dimension texts by field name; a field of another shape keeps its text for when the shape comes back.</summary>
    public Dictionary<string, string> Dimensions { get; } = new(StringComparer.Ordinal);

    /// <summary>Entered effective area Ae as typed, mm² (two-hole: optional; bobbin: required).</summary>
    public string EffectiveArea { get; set; } = string.Empty;

    /// <summary>Entered effective length le as typed, mm (with the area).</summary>
    public string EffectiveLength { get; set; } = string.Empty;

    /// <summary>Bobbin cores: AL from the datasheet as typed, nH (empty: from μi and the effective parameters).</summary>
    public string DatasheetAl { get; set; } = string.Empty;

    /// <summary>What the material is taken from.</summary>
    public CoreMaterialBasis MaterialBasis { get; set; } = CoreMaterialBasis.MeasuredAl;

    /// <summary>Catalogue material id for <see cref="CoreMaterialBasis.MaterialClass"/>.</summary>
    public string? MaterialId { get; set; }

    /// <summary>μi as typed for <see cref="CoreMaterialBasis.Permeability"/>.</summary>
    public string Permeability { get; set; } = string.Empty;

    /// <summary>
    /// Measured AL of the core as typed, nH per turn² (SI prefixes allowed): required for
    /// <see cref="CoreMaterialBasis.MeasuredAl"/>, optional otherwise (it then replaces the computed AL).
    /// </summary>
    public string MeasuredAl { get; set; } = string.Empty;

    /// <summary>The dimension text of <paramref name="field"/> (empty when not typed).</summary>
    public string Dimension(string field) => Dimensions.GetValueOrDefault(field, string.Empty);

    /// <summary>The dimension fields of the current shape (none for an unknown shape).</summary>
    public IReadOnlyList<string> ShownDimensions => DimensionsByShape.GetValueOrDefault(Shape, []);

    /// <summary>Whether the current shape takes entered effective parameters.</summary>
    public bool TakesEffective => Shape is CoreShapes.TwoHole or CoreShapes.Bobbin;
}
