namespace Winding.Core.Response;

/// <summary>Log-spaced frequency sweeps.</summary>
public static class FrequencySweep
{
    /// <summary>Most points in one sweep.</summary>
    public const int MaximumPoints = 100_001;

    /// <summary><paramref name="points"/> frequencies from <paramref name="startHz"/> to <paramref name="stopHz"/>, equally spaced on log f
    /// (MathNet <c>Generate.LogSpaced</c>), both ends included.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not 0 &lt; start &lt; stop, or fewer than 2 points.</exception>
    public static double[] LogSpaced(double startHz, double stopHz, int points)
    {
        if (!(startHz > 0) || !(stopHz > startHz) || !double.IsFinite(stopHz))
        {
            throw new ArgumentOutOfRangeException(nameof(startHz), startHz, "A sweep needs 0 < start < stop, both finite.");
        }

        ArgumentOutOfRangeException.ThrowIfLessThan(points, 2);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(points, MaximumPoints);
        var frequencies = MathNet.Numerics.Generate.LogSpaced(points, Math.Log10(startHz), Math.Log10(stopHz));
        frequencies[0] = startHz;
        frequencies[^1] = stopHz;
        return frequencies;
    }

    /// <summary>The circuit's response at every frequency.</summary>
    public static CircuitPoint[] Run(EquivalentCircuit circuit, IReadOnlyList<double> frequenciesHz)
    {
        ArgumentNullException.ThrowIfNull(circuit);
        ArgumentNullException.ThrowIfNull(frequenciesHz);
        var points = new CircuitPoint[frequenciesHz.Count];
        for (var i = 0; i < points.Length; i++)
        {
            points[i] = circuit.At(frequenciesHz[i]);
        }

        return points;
    }
}
