using Winding.Core.Losses;

namespace Winding.Core.Plans;

/// <summary>
/// The plan at its worst case: flux at the bottom of the band, the margin to saturation at the hot temperature, core and
/// copper loss, and the temperature rise they cause.
/// </summary>
/// <param name="FluxFrequencyHz">Frequency of the flux figures (f_min, the worst case for flux), Hz.</param>
/// <param name="PeakFluxDensityT">B̂ in the core (effective value), T.</param>
/// <param name="SaturationFluxDensityT">B_sat of the material at the hot temperature, T (null when not known).</param>
/// <param name="SaturationMargin">1 − B̂/B_sat (null when B_sat is not known).</param>
/// <param name="CoreLossW">Core loss, W (null when the material has no loss data).</param>
/// <param name="CoreLossMethod">How the core loss was found, in plain words.</param>
/// <param name="CoreLossOutsideFittedRange">True when Steinmetz parameters were used outside their fitted range.</param>
/// <param name="CopperLossW">Copper loss at f_max (AC resistance), W.</param>
/// <param name="CopperLossDcW">Copper loss with DC resistance, W.</param>
/// <param name="SurfaceAreaM2">Surface the heat leaves from, m².</param>
/// <param name="TemperatureRiseK">Temperature rise over ambient, K.</param>
/// <param name="HotTemperatureC">Ambient plus rise, °C.</param>
public sealed record OperatingPoint(
    double FluxFrequencyHz,
    double PeakFluxDensityT,
    double? SaturationFluxDensityT,
    double? SaturationMargin,
    double? CoreLossW,
    string CoreLossMethod,
    bool CoreLossOutsideFittedRange,
    double CopperLossW,
    double CopperLossDcW,
    double SurfaceAreaM2,
    double TemperatureRiseK,
    double HotTemperatureC)
{
    /// <summary>Core and copper loss, W.</summary>
    public double TotalLossW => (CoreLossW ?? 0) + CopperLossW;
}
