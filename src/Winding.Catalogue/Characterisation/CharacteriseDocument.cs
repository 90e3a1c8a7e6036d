using Winding.Catalogue.Entries;

namespace Winding.Catalogue.Characterisation;

/// <summary>
/// A salvaged core's measurement (request of <c>POST /api/v1/characterise</c>): the core's dimensions (a catalogue id or
/// an inline shape in mm) and a test winding of <c>turns</c> measured at <c>frequencyHz</c> — an inductance (with an
/// optional series resistance or Q), and/or several (frequency, impedance) points.
/// </summary>
public sealed class CharacteriseDocument
{
    /// <summary>The core: shape, dimensions in mm (and effective parameters for bobbins), or a catalogue id.</summary>
    public CharacteriseCoreDocument? Core { get; set; }

    /// <summary>Turns of the test winding.</summary>
    public int? Turns { get; set; }

    /// <summary>Measurement frequency of the inductance, Hz.</summary>
    public double? FrequencyHz { get; set; }

    /// <summary>Measured series inductance, H.</summary>
    public double? InductanceH { get; set; }

    /// <summary>Measured series resistance at that frequency, Ω (optional).</summary>
    public double? SeriesResistanceOhm { get; set; }

    /// <summary>Measured quality factor at that frequency (optional, instead of the series resistance).</summary>
    public double? QualityFactor { get; set; }

    /// <summary>The test winding's own resistance, subtracted before μ″ is worked out, Ω (default 0).</summary>
    public double? WindingResistanceOhm { get; set; }

    /// <summary>Measured series impedances of the test winding at several frequencies.</summary>
    public List<ImpedancePointDocument?>? Impedances { get; set; }
}

/// <summary>The core of a characterisation request.</summary>
public sealed class CharacteriseCoreDocument
{
    /// <summary>A catalogue core whose dimensions to use.</summary>
    public string? CatalogueId { get; set; }

    /// <summary>Shape word.</summary>
    public string? Shape { get; set; }

    /// <summary>Bobbin family.</summary>
    public string? Family { get; set; }

    /// <summary>Dimensions in mm.</summary>
    public DimensionsMmDocument? DimensionsMm { get; set; }

    /// <summary>Entered effective parameters.</summary>
    public EffectiveParametersDocument? Effective { get; set; }
}

/// <summary>One measured impedance.</summary>
public sealed class ImpedancePointDocument
{
    /// <summary>Frequency, Hz.</summary>
    public double? FrequencyHz { get; set; }

    /// <summary>Real part (series resistance), Ω.</summary>
    public double? Re { get; set; }

    /// <summary>Imaginary part (series reactance), Ω.</summary>
    public double? Im { get; set; }
}
