namespace Winding.Web.Sheets;

/// <summary>One row of the windings table, formatted.</summary>
/// <param name="Number">Position in winding order, as shown.</param>
/// <param name="Name">The winding's name.</param>
/// <param name="Turns">Turns.</param>
/// <param name="Wire">Wire size and type.</param>
/// <param name="Strands">Strands and wires in hand.</param>
/// <param name="LengthToCut">Length to cut of each wire, with leads.</param>
/// <param name="Layers">Layers, with the turns of each when more than one.</param>
/// <param name="Placement">Placement or sector.</param>
/// <param name="Direction">Winding sense.</param>
/// <param name="Marks">Start and finish marks.</param>
/// <param name="Taps">Taps and their marks, or a dash.</param>
/// <param name="InsulationUnder">The wrap laid under it, or a dash.</param>
public sealed record SheetWindingLine(
    string Number,
    string Name,
    string Turns,
    string Wire,
    string Strands,
    string LengthToCut,
    string Layers,
    string Placement,
    string Direction,
    string Marks,
    string Taps,
    string InsulationUnder);
