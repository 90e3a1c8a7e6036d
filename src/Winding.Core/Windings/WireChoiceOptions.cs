using Winding.Core.Wire;

namespace Winding.Core.Windings;

/// <summary>
/// The limits <see cref="WireGaugePicker"/> applies when it picks a wire for one winding. All limits are rules of
/// thumb (common practice, no source); see each member.
/// </summary>
public sealed record WireChoiceOptions
{
    /// <summary>Default highest current density: 4 A/mm² = 4×10⁶ A/m² (common practice for small naturally cooled
    /// windings, no source).</summary>
    public const double DefaultMaximumCurrentDensityAPerM2 = 4e6;

    /// <summary>Default highest ratio of conductor (strand) diameter to skin depth, d/δ ≤ 2 (common practice, no
    /// source: a thicker wire's centre carries little current).</summary>
    public const double DefaultMaximumSkinDepthRatio = 2;

    /// <summary>Default length of the list returned.</summary>
    public const int DefaultMaximumChoices = 10;

    private WireChoiceOptions(double? windowShare, double maximumCurrentDensityAPerM2, double maximumSkinDepthRatio, int maximumChoices, IReadOnlyList<StandardWire>? candidates)
    {
        WindowShare = windowShare;
        MaximumCurrentDensityAPerM2 = maximumCurrentDensityAPerM2;
        MaximumSkinDepthRatio = maximumSkinDepthRatio;
        MaximumChoices = maximumChoices;
        Candidates = candidates;
    }

    /// <summary>The defaults: an equal share of the window, 4 A/mm², d/δ ≤ 2, ten choices, every standard wire.</summary>
    public static WireChoiceOptions Default { get; } = new(null, DefaultMaximumCurrentDensityAPerM2, DefaultMaximumSkinDepthRatio, DefaultMaximumChoices, null);

    /// <summary>
    /// The fraction of the core window this winding's copper may take, above 0 and at most 1; null for an equal share
    /// among the plan's windings (1/number of windings). The copper limit is turns × conductor area ≤ share × window
    /// area × 0.4 (<see cref="WindingLayout.HandWindingUtilisation"/>).
    /// </summary>
    public double? WindowShare { get; }

    /// <summary>Highest current density I_rms/A, A/m², finite and above 0.</summary>
    public double MaximumCurrentDensityAPerM2 { get; }

    /// <summary>Highest d/δ of a conductor or strand, finite and above 0.</summary>
    public double MaximumSkinDepthRatio { get; }

    /// <summary>Longest list returned, at least 1.</summary>
    public int MaximumChoices { get; }

    /// <summary>The standard wires to try; null for every wire of <see cref="StandardWireTable.All"/>.</summary>
    public IReadOnlyList<StandardWire>? Candidates { get; }

    /// <summary>Options with the given limits; an argument left out takes its default.</summary>
    /// <param name="windowShare">Fraction of the window, in (0, 1], or null for an equal share.</param>
    /// <param name="maximumCurrentDensityAPerM2">Highest current density, A/m², finite and above 0 (4×10⁶ = 4 A/mm²).</param>
    /// <param name="maximumSkinDepthRatio">Highest d/δ, finite and above 0.</param>
    /// <param name="maximumChoices">Longest list, at least 1.</param>
    /// <param name="candidates">Standard wires to try (no null entries), or null for every standard wire.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value lies outside its range, or is NaN or infinite.</exception>
    /// <exception cref="ArgumentException">The candidate list holds a null entry.</exception>
    public static WireChoiceOptions Create(
        double? windowShare = null,
        double maximumCurrentDensityAPerM2 = DefaultMaximumCurrentDensityAPerM2,
        double maximumSkinDepthRatio = DefaultMaximumSkinDepthRatio,
        int maximumChoices = DefaultMaximumChoices,
        IReadOnlyList<StandardWire>? candidates = null)
    {
        if (windowShare is { } share && !(share > 0 && share <= 1))
        {
            throw new ArgumentOutOfRangeException(nameof(windowShare), windowShare, "The window share must lie above 0 and at most 1.");
        }

        if (!double.IsFinite(maximumCurrentDensityAPerM2) || maximumCurrentDensityAPerM2 <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(maximumCurrentDensityAPerM2), maximumCurrentDensityAPerM2, "The current density limit must be a finite number above 0 A/m².");
        }

        if (!double.IsFinite(maximumSkinDepthRatio) || maximumSkinDepthRatio <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(maximumSkinDepthRatio), maximumSkinDepthRatio, "The skin-depth ratio limit must be a finite number above 0.");
        }

        ArgumentOutOfRangeException.ThrowIfLessThan(maximumChoices, 1);
        if (candidates is not null && candidates.Any(c => c is null))
        {
            throw new ArgumentException("The candidate list must not hold null entries.", nameof(candidates));
        }

        return new WireChoiceOptions(windowShare, maximumCurrentDensityAPerM2, maximumSkinDepthRatio, maximumChoices, candidates is null ? null : Array.AsReadOnly(candidates.ToArray()));
    }
}
