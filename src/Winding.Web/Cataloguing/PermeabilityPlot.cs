using Winding.Core.Materials;
using Winding.Web.Display;

namespace Winding.Web.Cataloguing;

/// <summary>
/// μ′ and μ″ resampled at equal steps of log frequency (so that a category axis is a true log-frequency axis), with a
/// label at each decade.
/// </summary>
/// <param name="Labels">X labels: the frequency at each decade, empty elsewhere.</param>
/// <param name="MuPrime">μ′ at each point.</param>
/// <param name="MuDoublePrime">μ″ at each point.</param>
public sealed record PermeabilityPlot(string[] Labels, double[] MuPrime, double[] MuDoublePrime)
{
    /// <summary>Points per decade of the plot.</summary>
    public const int PointsPerDecade = 8;

    /// <summary>Samples <paramref name="curve"/> over its table (1 kHz to 1 GHz for a constant curve).</summary>
    public static PermeabilityPlot For(ComplexPermeabilityCurve curve)
    {
        ArgumentNullException.ThrowIfNull(curve);
        var startDecade = curve.IsFrequencyIndependent ? 3 : Math.Floor(Math.Log10(curve.Points[0].FrequencyHz));
        var stopDecade = curve.IsFrequencyIndependent ? 9 : Math.Ceiling(Math.Log10(curve.Points[^1].FrequencyHz));
        var count = (int)((stopDecade - startDecade) * PointsPerDecade) + 1;
        var labels = new string[count];
        var muPrime = new double[count];
        var muDoublePrime = new double[count];
        for (var i = 0; i < count; i++)
        {
            var frequency = Math.Pow(10, startDecade + (double)i / PointsPerDecade);
            var point = curve.At(frequency);
            muPrime[i] = point.MuPrime;
            muDoublePrime[i] = point.MuDoublePrime;
            labels[i] = i % PointsPerDecade == 0 ? EngineeringFormat.Format(frequency, "Hz") : string.Empty;
        }

        return new PermeabilityPlot(labels, muPrime, muDoublePrime);
    }
}
