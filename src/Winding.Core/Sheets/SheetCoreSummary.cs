namespace Winding.Core.Sheets;

/// <summary>The core as the sheet describes it: shape, dimensions of one core, stack, material class and AL.</summary>
/// <param name="ShapeName">Shape word (<c>toroid</c>, <c>sleeve</c>, <c>two-hole</c>, <c>bobbin</c>).</param>
/// <param name="ShapeText">The shape in plain words, e.g. "ring core (toroid)" or "pot-family bobbin core".</param>
/// <param name="Dimensions">Dimensions of one core, in the order they are usually given.</param>
/// <param name="StackCount">Identical cores wound as one (1 for a single core).</param>
/// <param name="MaterialName">The material class, e.g. "NiZn, μi 125".</param>
/// <param name="InitialPermeability">μi of the material.</param>
/// <param name="EffectivePermeability">μe of the wound core (μi, or lower with an air gap).</param>
/// <param name="AlHenriesPerTurnSquared">AL of the wound (stacked) core, H/turn².</param>
/// <param name="AlTolerance">The AL tolerance used on the sheet, as a fraction (0.25 = ±25 %).</param>
/// <param name="AlBasis">Where AL and its tolerance come from, in plain words.</param>
/// <param name="EffectiveLengthM">le of the wound core, m.</param>
/// <param name="EffectiveAreaM2">Ae of the wound core, m².</param>
public sealed record SheetCoreSummary(
    string ShapeName,
    string ShapeText,
    IReadOnlyList<SheetDimension> Dimensions,
    int StackCount,
    string MaterialName,
    double InitialPermeability,
    double EffectivePermeability,
    double AlHenriesPerTurnSquared,
    double AlTolerance,
    string AlBasis,
    double EffectiveLengthM,
    double EffectiveAreaM2);
