namespace Winding.Catalogue.Touchstone;

/// <summary>The frequency unit of a Touchstone file's data lines (option-line token Hz, kHz, MHz or GHz).</summary>
public enum TouchstoneFrequencyUnit
{
    /// <summary>Hz.</summary>
    Hz,

    /// <summary>kHz (10³ Hz).</summary>
    KHz,

    /// <summary>MHz (10⁶ Hz).</summary>
    MHz,

    /// <summary>GHz (10⁹ Hz).</summary>
    GHz,
}
