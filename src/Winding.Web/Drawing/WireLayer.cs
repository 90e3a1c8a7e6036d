namespace Winding.Web.Drawing;

/// <summary>
/// The wires of one layer of one winding (one ring of the bundle in a two-hole core, drawn in both holes).
/// </summary>
/// <param name="PlacedTurns">Turns the fit places in this layer.</param>
/// <param name="TurnStep">1 when every turn is drawn; n when only every n-th turn is drawn (very full layers).</param>
/// <param name="Wires">The circles drawn: one per element in hand of each drawn turn.</param>
public sealed record WireLayer(int PlacedTurns, int TurnStep, IReadOnlyList<DrawnCircle> Wires);
