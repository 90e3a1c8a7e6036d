using Winding.Core.Windings;

namespace Winding.Core.Characterisation;

/// <summary>
/// What one reading of a test winding says about an unknown core: its AL, its effective permeability μe, and — when the
/// reading carried a resistance, a Q or a complex impedance — the series complex permeability at the test frequency.
/// Formulas in <see cref="CoreCharacterisation"/>.
/// </summary>
/// <param name="Al">Inductance factor AL = L/N².</param>
/// <param name="EffectivePermeability">μe = AL·C1/μ0 (dimensionless; μi for an ungapped ring at low excitation).</param>
/// <param name="Permeability">μs′, μs″ at the test frequency; null when only the inductance was read.</param>
public sealed record CharacterisedCore(InductanceFactor Al, double EffectivePermeability, MeasuredPermeability? Permeability);
