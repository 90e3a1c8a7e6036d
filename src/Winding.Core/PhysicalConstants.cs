namespace Winding.Core;

/// <summary>Physical constants used by the engine, each with its source and edition.</summary>
public static class PhysicalConstants
{
    /// <summary>
    /// Vacuum magnetic permeability μ0 in H/m, CODATA 2018 recommended value 1.25663706212×10⁻⁶ H/m.
    /// (MathNet's <c>Constants.MagneticPermeability</c> carries the pre-2019 exact 4π×10⁻⁷; the two differ by 5.5×10⁻¹⁰
    /// relative, far below any tolerance in this domain.)
    /// </summary>
    public const double VacuumPermeabilityHPerM = 1.25663706212e-6;

    /// <summary>Vacuum electric permittivity ε0 in F/m, CODATA 2018 recommended value 8.8541878128×10⁻¹² F/m.</summary>
    public const double VacuumPermittivityFPerM = 8.8541878128e-12;
}
