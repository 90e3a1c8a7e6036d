using Winding.Core.Materials;

namespace Winding.Core.Losses;

/// <summary>
/// The modified Steinmetz equation (MSE), kept for comparison with the iGSE (J. Reinert, A. Brockmeyer,
/// R. W. De Doncker, "Calculation of losses in ferro- and ferrimagnetic materials based on the modified Steinmetz
/// equation", IEEE Trans. Ind. Appl. 37(4), 2001; from memory): an equivalent frequency
/// f_eq = 2/(ΔB²·π²)·∫(dB/dt)² dt and Pv = k·f_eq^(α−1)·B̂^β·f. For triangular flux with rise fraction D,
/// f_eq = 2f/(π²·D·(1 − D)) (physics-sources.md §8.3).
/// Units: W/m³ for f in Hz and B in T. Valid within the Steinmetz fit; no DC bias.
/// </summary>
public static class ModifiedSteinmetz
{
    /// <summary>MSE for triangular flux: Pv = k·(2f/(π²·D·(1 − D)))^(α−1)·B̂^β·f, W/m³.</summary>
    /// <param name="steinmetz">The material's Steinmetz parameters.</param>
    /// <param name="amplitudeT">Peak flux density B̂ = ΔB/2, T, at least 0.</param>
    /// <param name="frequencyHz">Frequency, Hz, above 0.</param>
    /// <param name="riseFraction">Fraction D of the period during which the flux rises, in (0, 1).</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or outside the ranges above.</exception>
    public static double TriangularPowerDensityWPerM3(SteinmetzParameters steinmetz, double amplitudeT, double frequencyHz, double riseFraction)
    {
        ArgumentNullException.ThrowIfNull(steinmetz);
        if (!double.IsFinite(amplitudeT) || amplitudeT < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(amplitudeT), amplitudeT, "The peak flux density must be a finite number of at least 0 T.");
        }

        if (!double.IsFinite(frequencyHz) || frequencyHz <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(frequencyHz), frequencyHz, "The frequency must be a finite number above 0 Hz.");
        }

        if (!double.IsFinite(riseFraction) || riseFraction <= 0 || riseFraction >= 1)
        {
            throw new ArgumentOutOfRangeException(nameof(riseFraction), riseFraction, "The rise fraction must lie in (0, 1).");
        }

        var equivalentFrequencyHz = 2 * frequencyHz / (Math.PI * Math.PI * riseFraction * (1 - riseFraction));
        return steinmetz.CoefficientK * Math.Pow(equivalentFrequencyHz, steinmetz.Alpha - 1) * Math.Pow(amplitudeT, steinmetz.Beta) * frequencyHz;
    }
}
