namespace Winding.Catalogue.Entries;

/// <summary>Saturation flux density of a material (JSON: <c>saturationFluxDensityT</c>), tesla.</summary>
public sealed class SaturationFluxDensityDocument
{
    /// <summary>B_sat at 25 °C, T.</summary>
    public double? At25C { get; set; }

    /// <summary>B_sat at 100 °C, T.</summary>
    public double? At100C { get; set; }
}
