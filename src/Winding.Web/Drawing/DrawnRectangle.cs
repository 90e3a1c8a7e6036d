namespace Winding.Web.Drawing;

/// <summary>A rectangle of the drawing (a bobbin's window, wall and leg; a two-hole core's end face), mm.</summary>
/// <param name="XMm">Left edge, mm.</param>
/// <param name="YMm">Top edge, mm (downwards).</param>
/// <param name="WidthMm">Width, mm.</param>
/// <param name="HeightMm">Height, mm.</param>
/// <param name="Role">What it shows: <c>core</c>, <c>leg</c>, <c>wall</c> or <c>window</c>.</param>
/// <param name="Fill">Fill colour as a hex value.</param>
public sealed record DrawnRectangle(double XMm, double YMm, double WidthMm, double HeightMm, string Role, string Fill);
