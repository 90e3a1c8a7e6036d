using Winding.Core.Quantities;

namespace Winding.Core.Windings;

/// <summary>
/// An insulation wrap laid under a winding: its thickness (added to the build) and relative permittivity (for the
/// interwinding capacitance). Typical εr (common practice, no source; physics-sources §7.1): kraft paper ≈ 2.3 dry,
/// polyester (PET) film ≈ 3.2, PTFE ≈ 2.1, polyimide ≈ 3.4.
/// </summary>
public sealed record InsulationWrap
{
    private InsulationWrap(string name, Length thickness, double relativePermittivity)
    {
        Name = name;
        Thickness = thickness;
        RelativePermittivity = relativePermittivity;
    }

    /// <summary>Display name, e.g. "paper".</summary>
    public string Name { get; }

    /// <summary>Total thickness of the wrap (all its layers), added to the radial build.</summary>
    public Length Thickness { get; }

    /// <summary>Relative permittivity εr.</summary>
    public double RelativePermittivity { get; }

    /// <summary>Creates a wrap. Thickness ≥ 0; εr ≥ 1.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Out of range.</exception>
    public static InsulationWrap Create(string name, Length thickness, double relativePermittivity)
    {
        ArgumentNullException.ThrowIfNull(name);
        if (thickness.Metres < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(thickness), thickness, "The thickness cannot be negative.");
        }

        if (!double.IsFinite(relativePermittivity) || relativePermittivity < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(relativePermittivity), relativePermittivity, "εr must be finite and at least 1.");
        }

        return new InsulationWrap(name, thickness, relativePermittivity);
    }

    /// <summary>The named materials and their typical εr (common practice, no source).</summary>
    public static IReadOnlyDictionary<string, double> TypicalPermittivity { get; } = new Dictionary<string, double>(StringComparer.Ordinal)
    {
        ["paper"] = 2.3,
        ["polyester"] = 3.2,
        ["ptfe"] = 2.1,
        ["polyimide"] = 3.4,
    };
}
