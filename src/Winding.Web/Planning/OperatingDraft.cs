namespace Winding.Web.Planning;

/// <summary>The operating conditions as the user typed them.</summary>
public sealed class OperatingDraft
{
    /// <summary>Whether operating conditions are part of the plan.</summary>
    public bool Enabled { get; set; } = true;

    /// <summary>Lowest frequency as typed (Hz, SI prefixes allowed).</summary>
    public string MinFrequency { get; set; } = "1.8 MHz";

    /// <summary>Highest frequency as typed.</summary>
    public string MaxFrequency { get; set; } = "30 MHz";

    /// <summary>Source resistance as typed (Ω).</summary>
    public string SourceResistance { get; set; } = "50";

    /// <summary>Load resistance as typed (Ω).</summary>
    public string LoadResistance { get; set; } = "50";

    /// <summary>RMS drive voltage as typed (V).</summary>
    public string DriveVoltage { get; set; } = "1";

    /// <summary><c>sine</c>, <c>square</c> or <c>pulse</c>.</summary>
    public string Waveform { get; set; } = "sine";

    /// <summary>Duty cycle of a pulse as typed (0 … 1).</summary>
    public string DutyCycle { get; set; } = "0.5";

    /// <summary>Ambient temperature as typed (°C).</summary>
    public string AmbientTemperature { get; set; } = "25";
}
