namespace Winding.Catalogue.Entries;

/// <summary>One row of a material's complex-permeability table (JSON: an item of <c>permeability</c>).</summary>
public sealed class PermeabilityPointDocument
{
    /// <summary>Frequency, Hz.</summary>
    public double? FrequencyHz { get; set; }

    /// <summary>Real part μs′ of the series complex permeability (dimensionless).</summary>
    public double? Real { get; set; }

    /// <summary>Loss part μs″ of the series complex permeability (dimensionless, the magnitude of the imaginary part).</summary>
    public double? Imaginary { get; set; }
}
