namespace Winding.Core.Materials;

/// <summary>
/// A generic magnetic material class (for example "NiZn, μi 125"): initial permeability, complex permeability against
/// frequency, saturation flux density, Steinmetz loss parameters, resistivity, Curie temperature and AL tolerance.
/// Everything but μi is optional; what is missing is reported where it would be used.
/// </summary>
public sealed record MagneticMaterial
{
    /// <summary>AL tolerance assumed for ungapped ferrite when none is stated: ±25 % (common practice; physics-sources §2.3).</summary>
    public const double DefaultAlTolerance = 0.25;

    private MagneticMaterial(
        string name, double initialPermeability, ComplexPermeabilityCurve permeability, SaturationFluxDensity? saturation,
        SteinmetzParameters? steinmetz, double? resistivityOhmM, double? curieTemperatureC, double alTolerance)
    {
        Name = name;
        InitialPermeability = initialPermeability;
        Permeability = permeability;
        Saturation = saturation;
        Steinmetz = steinmetz;
        ResistivityOhmM = resistivityOhmM;
        CurieTemperatureC = curieTemperatureC;
        AlTolerance = alTolerance;
    }

    /// <summary>Display name of the material class.</summary>
    public string Name { get; }

    /// <summary>Initial relative permeability μi (dimensionless), at low excitation and low frequency.</summary>
    public double InitialPermeability { get; }

    /// <summary>Complex permeability μ′(f), μ″(f); a constant μi with no loss when no table is known.</summary>
    public ComplexPermeabilityCurve Permeability { get; }

    /// <summary>Saturation flux density at 25 °C and 100 °C, if known.</summary>
    public SaturationFluxDensity? Saturation { get; }

    /// <summary>Steinmetz loss parameters with their validity range, if known.</summary>
    public SteinmetzParameters? Steinmetz { get; }

    /// <summary>Bulk resistivity, Ω·m, if known.</summary>
    public double? ResistivityOhmM { get; }

    /// <summary>Curie temperature, °C, if known.</summary>
    public double? CurieTemperatureC { get; }

    /// <summary>AL tolerance as a fraction (0.25 = ±25 %).</summary>
    public double AlTolerance { get; }

    /// <summary>True when μ′ and μ″ are tabulated against frequency.</summary>
    public bool HasPermeabilityTable => !Permeability.IsFrequencyIndependent;

    /// <summary>A material known only by μi: constant permeability, no loss data, ±25 % AL tolerance.</summary>
    /// <exception cref="ArgumentOutOfRangeException">μi is not finite or below 1.</exception>
    public static MagneticMaterial Create(string name, double initialPermeability) =>
        Create(name, initialPermeability, null, null, null, null, null, DefaultAlTolerance);

    /// <summary>A fully described material.</summary>
    /// <param name="name">Display name.</param>
    /// <param name="initialPermeability">μi, finite, at least 1.</param>
    /// <param name="permeability">μ′(f), μ″(f); null for a constant μi.</param>
    /// <param name="saturation">Saturation flux density, or null.</param>
    /// <param name="steinmetz">Steinmetz parameters, or null.</param>
    /// <param name="resistivityOhmM">Resistivity Ω·m (positive), or null.</param>
    /// <param name="curieTemperatureC">Curie temperature °C (above 0), or null.</param>
    /// <param name="alTolerance">AL tolerance fraction, 0 to 0.9.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is out of its range.</exception>
    public static MagneticMaterial Create(
        string name, double initialPermeability, ComplexPermeabilityCurve? permeability, SaturationFluxDensity? saturation,
        SteinmetzParameters? steinmetz, double? resistivityOhmM, double? curieTemperatureC, double alTolerance)
    {
        ArgumentNullException.ThrowIfNull(name);
        if (!double.IsFinite(initialPermeability) || initialPermeability < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(initialPermeability), initialPermeability, "The initial permeability must be a finite number of at least 1.");
        }

        if (resistivityOhmM is { } rho && !(rho > 0 && double.IsFinite(rho)))
        {
            throw new ArgumentOutOfRangeException(nameof(resistivityOhmM), resistivityOhmM, "The resistivity must be finite and positive.");
        }

        if (curieTemperatureC is { } curie && !(curie > 0 && curie < 2000))
        {
            throw new ArgumentOutOfRangeException(nameof(curieTemperatureC), curieTemperatureC, "The Curie temperature must lie between 0 and 2000 °C.");
        }

        if (!(alTolerance >= 0 && alTolerance <= 0.9))
        {
            throw new ArgumentOutOfRangeException(nameof(alTolerance), alTolerance, "The AL tolerance must lie between 0 and 0.9.");
        }

        return new MagneticMaterial(
            name, initialPermeability, permeability ?? ComplexPermeabilityCurve.Constant(initialPermeability),
            saturation, steinmetz, resistivityOhmM, curieTemperatureC, alTolerance);
    }
}
