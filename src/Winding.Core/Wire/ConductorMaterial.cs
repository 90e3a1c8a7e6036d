namespace Winding.Core.Wire;

/// <summary>
/// A conductor metal's resistivity at 20 °C and its temperature coefficient, with ρ(T) = ρ20·[1 + α20·(T − 20 °C)].
/// The linear model is adequate from about −40 °C to +150 °C (common practice, no source).
/// </summary>
/// <param name="Name">Display name.</param>
/// <param name="Resistivity20OhmM">ρ20 in Ω·m.</param>
/// <param name="TemperatureCoefficient20PerK">α20 in 1/K.</param>
public sealed record ConductorMaterial(string Name, double Resistivity20OhmM, double TemperatureCoefficient20PerK)
{
    /// <summary>
    /// Annealed copper per IEC 60028 (International Annealed Copper Standard): ρ20 = 1/58 Ω·mm²/m = 1.7241×10⁻⁸ Ω·m,
    /// α20 = 0.00393 /K.
    /// </summary>
    public static ConductorMaterial Copper { get; } = new("copper", 1e-6 / 58, 0.00393);

    /// <summary>
    /// Aluminium of 61.0 % IACS conductivity: ρ20 = 0.028264 Ω·mm²/m = 2.8264×10⁻⁸ Ω·m (= ρ20 of IACS copper / 0.610)
    /// and α20 = 0.00403 /K, the values IEC 60889:1987 (hard-drawn aluminium wire for overhead line conductors) specifies
    /// for its wire; recalled from memory, not re-read. The same 61 % IACS figure is commonly used for annealed aluminium
    /// winding wire (common practice, no source).
    /// </summary>
    public static ConductorMaterial Aluminium { get; } = new("aluminium", 0.028264e-6, 0.00403);

    /// <summary>Resistivity at a temperature in °C, ρ(T) = ρ20·[1 + α20·(T − 20)], in Ω·m.</summary>
    public double ResistivityOhmM(double temperatureC) =>
        Resistivity20OhmM * (1 + TemperatureCoefficient20PerK * (temperatureC - 20));

    /// <summary>DC resistance R = ρ(T)·ℓ/A of a conductor of length ℓ (m) and cross-section A (m²), in Ω.</summary>
    public double DcResistanceOhm(double lengthM, double conductorAreaM2, double temperatureC = 20) =>
        ResistivityOhmM(temperatureC) * lengthM / conductorAreaM2;
}
