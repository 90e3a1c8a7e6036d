using Winding.Core.Geometry;

namespace Winding.Core.Windings;

/// <summary>The inductance factor AL of a core in H per turn², so that L = AL·N².</summary>
public readonly record struct InductanceFactor
{
    private InductanceFactor(double henriesPerTurnSquared) => HenriesPerTurnSquared = henriesPerTurnSquared;

    /// <summary>AL in H/turn² (SI).</summary>
    public double HenriesPerTurnSquared { get; }

    /// <summary>AL in nH/turn², the unit datasheets use.</summary>
    public double NanohenriesPerTurnSquared => HenriesPerTurnSquared * 1e9;

    /// <summary>Creates an AL value from H/turn². Must be finite and positive.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not finite or not positive.</exception>
    public static InductanceFactor FromHenriesPerTurnSquared(double value)
    {
        if (!double.IsFinite(value) || value <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(value), value, "AL must be a finite positive number.");
        }

        return new InductanceFactor(value);
    }

    /// <summary>
    /// AL = μ0·μr·Ae/le = μ0·μr/C1 (IEC 60050-221 / IEC 60205 definitions; Snelling, Soft Ferrites, 2nd ed. 1988, ch. 2).
    /// μr is the relative permeability that applies: μi for an ungapped core at low excitation.
    /// </summary>
    /// <param name="relativePermeability">μr, dimensionless, at least 1.</param>
    /// <param name="core">The core's effective parameters.</param>
    public static InductanceFactor FromPermeability(double relativePermeability, EffectiveParameters core)
    {
        ArgumentNullException.ThrowIfNull(core);
        if (!double.IsFinite(relativePermeability) || relativePermeability < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(relativePermeability), relativePermeability, "μr must be a finite number of at least 1.");
        }

        return new InductanceFactor(PhysicalConstants.VacuumPermeabilityHPerM * relativePermeability / core.CoreFactorC1PerM);
    }

    /// <summary>Inductance of a winding of <paramref name="turns"/> turns, L = AL·N², in H.</summary>
    public double InductanceH(int turns)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(turns);
        return HenriesPerTurnSquared * turns * (double)turns;
    }
}
