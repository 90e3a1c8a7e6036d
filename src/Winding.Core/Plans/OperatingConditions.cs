using Winding.Core.Magnetics;

namespace Winding.Core.Plans;

/// <summary>The band, the source and load the transformer sits between, the drive and the surroundings.</summary>
/// <param name="MinFrequencyHz">Lowest frequency of the band, Hz (the worst case for flux and reactance).</param>
/// <param name="MaxFrequencyHz">Highest frequency of the band, Hz (the worst case for skin and proximity effect).</param>
/// <param name="SourceResistanceOhm">Source resistance on the primary side, Ω.</param>
/// <param name="LoadResistanceOhm">Load resistance on the last winding, Ω.</param>
/// <param name="DriveVoltageRms">RMS voltage across the primary, V.</param>
public sealed record OperatingConditions(
    double MinFrequencyHz,
    double MaxFrequencyHz,
    double SourceResistanceOhm,
    double LoadResistanceOhm,
    double DriveVoltageRms)
{
    /// <summary>Reactance factor k used when none is stated: X ≥ 4·Z (common practice, no source).</summary>
    public const double DefaultReactanceFactor = 4;

    /// <summary>The drive waveform (sine unless stated).</summary>
    public VoltageWaveform Waveform { get; init; } = VoltageWaveform.Sine;

    /// <summary>Ambient temperature, °C (25 unless stated).</summary>
    public double AmbientTemperatureC { get; init; } = 25;

    /// <summary>k in "the primary's reactance at f_min is at least k times the impedance it sees".</summary>
    public double ReactanceFactor { get; init; } = DefaultReactanceFactor;
}
