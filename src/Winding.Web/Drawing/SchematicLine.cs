namespace Winding.Web.Drawing;

/// <summary>A straight line on the schematic, in drawing units (y downwards, as in SVG).</summary>
/// <param name="X1">Start, x.</param>
/// <param name="Y1">Start, y.</param>
/// <param name="X2">End, x.</param>
/// <param name="Y2">End, y.</param>
public sealed record SchematicLine(double X1, double Y1, double X2, double Y2);
