namespace Winding.Web.Drawing;

/// <summary>A line of text on the drawing, mm. The text is always written as text content, never as markup.</summary>
/// <param name="XMm">Anchor point, x, mm.</param>
/// <param name="YMm">Baseline, y, mm.</param>
/// <param name="Text">The text.</param>
/// <param name="SizeMm">Font size, mm.</param>
/// <param name="AlignEnd">True to end the text at the anchor (right-aligned), false to start it there.</param>
public sealed record DrawingLabel(double XMm, double YMm, string Text, double SizeMm, bool AlignEnd);
