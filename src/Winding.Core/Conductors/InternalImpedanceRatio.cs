namespace Winding.Core.Conductors;

/// <summary>
/// The internal impedance of an isolated straight round wire relative to its DC resistance, Z_int/Rdc =
/// Rac/Rdc + j·X_int/Rdc, at one value of x = r·√2/δ.
/// </summary>
/// <param name="X">The argument x = r·√2/δ (r the wire radius, δ the skin depth), dimensionless.</param>
/// <param name="ResistanceRatio">Rac/Rdc, at least 1.</param>
/// <param name="InternalReactanceRatio">X_int/Rdc = ω·L_int/Rdc, at least 0.</param>
/// <param name="Method">The branch that produced the values.</param>
public readonly record struct InternalImpedanceRatio(double X, double ResistanceRatio, double InternalReactanceRatio, SkinEffectMethod Method);
