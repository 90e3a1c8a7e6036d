using Winding.Core.Quantities;

namespace Winding.Core.Windings;

/// <summary>The raw result of <see cref="ToroidLayerFit.Layers"/>.</summary>
/// <param name="TurnsPerLayer">Turns in each layer.</param>
/// <param name="UnplacedTurns">Turns without room.</param>
/// <param name="LayerMeanTurnLengthsM">Mean turn length per layer, m.</param>
/// <param name="MeanTurnLengthM">Weighted mean turn length, m.</param>
/// <param name="StartHoleDiameterM">The hole this winding started in, m.</param>
/// <param name="RemainingHoleDiameterM">The hole left, m.</param>
public sealed record RingLayers(
    IReadOnlyList<int> TurnsPerLayer,
    int UnplacedTurns,
    IReadOnlyList<double> LayerMeanTurnLengthsM,
    double MeanTurnLengthM,
    double StartHoleDiameterM,
    double RemainingHoleDiameterM)
{
    /// <summary>
    /// The fit with its outcome. Tight (common practice, no source) when the hole left is under three element diameters
    /// — too small to pass the wire's end through for the last turns without a needle.
    /// </summary>
    /// <param name="buildBelowM">Build under the winding, m.</param>
    /// <param name="breadthM">The winding's breadth b_w (the arc of the circumference it covers), m.</param>
    /// <param name="turns">Turns asked for.</param>
    /// <param name="elementDiameterM">Element overall diameter, m.</param>
    public WindingFit ToFit(double buildBelowM, double breadthM, int turns, double elementDiameterM)
    {
        FitOutcome outcome;
        string reason;
        if (UnplacedTurns > 0)
        {
            outcome = FitOutcome.DoesNotFit;
            reason = FormattableString.Invariant($"Only {turns - UnplacedTurns} of {turns} turns find room in the hole ({TurnsPerLayer.Count} layer{(TurnsPerLayer.Count == 1 ? string.Empty : "s")}).");
        }
        else if (RemainingHoleDiameterM < 3 * elementDiameterM)
        {
            outcome = FitOutcome.Tight;
            reason = FormattableString.Invariant($"The hole left ({RemainingHoleDiameterM * 1e3:0.##} mm) is under three wire diameters: the last turns will be hard to pull through.");
        }
        else
        {
            outcome = FitOutcome.Fits;
            reason = FormattableString.Invariant($"{TurnsPerLayer.Count} layer{(TurnsPerLayer.Count == 1 ? string.Empty : "s")}, {RemainingHoleDiameterM * 1e3:0.##} mm hole left.");
        }

        var thicknessM = (StartHoleDiameterM - RemainingHoleDiameterM) / 2;
        return new WindingFit(
            TurnsPerLayer,
            UnplacedTurns,
            LayerMeanTurnLengthsM,
            MeanTurnLengthM,
            buildBelowM,
            thicknessM,
            Length.FromMetres(RemainingHoleDiameterM),
            null,
            breadthM,
            outcome,
            reason,
            "layers on the inner circumference of the hole");
    }
}
