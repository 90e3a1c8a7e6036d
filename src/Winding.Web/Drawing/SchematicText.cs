namespace Winding.Web.Drawing;

/// <summary>A line of text on the schematic, in drawing units. Always written as text content, never as markup.</summary>
/// <param name="X">Anchor point, x.</param>
/// <param name="Y">Baseline, y.</param>
/// <param name="Text">The text.</param>
/// <param name="AlignEnd">True to end the text at the anchor (it runs to the left), false to start it there.</param>
public sealed record SchematicText(double X, double Y, string Text, bool AlignEnd);
