namespace Winding.Core.Materials;

/// <summary>
/// One row of a complex-permeability table: the series complex relative permeability μs = μs′ − jμs″ at one frequency
/// (IEC 60401-3 notation; Snelling, Soft Ferrites, 2nd ed. 1988). μs′ sets the inductance, μs″ the core loss.
/// Validated when a <see cref="ComplexPermeabilityCurve"/> is built from it.
/// </summary>
/// <param name="FrequencyHz">Frequency in Hz, finite and positive.</param>
/// <param name="MuPrime">Real part μs′ (dimensionless), finite and positive.</param>
/// <param name="MuDoublePrime">Loss part μs″ (dimensionless, the magnitude of the imaginary part), finite and ≥ 0.</param>
public readonly record struct ComplexPermeabilityPoint(double FrequencyHz, double MuPrime, double MuDoublePrime);
