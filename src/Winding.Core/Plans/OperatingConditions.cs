namespace Winding.Core.Plans;

/// <summary>The band, the source and load the transformer sits between, and the drive level.</summary>
/// <param name="MinFrequencyHz">Lowest frequency of the band, Hz.</param>
/// <param name="MaxFrequencyHz">Highest frequency of the band, Hz.</param>
/// <param name="SourceResistanceOhm">Source resistance on the primary side, Ω.</param>
/// <param name="LoadResistanceOhm">Load resistance on the secondary side, Ω.</param>
/// <param name="DriveVoltageRms">RMS voltage across the primary, V.</param>
public sealed record OperatingConditions(
    double MinFrequencyHz,
    double MaxFrequencyHz,
    double SourceResistanceOhm,
    double LoadResistanceOhm,
    double DriveVoltageRms);
