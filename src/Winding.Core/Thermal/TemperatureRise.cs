namespace Winding.Core.Thermal;

/// <summary>
/// Temperature rise of a wound core above still ambient air from its total loss and its surface area
/// (physics-sources.md §10). The primary estimate is McLyman's surface-dissipation relation ΔT = 450·ψ^0.826,
/// ψ = P/A in W/cm² (C. W. T. McLyman, Transformer and Inductor Design Handbook, 3rd ed. 2004, ch. 6; from memory).
/// It is chosen because it is the more cautious of the two published relations (it predicts about 1.45 times the rise
/// of the ferrite-core rule at the same ψ) and because the first-principles estimate P/(h·A) with h ≈ 12 W/(m²·K)
/// lies close to it, which makes up for its coefficients having been recalled rather than re-read. The ferrite-core
/// rule ΔT = (P[mW]/A[cm²])^0.833 (reported by S. Zurek, "Thermal resistance of ferrite cores", Encyclopedia
/// Magnetica) and the convection estimate are carried alongside for comparison.
/// <para>
/// Validity: a free-standing part in still air with a uniform surface temperature, rises of a few to about 100 K. All
/// three are empirical and accurate to ±30 % or worse; show the method with the number.
/// </para>
/// </summary>
/// <param name="PowerW">Total dissipated power P (core plus winding loss), W.</param>
/// <param name="SurfaceAreaM2">Surface area A, m².</param>
/// <param name="RiseK">Primary estimate, McLyman's relation, K.</param>
/// <param name="FerriteCoreRuleRiseK">Alternative: the ferrite-core rule, K.</param>
/// <param name="ConvectionRiseK">Alternative: P/(h·A) with h = 12 W/(m²·K), K.</param>
public sealed record TemperatureRise(double PowerW, double SurfaceAreaM2, double RiseK, double FerriteCoreRuleRiseK, double ConvectionRiseK)
{
    /// <summary>Combined convection and radiation coefficient of still air, 12 W/(m²·K) (common practice, no source; usual range 10…15).</summary>
    public const double StillAirHeatTransferCoefficientWPerM2K = 12;

    /// <summary>The method behind <see cref="RiseK"/>.</summary>
    public static TemperatureRiseMethod PrimaryMethod => TemperatureRiseMethod.SurfaceDissipation;

    /// <summary>Surface dissipation ψ = P/A, W/m².</summary>
    public double SurfaceDissipationWPerM2 => PowerW / SurfaceAreaM2;

    /// <summary>All three estimates for a dissipated power and a given surface area.</summary>
    /// <param name="powerW">Total dissipated power, W, at least 0.</param>
    /// <param name="surfaceAreaM2">Surface area, m², above 0 (for a wound toroid see <see cref="WoundToroidSurfaceArea"/>).</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or outside the ranges above.</exception>
    public static TemperatureRise Estimate(double powerW, double surfaceAreaM2) =>
        new(
            powerW,
            surfaceAreaM2,
            RiseKBy(TemperatureRiseMethod.SurfaceDissipation, powerW, surfaceAreaM2),
            RiseKBy(TemperatureRiseMethod.FerriteCoreRule, powerW, surfaceAreaM2),
            RiseKBy(TemperatureRiseMethod.ConvectionCoefficient, powerW, surfaceAreaM2));

    /// <summary>
    /// Temperature rise by one method, K: 450·(P/A[cm²])^0.826, (1000·P/A[cm²])^0.833 or P/(12·A) (see
    /// <see cref="TemperatureRiseMethod"/>).
    /// </summary>
    /// <param name="method">The relation to use.</param>
    /// <param name="powerW">Total dissipated power, W, at least 0.</param>
    /// <param name="surfaceAreaM2">Surface area, m², above 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or outside the ranges above.</exception>
    public static double RiseKBy(TemperatureRiseMethod method, double powerW, double surfaceAreaM2)
    {
        if (!double.IsFinite(powerW) || powerW < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(powerW), powerW, "The power must be a finite number of at least 0 W.");
        }

        ValidateArea(surfaceAreaM2);
        var areaCm2 = surfaceAreaM2 * 1e4;
        return method switch
        {
            TemperatureRiseMethod.SurfaceDissipation => 450 * Math.Pow(powerW / areaCm2, 0.826),
            TemperatureRiseMethod.FerriteCoreRule => Math.Pow(powerW * 1e3 / areaCm2, 0.833),
            TemperatureRiseMethod.ConvectionCoefficient => powerW / (StillAirHeatTransferCoefficientWPerM2K * surfaceAreaM2),
            _ => throw new ArgumentOutOfRangeException(nameof(method), method, "Unknown temperature-rise method."),
        };
    }

    /// <summary>
    /// The power a surface may dissipate for a given rise, W: each relation of <see cref="RiseKBy"/> solved for P
    /// (ψ = (ΔT/450)^(1/0.826) W/cm², P = A[cm²]·ΔT^(1/0.833) mW, or P = h·A·ΔT).
    /// </summary>
    /// <param name="method">The relation to use.</param>
    /// <param name="riseK">Allowed temperature rise, K, at least 0.</param>
    /// <param name="surfaceAreaM2">Surface area, m², above 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or outside the ranges above.</exception>
    public static double AllowedPowerW(TemperatureRiseMethod method, double riseK, double surfaceAreaM2)
    {
        if (!double.IsFinite(riseK) || riseK < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(riseK), riseK, "The temperature rise must be a finite number of at least 0 K.");
        }

        ValidateArea(surfaceAreaM2);
        var areaCm2 = surfaceAreaM2 * 1e4;
        return method switch
        {
            TemperatureRiseMethod.SurfaceDissipation => areaCm2 * Math.Pow(riseK / 450, 1 / 0.826),
            TemperatureRiseMethod.FerriteCoreRule => areaCm2 * Math.Pow(riseK, 1 / 0.833) / 1e3,
            TemperatureRiseMethod.ConvectionCoefficient => StillAirHeatTransferCoefficientWPerM2K * surfaceAreaM2 * riseK,
            _ => throw new ArgumentOutOfRangeException(nameof(method), method, "Unknown temperature-rise method."),
        };
    }

    private static void ValidateArea(double surfaceAreaM2)
    {
        if (!double.IsFinite(surfaceAreaM2) || surfaceAreaM2 <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(surfaceAreaM2), surfaceAreaM2, "The surface area must be a finite number above 0 m².");
        }
    }
}
