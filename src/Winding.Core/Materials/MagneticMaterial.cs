namespace Winding.Core.Materials;

/// <summary>
/// A generic magnetic material class (for example "NiZn, μi 125"), described by its initial relative permeability μi.
/// </summary>
public sealed record MagneticMaterial
{
    private MagneticMaterial(string name, double initialPermeability)
    {
        Name = name;
        InitialPermeability = initialPermeability;
    }

    /// <summary>Display name of the material class.</summary>
    public string Name { get; }

    /// <summary>Initial relative permeability μi (dimensionless), at low excitation and low frequency.</summary>
    public double InitialPermeability { get; }

    /// <summary>Creates a material. μi must be finite and at least 1.</summary>
    /// <exception cref="ArgumentOutOfRangeException">μi is not finite or below 1.</exception>
    public static MagneticMaterial Create(string name, double initialPermeability)
    {
        ArgumentNullException.ThrowIfNull(name);
        if (!double.IsFinite(initialPermeability) || initialPermeability < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(initialPermeability), initialPermeability, "The initial permeability must be a finite number of at least 1.");
        }

        return new MagneticMaterial(name, initialPermeability);
    }
}
