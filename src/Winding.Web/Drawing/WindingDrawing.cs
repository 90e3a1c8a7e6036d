namespace Winding.Web.Drawing;

/// <summary>The drawn wires of one winding.</summary>
/// <param name="Index">Index of the winding in winding order.</param>
/// <param name="Name">The winding's name (shown as text only).</param>
/// <param name="Colour">Its colour as a hex value.</param>
/// <param name="Layers">Its layers, innermost (or nearest the leg) first.</param>
public sealed record WindingDrawing(int Index, string Name, string Colour, IReadOnlyList<WireLayer> Layers)
{
    /// <summary>Number of circles drawn over all layers.</summary>
    public int DrawnWires => Layers.Sum(l => l.Wires.Count);
}
