namespace Winding.Core.Materials;

/// <summary>
/// Steinmetz core-loss parameters of a material, Pv = k·f^α·B̂^β for sinusoidal flux (C. P. Steinmetz, "On the law of
/// hysteresis", Trans. AIEE 9, 1892; the power-law frequency term as used by Venkatachalam et al., IEEE COMPEL 2002),
/// with the frequency and flux range the fit was made over.
/// <para>
/// Units: Pv in W/m³ when f is in Hz and B̂ (peak flux density) in T; k therefore carries the unit
/// W·m⁻³·Hz^−α·T^−β. The parameters are fitted to sine data over a limited frequency and flux range and at one
/// temperature; they must not be extrapolated. DC bias and relaxation effects are not covered.
/// </para>
/// </summary>
public sealed record SteinmetzParameters
{
    private SteinmetzParameters(double coefficientK, double alpha, double beta, double minFrequencyHz, double maxFrequencyHz, double minPeakFluxDensityT, double maxPeakFluxDensityT)
    {
        CoefficientK = coefficientK;
        Alpha = alpha;
        Beta = beta;
        MinFrequencyHz = minFrequencyHz;
        MaxFrequencyHz = maxFrequencyHz;
        MinPeakFluxDensityT = minPeakFluxDensityT;
        MaxPeakFluxDensityT = maxPeakFluxDensityT;
    }

    /// <summary>k in W·m⁻³·Hz^−α·T^−β (gives Pv in W/m³ for f in Hz and B̂ in T).</summary>
    public double CoefficientK { get; }

    /// <summary>Frequency exponent α (dimensionless).</summary>
    public double Alpha { get; }

    /// <summary>Flux-density exponent β (dimensionless).</summary>
    public double Beta { get; }

    /// <summary>Lowest frequency of the fit, Hz.</summary>
    public double MinFrequencyHz { get; }

    /// <summary>Highest frequency of the fit, Hz.</summary>
    public double MaxFrequencyHz { get; }

    /// <summary>Lowest peak flux density B̂ of the fit, T.</summary>
    public double MinPeakFluxDensityT { get; }

    /// <summary>Highest peak flux density B̂ of the fit, T.</summary>
    public double MaxPeakFluxDensityT { get; }

    /// <summary>
    /// Creates a parameter set. Requires finite values with k &gt; 0, 0 &lt; α ≤ 4, 0 &lt; β ≤ 5 (fitted ferrite values lie
    /// near α ≈ 1…2 and β ≈ 2…3, common practice), 0 &lt; fMin &lt; fMax and 0 ≤ B̂min &lt; B̂max.
    /// </summary>
    /// <param name="coefficientK">k in W·m⁻³·Hz^−α·T^−β.</param>
    /// <param name="alpha">α, in (0, 4].</param>
    /// <param name="beta">β, in (0, 5].</param>
    /// <param name="minFrequencyHz">Lowest fitted frequency, Hz, above 0.</param>
    /// <param name="maxFrequencyHz">Highest fitted frequency, Hz, above <paramref name="minFrequencyHz"/>.</param>
    /// <param name="minPeakFluxDensityT">Lowest fitted B̂, T, at least 0.</param>
    /// <param name="maxPeakFluxDensityT">Highest fitted B̂, T, above <paramref name="minPeakFluxDensityT"/>.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is outside the ranges above.</exception>
    public static SteinmetzParameters Create(double coefficientK, double alpha, double beta, double minFrequencyHz, double maxFrequencyHz, double minPeakFluxDensityT, double maxPeakFluxDensityT)
    {
        if (!double.IsFinite(coefficientK) || coefficientK <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(coefficientK), coefficientK, "k must be a finite number above 0.");
        }

        if (!double.IsFinite(alpha) || alpha <= 0 || alpha > 4)
        {
            throw new ArgumentOutOfRangeException(nameof(alpha), alpha, "α must lie in (0, 4].");
        }

        if (!double.IsFinite(beta) || beta <= 0 || beta > 5)
        {
            throw new ArgumentOutOfRangeException(nameof(beta), beta, "β must lie in (0, 5].");
        }

        if (!double.IsFinite(minFrequencyHz) || minFrequencyHz <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(minFrequencyHz), minFrequencyHz, "The lowest frequency must be a finite number above 0 Hz.");
        }

        if (!double.IsFinite(maxFrequencyHz) || maxFrequencyHz <= minFrequencyHz)
        {
            throw new ArgumentOutOfRangeException(nameof(maxFrequencyHz), maxFrequencyHz, "The highest frequency must be finite and above the lowest frequency.");
        }

        if (!double.IsFinite(minPeakFluxDensityT) || minPeakFluxDensityT < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(minPeakFluxDensityT), minPeakFluxDensityT, "The lowest peak flux density must be a finite number of at least 0 T.");
        }

        if (!double.IsFinite(maxPeakFluxDensityT) || maxPeakFluxDensityT <= minPeakFluxDensityT)
        {
            throw new ArgumentOutOfRangeException(nameof(maxPeakFluxDensityT), maxPeakFluxDensityT, "The highest peak flux density must be finite and above the lowest.");
        }

        return new SteinmetzParameters(coefficientK, alpha, beta, minFrequencyHz, maxFrequencyHz, minPeakFluxDensityT, maxPeakFluxDensityT);
    }

    /// <summary>
    /// True when fMin ≤ f ≤ fMax and B̂min ≤ B̂ ≤ B̂max, i.e. the operating point lies inside the range the parameters were
    /// fitted over (ends included).
    /// </summary>
    /// <param name="frequencyHz">Frequency, Hz.</param>
    /// <param name="peakFluxDensityT">Peak flux density B̂ (half the peak-to-peak swing), T.</param>
    public bool Contains(double frequencyHz, double peakFluxDensityT) =>
        frequencyHz >= MinFrequencyHz && frequencyHz <= MaxFrequencyHz
        && peakFluxDensityT >= MinPeakFluxDensityT && peakFluxDensityT <= MaxPeakFluxDensityT;
}
