namespace Winding.Catalogue.Entries;

/// <summary>
/// Core dimensions in millimetres, as measured with a caliper (JSON: <c>dimensionsMm</c>). Which fields a shape needs:
/// <list type="bullet">
/// <item><c>toroid</c>: outerDiameter, innerDiameter, height; optional coatingThickness.</item>
/// <item><c>sleeve</c>: outerDiameter, innerDiameter (the bore), length; optional residualGap (split clamp-on sleeves:
/// the total air gap of both mating faces).</item>
/// <item><c>two-hole</c>: length (along the holes), holeDiameter, holeSpacing (centre to centre), width, height.</item>
/// <item><c>bobbin</c>: windowBreadth, windowHeight, legDiameter (round leg) or legWidth and legDepth (rectangular
/// leg), optional bobbinWall.</item>
/// </list>
/// </summary>
public sealed class DimensionsMmDocument
{
    /// <summary>Outer diameter (toroid, sleeve), mm.</summary>
    public double? OuterDiameter { get; set; }

    /// <summary>Inner diameter (toroid) or bore (sleeve), mm.</summary>
    public double? InnerDiameter { get; set; }

    /// <summary>Height: axial thickness of a toroid, or the end-face height of a two-hole core, mm.</summary>
    public double? Height { get; set; }

    /// <summary>Insulating coating thickness of a toroid, mm.</summary>
    public double? CoatingThickness { get; set; }

    /// <summary>Length along the axis (sleeve) or along the holes (two-hole), mm.</summary>
    public double? Length { get; set; }

    /// <summary>Total residual air gap of a split sleeve, mm.</summary>
    public double? ResidualGap { get; set; }

    /// <summary>Hole diameter of a two-hole core, mm.</summary>
    public double? HoleDiameter { get; set; }

    /// <summary>Distance between the hole centres of a two-hole core, mm.</summary>
    public double? HoleSpacing { get; set; }

    /// <summary>End-face width of a two-hole core, mm.</summary>
    public double? Width { get; set; }

    /// <summary>Bobbin winding breadth along the leg, mm.</summary>
    public double? WindowBreadth { get; set; }

    /// <summary>Bobbin winding height (radial build available), mm.</summary>
    public double? WindowHeight { get; set; }

    /// <summary>Round centre leg diameter, mm.</summary>
    public double? LegDiameter { get; set; }

    /// <summary>Rectangular centre leg width, mm.</summary>
    public double? LegWidth { get; set; }

    /// <summary>Rectangular centre leg depth, mm.</summary>
    public double? LegDepth { get; set; }

    /// <summary>Bobbin wall thickness between leg and first layer, mm.</summary>
    public double? BobbinWall { get; set; }
}
