namespace Winding.Core.Parasitics;

/// <summary>
/// One flat layer of insulation between two conductors (enamel, tape, film, air), for
/// <see cref="Capacitance.LayeredPlateF"/>.
/// </summary>
/// <param name="ThicknessM">Thickness t in m, finite and at least 0 (a zero-thickness layer contributes nothing).</param>
/// <param name="RelativePermittivity">ε_r, dimensionless, finite and at least 1 (air 1.0, PTFE ≈ 2.1, polyester film
/// ≈ 3.2, polyimide film ≈ 3.4, enamel ≈ 3.5: physics-sources.md §7.1, common practice, no source).</param>
public readonly record struct DielectricLayer(double ThicknessM, double RelativePermittivity);
