namespace Winding.Catalogue.Entries;

/// <summary>
/// Steinmetz parameters of a material (JSON: <c>steinmetz</c>): Pv = k·f^α·B̂^β with Pv in W/m³, f in Hz and the peak
/// flux density B̂ in T, and the frequency and flux range the fit is valid for.
/// </summary>
public sealed class SteinmetzDocument
{
    /// <summary>k, W·m⁻³·Hz^−α·T^−β.</summary>
    public double? K { get; set; }

    /// <summary>Frequency exponent α.</summary>
    public double? Alpha { get; set; }

    /// <summary>Flux-density exponent β.</summary>
    public double? Beta { get; set; }

    /// <summary>Lowest frequency of the fit, Hz.</summary>
    public double? MinFrequencyHz { get; set; }

    /// <summary>Highest frequency of the fit, Hz.</summary>
    public double? MaxFrequencyHz { get; set; }

    /// <summary>Lowest peak flux density of the fit, T.</summary>
    public double? MinFluxDensityT { get; set; }

    /// <summary>Highest peak flux density of the fit, T.</summary>
    public double? MaxFluxDensityT { get; set; }
}
