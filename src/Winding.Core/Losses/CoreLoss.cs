using Winding.Core.Magnetics;
using Winding.Core.Materials;

namespace Winding.Core.Losses;

/// <summary>
/// Core loss at an operating point: the volumetric loss Pv and the total loss P = Pv·Ve.
/// <list type="bullet">
/// <item>Sine: Steinmetz, Pv = k·f^α·B̂^β (C. P. Steinmetz, Trans. AIEE 9, 1892; from memory).</item>
/// <item>Square and pulse: the flux is triangular (rising during D·T, falling linearly during the rest), and the iGSE
/// closed form Pv = k_i·ΔB^β·f^α·[D^(1−α) + (1 − D)^(1−α)] is used (Venkatachalam et al., IEEE COMPEL 2002; see
/// <see cref="ImprovedSteinmetz"/>), with k_i from numerical integration.</item>
/// </list>
/// Units: W/m³, W, m³. The result is flagged when f or B̂ lies outside the range the Steinmetz parameters were fitted
/// over; the value is then an extrapolation and may be badly wrong. One temperature, no DC bias.
/// </summary>
/// <param name="PowerDensityWPerM3">Volumetric loss Pv, W/m³.</param>
/// <param name="PowerW">Total core loss Pv·Ve, W.</param>
/// <param name="Method">The loss law used.</param>
/// <param name="IsOutsideFittedRange">True when f or B̂ lies outside the Steinmetz validity range.</param>
public sealed record CoreLoss(double PowerDensityWPerM3, double PowerW, CoreLossMethod Method, bool IsOutsideFittedRange)
{
    /// <summary>Core loss of a core of effective volume Ve at the flux density an excitation drives (formulas above).</summary>
    /// <param name="steinmetz">The material's Steinmetz parameters.</param>
    /// <param name="flux">The operating point: waveform, frequency and flux density.</param>
    /// <param name="effectiveVolumeM3">Effective volume Ve, m³, above 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">Ve is not finite or not positive.</exception>
    public static CoreLoss Calculate(SteinmetzParameters steinmetz, PeakFluxDensity flux, double effectiveVolumeM3)
    {
        ArgumentNullException.ThrowIfNull(steinmetz);
        ArgumentNullException.ThrowIfNull(flux);
        if (!double.IsFinite(effectiveVolumeM3) || effectiveVolumeM3 <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(effectiveVolumeM3), effectiveVolumeM3, "The effective volume must be a finite number above 0 m³.");
        }

        var (powerDensity, method) = flux.Waveform.Shape == WaveformShape.Sine
            ? (SinePowerDensityWPerM3(steinmetz, flux.AmplitudeT, flux.FrequencyHz), CoreLossMethod.Steinmetz)
            : (ImprovedSteinmetz.TriangularPowerDensityWPerM3(steinmetz, flux.PeakToPeakT, flux.FrequencyHz, flux.Waveform.DutyCycle), CoreLossMethod.ImprovedGeneralisedSteinmetz);
        var outside = !steinmetz.Contains(flux.FrequencyHz, flux.AmplitudeT);
        return new CoreLoss(powerDensity, powerDensity * effectiveVolumeM3, method, outside);
    }

    /// <summary>Steinmetz for sinusoidal flux, Pv = k·f^α·B̂^β, W/m³ (Steinmetz 1892).</summary>
    /// <param name="steinmetz">The material's Steinmetz parameters.</param>
    /// <param name="amplitudeT">Peak flux density B̂, T, at least 0.</param>
    /// <param name="frequencyHz">Frequency, Hz, above 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or outside the ranges above.</exception>
    public static double SinePowerDensityWPerM3(SteinmetzParameters steinmetz, double amplitudeT, double frequencyHz)
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

        return steinmetz.CoefficientK * Math.Pow(frequencyHz, steinmetz.Alpha) * Math.Pow(amplitudeT, steinmetz.Beta);
    }
}
