namespace Winding.Catalogue.Touchstone;

/// <summary>How each complex value is written in a Touchstone file (option-line token MA, DB or RI).</summary>
public enum TouchstoneDataFormat
{
    /// <summary>MA: magnitude and angle in degrees.</summary>
    MagnitudeAngle,

    /// <summary>DB: magnitude in decibels (20·log10|x|) and angle in degrees.</summary>
    DecibelAngle,

    /// <summary>RI: real and imaginary parts.</summary>
    RealImaginary,
}
