namespace Winding.Web.Drawing;

/// <summary>A scale bar: a line of a round length (in mm or in), drawn to the same scale as the core.</summary>
/// <param name="XMm">Left end, x, mm.</param>
/// <param name="YMm">Height of the bar, y, mm.</param>
/// <param name="LengthMm">Length of the bar, mm (1, 2 or 5 times a power of ten of mm, or of inches in imperial).</param>
/// <param name="Label">The length in words, e.g. "5 mm" or "0.2 in".</param>
public sealed record ScaleBar(double XMm, double YMm, double LengthMm, string Label);
