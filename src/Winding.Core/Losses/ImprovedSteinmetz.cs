using MathNet.Numerics;
using Winding.Core.Materials;

namespace Winding.Core.Losses;

/// <summary>
/// The improved generalised Steinmetz equation (iGSE) for non-sinusoidal flux, using only the sine Steinmetz parameters
/// (K. Venkatachalam, C. R. Sullivan, T. Abdallah, H. Tacca, "Accurate prediction of ferrite core loss with
/// nonsinusoidal waveforms using only Steinmetz parameters", IEEE COMPEL Workshop 2002, pp. 36–41; from memory, the
/// form confirmed in physics-sources.md §8.3 by reproducing the sine Steinmetz value exactly):
/// Pv = (1/T)·∫₀ᵀ k_i·|dB/dt|^α·(ΔB)^(β−α) dt, with k_i = k / [(2π)^(α−1)·∫₀^2π |cos θ|^α·2^(β−α) dθ] and ΔB the
/// peak-to-peak flux density.
/// <para>
/// Units: Pv in W/m³ for f in Hz, B in T and dB/dt in T/s, like the Steinmetz parameters. Valid where the Steinmetz fit
/// is (same frequency and flux range, one temperature, no DC bias); minor loops and relaxation effects are not covered.
/// </para>
/// </summary>
public static class ImprovedSteinmetz
{
    private const double IntegrationRelativeError = 1e-12;

    /// <summary>
    /// k_i = k / [(2π)^(α−1)·∫₀^2π |cos θ|^α·2^(β−α) dθ] (Venkatachalam et al. 2002), in the unit of k. The integral is
    /// evaluated numerically (MathNet double-exponential quadrature over a quarter period, which handles the
    /// non-smooth end of cos^α θ at θ = π/2) and multiplied by 4 by symmetry.
    /// </summary>
    /// <param name="steinmetz">The material's Steinmetz parameters.</param>
    public static double Coefficient(SteinmetzParameters steinmetz)
    {
        ArgumentNullException.ThrowIfNull(steinmetz);
        var alpha = steinmetz.Alpha;
        var quarter = Integrate.DoubleExponential(theta => Math.Pow(Math.Cos(theta), alpha), 0, Math.PI / 2, IntegrationRelativeError);
        var fullPeriodIntegral = 4 * quarter * Math.Pow(2, steinmetz.Beta - alpha);
        return steinmetz.CoefficientK / (Math.Pow(2 * Math.PI, alpha - 1) * fullPeriodIntegral);
    }

    /// <summary>
    /// iGSE for triangular (piecewise-linear) flux that rises by ΔB during a fraction D of the period and falls back
    /// during the rest: Pv = k_i·ΔB^β·f^α·[D^(1−α) + (1 − D)^(1−α)], W/m³ (the iGSE integral evaluated over the two
    /// linear segments; physics-sources.md §8.3). D = 0.5 is the flux of a ±V square wave.
    /// </summary>
    /// <param name="steinmetz">The material's Steinmetz parameters.</param>
    /// <param name="peakToPeakT">Flux swing ΔB, T, at least 0.</param>
    /// <param name="frequencyHz">Frequency, Hz, above 0.</param>
    /// <param name="riseFraction">Fraction D of the period during which the flux rises, in (0, 1).</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or outside the ranges above.</exception>
    public static double TriangularPowerDensityWPerM3(SteinmetzParameters steinmetz, double peakToPeakT, double frequencyHz, double riseFraction)
    {
        ArgumentNullException.ThrowIfNull(steinmetz);
        ValidateSwing(peakToPeakT, frequencyHz);
        if (!double.IsFinite(riseFraction) || riseFraction <= 0 || riseFraction >= 1)
        {
            throw new ArgumentOutOfRangeException(nameof(riseFraction), riseFraction, "The rise fraction must lie in (0, 1).");
        }

        var alpha = steinmetz.Alpha;
        var shape = Math.Pow(riseFraction, 1 - alpha) + Math.Pow(1 - riseFraction, 1 - alpha);
        return Coefficient(steinmetz) * Math.Pow(peakToPeakT, steinmetz.Beta) * Math.Pow(frequencyHz, alpha) * shape;
    }

    /// <summary>
    /// iGSE for any periodic flux given by its rate of change: Pv = (1/T)·∫₀ᵀ k_i·|dB/dt|^α·ΔB^(β−α) dt, W/m³, with the
    /// time integral evaluated numerically over one period (MathNet adaptive Gauss–Kronrod on the normalised time t/T).
    /// Use for smooth waveforms; for piecewise-linear flux the closed form
    /// <see cref="TriangularPowerDensityWPerM3"/> is exact.
    /// </summary>
    /// <param name="steinmetz">The material's Steinmetz parameters.</param>
    /// <param name="fluxDensityRateTPerS">dB/dt as a function of time t in [0, T], in T/s, finite.</param>
    /// <param name="periodS">Period T, s, above 0.</param>
    /// <param name="peakToPeakT">Flux swing ΔB over the period, T, at least 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or outside the ranges above.</exception>
    public static double PowerDensityWPerM3(SteinmetzParameters steinmetz, Func<double, double> fluxDensityRateTPerS, double periodS, double peakToPeakT)
    {
        ArgumentNullException.ThrowIfNull(steinmetz);
        ArgumentNullException.ThrowIfNull(fluxDensityRateTPerS);
        if (!double.IsFinite(periodS) || periodS <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(periodS), periodS, "The period must be a finite number above 0 s.");
        }

        if (!double.IsFinite(peakToPeakT) || peakToPeakT < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(peakToPeakT), peakToPeakT, "The flux swing must be a finite number of at least 0 T.");
        }

        var alpha = steinmetz.Alpha;
        var meanOfRate = Integrate.GaussKronrod(u => Math.Pow(Math.Abs(fluxDensityRateTPerS(u * periodS)), alpha), 0, 1, 1e-10, 20);
        var powerDensity = Coefficient(steinmetz) * Math.Pow(peakToPeakT, steinmetz.Beta - alpha) * meanOfRate;
        if (!double.IsFinite(powerDensity))
        {
            throw new ArgumentOutOfRangeException(nameof(fluxDensityRateTPerS), "dB/dt must be finite over the whole period.");
        }

        return powerDensity;
    }

    private static void ValidateSwing(double peakToPeakT, double frequencyHz)
    {
        if (!double.IsFinite(peakToPeakT) || peakToPeakT < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(peakToPeakT), peakToPeakT, "The flux swing must be a finite number of at least 0 T.");
        }

        if (!double.IsFinite(frequencyHz) || frequencyHz <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(frequencyHz), frequencyHz, "The frequency must be a finite number above 0 Hz.");
        }
    }
}
