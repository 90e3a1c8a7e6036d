using MathNet.Numerics.Optimization;
using MathNet.Numerics.RootFinding;

namespace Winding.Core.Response;

/// <summary>
/// The pass band of a response: the minimum insertion loss, and the frequencies below and above it where the loss is
/// 1 dB and 3 dB worse. The minimum is refined with MathNet's golden-section minimiser between the grid neighbours of the
/// smallest grid value; each edge is bracketed on the grid and found with MathNet's Brent root finder on log f, so the
/// edges are not read off the grid. An edge that does not occur within the sweep is null.
/// </summary>
/// <param name="MinimumInsertionLossDb">Smallest insertion loss, dB.</param>
/// <param name="MinimumFrequencyHz">Where it occurs, Hz.</param>
/// <param name="Lower1DbHz">Lower 1 dB edge, Hz.</param>
/// <param name="Upper1DbHz">Upper 1 dB edge, Hz.</param>
/// <param name="LowerCutoffHz">Lower 3 dB edge, Hz.</param>
/// <param name="UpperCutoffHz">Upper 3 dB edge, Hz.</param>
public sealed record BandEdges(
    double MinimumInsertionLossDb,
    double MinimumFrequencyHz,
    double? Lower1DbHz,
    double? Upper1DbHz,
    double? LowerCutoffHz,
    double? UpperCutoffHz)
{
    /// <summary>Finds the band of <paramref name="circuit"/> from its sweep <paramref name="sweep"/> (at least 3 points, ascending).</summary>
    public static BandEdges Find(EquivalentCircuit circuit, IReadOnlyList<CircuitPoint> sweep)
    {
        ArgumentNullException.ThrowIfNull(circuit);
        ArgumentNullException.ThrowIfNull(sweep);
        ArgumentOutOfRangeException.ThrowIfLessThan(sweep.Count, 3);
        var best = 0;
        for (var i = 1; i < sweep.Count; i++)
        {
            if (sweep[i].InsertionLossDb < sweep[best].InsertionLossDb)
            {
                best = i;
            }
        }

        double Loss(double logF) => circuit.At(Math.Pow(10, logF)).InsertionLossDb;
        var minimumDb = sweep[best].InsertionLossDb;
        var minimumHz = sweep[best].FrequencyHz;
        if (best > 0 && best < sweep.Count - 1)
        {
            try
            {
                var result = GoldenSectionMinimizer.Minimum(
                    ObjectiveFunction.ScalarValue(Loss),
                    Math.Log10(sweep[best - 1].FrequencyHz),
                    Math.Log10(sweep[best + 1].FrequencyHz),
                    1e-9);
                if (result.FunctionInfoAtMinimum.Value < minimumDb)
                {
                    minimumDb = result.FunctionInfoAtMinimum.Value;
                    minimumHz = Math.Pow(10, result.MinimizingPoint);
                }
            }
            catch (OptimizationException)
            {
                // Keep the grid minimum: the refinement is a nicety, not a requirement.
            }
        }

        return new BandEdges(
            minimumDb,
            minimumHz,
            Edge(sweep, best, minimumDb + 1, downwards: true, Loss),
            Edge(sweep, best, minimumDb + 1, downwards: false, Loss),
            Edge(sweep, best, minimumDb + 3, downwards: true, Loss),
            Edge(sweep, best, minimumDb + 3, downwards: false, Loss));
    }

    private static double? Edge(IReadOnlyList<CircuitPoint> sweep, int from, double levelDb, bool downwards, Func<double, double> loss)
    {
        var step = downwards ? -1 : 1;
        for (var i = from; i + step >= 0 && i + step < sweep.Count; i += step)
        {
            var inside = sweep[i];
            var outside = sweep[i + step];
            if (outside.InsertionLossDb >= levelDb && inside.InsertionLossDb < levelDb)
            {
                var a = Math.Log10(inside.FrequencyHz);
                var b = Math.Log10(outside.FrequencyHz);
                return Brent.TryFindRoot(x => loss(x) - levelDb, Math.Min(a, b), Math.Max(a, b), 1e-12, 200, out var root)
                    ? Math.Pow(10, root)
                    : null;
            }
        }

        return null;
    }
}
