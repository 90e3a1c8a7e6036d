namespace Winding.Web.Drawing;

/// <summary>A scale bar: a line of a round length in mm, drawn to the same scale as the core.</summary>
/// <param name="XMm">Left end, x, mm.</param>
/// <param name="YMm">Height of the bar, y, mm.</param>
/// <param name="LengthMm">Length of the bar, mm (1, 2 or 5 times a power of ten).</param>
/// <param name="Label">The length in words, e.g. "5 mm".</param>
public sealed record ScaleBar(double XMm, double YMm, double LengthMm, string Label);
