using Winding.Core.Quantities;

namespace Winding.Core.Windings;

/// <summary>
/// How a winding lies on the core: the turns in each layer (or one bundle through a two-hole core's holes), whether all
/// turns found room, what is left, the mean turn lengths, and the outcome with its reason in plain words.
/// </summary>
/// <param name="TurnsPerLayer">Turns placed in each layer, innermost first (one entry for a two-hole bundle).</param>
/// <param name="UnplacedTurns">Turns for which there was no room (0 when the winding fits).</param>
/// <param name="LayerMeanTurnLengthsM">Mean turn length of each layer, m.</param>
/// <param name="MeanTurnLengthM">Mean turn length over the placed turns, weighted by turns per layer, m.</param>
/// <param name="BuildBelowM">Radial build under this winding (coating, earlier windings, its wrap), m.</param>
/// <param name="BuildThicknessM">Radial thickness of this winding itself, m.</param>
/// <param name="RemainingHoleDiameter">The hole left after this winding (ring cores; for a two-hole core the diameter of
/// a circle with the free area of a hole); null for a bobbin.</param>
/// <param name="RemainingWindowHeightM">Bobbin only: window height left after this winding, m.</param>
/// <param name="BreadthM">Winding breadth b_w: the arc of the inner circumference the winding covers (ring cores), the
/// bobbin breadth, or the hole circumference (two-hole), m.</param>
/// <param name="Outcome">Fits, tight or does not fit.</param>
/// <param name="Reason">The outcome in plain words.</param>
/// <param name="Method">How the fit was computed, in plain words.</param>
public sealed record WindingFit(
    IReadOnlyList<int> TurnsPerLayer,
    int UnplacedTurns,
    IReadOnlyList<double> LayerMeanTurnLengthsM,
    double MeanTurnLengthM,
    double BuildBelowM,
    double BuildThicknessM,
    Length? RemainingHoleDiameter,
    double? RemainingWindowHeightM,
    double BreadthM,
    FitOutcome Outcome,
    string Reason,
    string Method)
{
    /// <summary>True when every turn found room (fits or tight).</summary>
    public bool Fits => UnplacedTurns == 0;

    /// <summary>Number of layers used.</summary>
    public int Layers => TurnsPerLayer.Count;
}
