namespace Winding.Web.Drawing;

/// <summary>One wire seen end on: a circle of the wire's overall diameter, in millimetres on the drawing.</summary>
/// <param name="CentreXMm">Centre, x, mm (to the right).</param>
/// <param name="CentreYMm">Centre, y, mm (downwards, as in SVG).</param>
/// <param name="DiameterMm">Diameter, mm.</param>
public sealed record DrawnCircle(double CentreXMm, double CentreYMm, double DiameterMm)
{
    /// <summary>Radius, mm.</summary>
    public double RadiusMm => DiameterMm / 2;
}
