using Winding.Core.Windings;

namespace Winding.Core.Plans;

/// <summary>A complete plan: the core, the windings in winding order, and optionally the operating conditions.</summary>
/// <param name="Name">Optional display name.</param>
/// <param name="Core">The core.</param>
/// <param name="Windings">The windings in winding order (the first is the primary), at least one.</param>
/// <param name="Operating">Band, source, load and drive, when known.</param>
/// <param name="Allowance">Lead allowance used for the length to cut.</param>
public sealed record TransformerPlan(
    string? Name,
    PlanCore Core,
    IReadOnlyList<WindingSpec> Windings,
    OperatingConditions? Operating,
    WireLengthAllowance Allowance)
{
    /// <summary>The response sweep (used with operating conditions).</summary>
    public SweepSettings Sweep { get; init; } = SweepSettings.Default;

    /// <summary>
    /// When true the core is modelled with μ = μi and no μ″, its loss as a fixed shunt resistance, and the winding
    /// resistances at the band's geometric centre, so the equivalent circuit is a plain linear RLC circuit (the form the
    /// SPICE export writes).
    /// </summary>
    public bool FrequencyIndependentCore { get; init; }

    /// <summary>Measured values that replace the estimates.</summary>
    public MeasuredValues Measured { get; init; } = MeasuredValues.None;
}
