using Winding.Core.Quantities;

namespace Winding.Core.Windings;

/// <summary>
/// How a winding lies on the core, layer by layer: the turns in each layer, whether all turns found room, the hole left
/// in the window afterwards, and the mean turn length.
/// </summary>
/// <param name="TurnsPerLayer">Turns placed in each layer, innermost first.</param>
/// <param name="UnplacedTurns">Turns for which no layer had room (0 when the winding fits).</param>
/// <param name="RemainingHoleDiameter">Diameter of the hole left after this winding (never negative).</param>
/// <param name="LayerMeanTurnLengthsM">Mean turn length of each layer, in m.</param>
/// <param name="MeanTurnLengthM">Mean turn length over the placed turns, weighted by turns per layer, in m.</param>
/// <param name="BuildThickness">Radial thickness the winding adds on the inside of the window.</param>
public sealed record LayerFit(
    IReadOnlyList<int> TurnsPerLayer,
    int UnplacedTurns,
    Length RemainingHoleDiameter,
    IReadOnlyList<double> LayerMeanTurnLengthsM,
    double MeanTurnLengthM,
    Length BuildThickness)
{
    /// <summary>True when every turn found room.</summary>
    public bool Fits => UnplacedTurns == 0;

    /// <summary>Number of layers used.</summary>
    public int Layers => TurnsPerLayer.Count;
}
