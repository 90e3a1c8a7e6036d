namespace Winding.Web.Drawing;

/// <summary>One winding drawn as a coil beside the core.</summary>
/// <param name="Index">Index of the winding in winding order (its number on the drawing is Index + 1).</param>
/// <param name="Name">The winding's name (shown as text only).</param>
/// <param name="Turns">Number of turns.</param>
/// <param name="OnLeft">True for the coil left of the core (the first winding), false for those on the right.</param>
/// <param name="Loops">Number of loops drawn (see <see cref="SchematicModel.LoopsFor"/>).</param>
/// <param name="PathData">The coil as SVG path data: one half-circle arc (an <c>A</c> command) per loop, bulging towards the core.</param>
/// <param name="DotX">Centre of the phasing dot, x: beside the start, outside the coil.</param>
/// <param name="DotY">Centre of the phasing dot, y.</param>
/// <param name="Leads">Start, taps (from the start) and finish.</param>
/// <param name="NameText">The winding's name, above the coil.</param>
/// <param name="TurnsText">"N turns", under the name.</param>
public sealed record SchematicCoil(
    int Index,
    string Name,
    int Turns,
    bool OnLeft,
    int Loops,
    string PathData,
    double DotX,
    double DotY,
    IReadOnlyList<SchematicLead> Leads,
    SchematicText NameText,
    SchematicText TurnsText);
