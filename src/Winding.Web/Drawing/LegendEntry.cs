namespace Winding.Web.Drawing;

/// <summary>One line of the drawing's legend.</summary>
/// <param name="WindingIndex">Index of the winding in winding order.</param>
/// <param name="Name">The winding's name (shown as text only).</param>
/// <param name="Turns">Number of turns.</param>
/// <param name="Colour">The winding's colour as a hex value.</param>
public sealed record LegendEntry(int WindingIndex, string Name, int Turns, string Colour);
