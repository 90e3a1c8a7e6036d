using Winding.Core.Quantities;
using Winding.Core.Wire;

namespace Winding.Core.Conductors;

/// <summary>
/// Skin depth δ = √(ρ / (π·f·μ0·μr)), the depth at which a plane wave's current density in a good conductor falls to
/// 1/e (S. Ramo, J. Whinnery, T. Van Duzer, <i>Fields and Waves in Communication Electronics</i>, from memory; any
/// electromagnetics text). For copper at 20 °C, δ[mm] = 66.0855/√(f[Hz]). Valid for a good conductor (conduction
/// current ≫ displacement current, true for metals far beyond 1 THz) with a linear, isotropic μr.
/// μ0 is <see cref="PhysicalConstants.VacuumPermeabilityHPerM"/>.
/// </summary>
public static class SkinDepth
{
    /// <summary>δ = √(ρ / (π·f·μ0·μr)).</summary>
    /// <param name="resistivityOhmM">ρ in Ω·m, finite and positive.</param>
    /// <param name="frequencyHz">f in Hz, finite and positive.</param>
    /// <param name="relativePermeability">μr of the conductor, finite and positive; 1 for copper and aluminium.</param>
    /// <returns>The skin depth.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is NaN, infinite or not positive.</exception>
    public static Length FromResistivity(double resistivityOhmM, double frequencyHz, double relativePermeability = 1)
    {
        if (!double.IsFinite(resistivityOhmM) || resistivityOhmM <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(resistivityOhmM), resistivityOhmM, "The resistivity must be a finite number above 0 Ω·m.");
        }

        if (!double.IsFinite(frequencyHz) || frequencyHz <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(frequencyHz), frequencyHz, "The frequency must be a finite number above 0 Hz.");
        }

        if (!double.IsFinite(relativePermeability) || relativePermeability <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(relativePermeability), relativePermeability, "μr must be a finite number above 0.");
        }

        var deltaM = Math.Sqrt(resistivityOhmM / (Math.PI * frequencyHz * PhysicalConstants.VacuumPermeabilityHPerM * relativePermeability));
        return Length.FromMetres(deltaM);
    }

    /// <summary>
    /// δ of a non-magnetic metal (μr = 1) at a temperature, with ρ(T) from <see cref="ConductorMaterial.ResistivityOhmM"/>.
    /// </summary>
    /// <param name="metal">The conductor metal.</param>
    /// <param name="frequencyHz">f in Hz, finite and positive.</param>
    /// <param name="temperatureC">Conductor temperature in °C; finite, and giving a positive resistivity (above
    /// −234.5 °C for copper).</param>
    /// <returns>The skin depth.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The frequency or temperature is outside its range.</exception>
    public static Length Of(ConductorMaterial metal, double frequencyHz, double temperatureC = 20) =>
        FromResistivity(Resistivity(metal, temperatureC), frequencyHz);

    /// <summary>ρ(T) of the metal in Ω·m, checked to be finite and positive.</summary>
    internal static double Resistivity(ConductorMaterial metal, double temperatureC)
    {
        ArgumentNullException.ThrowIfNull(metal);
        var rhoOhmM = double.IsFinite(temperatureC) ? metal.ResistivityOhmM(temperatureC) : double.NaN;
        if (!double.IsFinite(rhoOhmM) || rhoOhmM <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(temperatureC), temperatureC, "The temperature must be finite and give the metal a positive resistivity.");
        }

        return rhoOhmM;
    }
}
