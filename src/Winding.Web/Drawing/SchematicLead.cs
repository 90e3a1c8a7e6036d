namespace Winding.Web.Drawing;

/// <summary>A lead from the coil to its terminal, with its label.</summary>
/// <param name="Kind">Start, tap or finish.</param>
/// <param name="TurnsFromStart">Turns between the start and this lead (0 at the start, N at the finish).</param>
/// <param name="Line">The lead, from the coil outwards; the terminal is at its end.</param>
/// <param name="Label">The label beside the terminal: "1S", "1F", or for a tap "1T1 (10 turns)" (the marks of the bench sheet).</param>
public sealed record SchematicLead(SchematicLeadKind Kind, int TurnsFromStart, SchematicLine Line, SchematicText Label);
