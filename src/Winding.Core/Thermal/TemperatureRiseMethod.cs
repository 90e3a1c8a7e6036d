namespace Winding.Core.Thermal;

/// <summary>An empirical relation between dissipated power, surface area and temperature rise in still air.</summary>
public enum TemperatureRiseMethod
{
    /// <summary>
    /// ΔT = 450·ψ^0.826 with ψ = P/A in W/cm² (C. W. T. McLyman, Transformer and Inductor Design Handbook, 3rd ed.
    /// 2004, ch. 6; from memory).
    /// </summary>
    SurfaceDissipation,

    /// <summary>
    /// ΔT = (P[mW]/A[cm²])^0.833, a ferrite-core rule from vendor literature as reported by S. Zurek, "Thermal
    /// resistance of ferrite cores", Encyclopedia Magnetica.
    /// </summary>
    FerriteCoreRule,

    /// <summary>
    /// ΔT = P/(h·A) with a combined convection and radiation coefficient h = 12 W/(m²·K) for still air (heat-transfer
    /// basics; the value of h is common practice, no source).
    /// </summary>
    ConvectionCoefficient,
}
