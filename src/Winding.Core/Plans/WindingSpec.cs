using Winding.Core.Windings;
using Winding.Core.Wire;

namespace Winding.Core.Plans;

/// <summary>One winding of a plan, in winding order: name, turns, wire, placement, the wrap under it and its taps.</summary>
public sealed record WindingSpec
{
    private WindingSpec(string name, int turns, WindingWire wire, WindingPlacement placement, InsulationWrap? wrap, IReadOnlyList<int> taps, double? rmsCurrentA, double? targetInductanceH)
    {
        RmsCurrentA = rmsCurrentA;
        TargetInductanceH = targetInductanceH;
        Name = name;
        Turns = turns;
        Wire = wire;
        Placement = placement;
        Wrap = wrap;
        Taps = taps;
    }

    /// <summary>Display name, e.g. "primary".</summary>
    public string Name { get; }

    /// <summary>Number of turns, at least 1.</summary>
    public int Turns { get; }

    /// <summary>The wire.</summary>
    public WindingWire Wire { get; }

    /// <summary>Where the winding lies.</summary>
    public WindingPlacement Placement { get; }

    /// <summary>Insulation wrapped under this winding, if any.</summary>
    public InsulationWrap? Wrap { get; }

    /// <summary>Turn counts (from the start) where taps are brought out, ascending, each between 1 and turns − 1.</summary>
    public IReadOnlyList<int> Taps { get; }

    /// <summary>RMS current stated for this winding, A; null to derive it from the drive and the load.</summary>
    public double? RmsCurrentA { get; }

    /// <summary>An inductance this winding should reach, H, for the turns solver; null when none is asked for.</summary>
    public double? TargetInductanceH { get; }

    /// <summary>Creates a winding.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Fewer than one turn, a tap outside 1 … turns − 1, or a negative current.</exception>
    public static WindingSpec Create(string name, int turns, WindingWire wire, WindingPlacement? placement = null, InsulationWrap? wrap = null, IReadOnlyList<int>? taps = null, double? rmsCurrentA = null, double? targetInductanceH = null)
    {
        ArgumentNullException.ThrowIfNull(name);
        ArgumentNullException.ThrowIfNull(wire);
        ArgumentOutOfRangeException.ThrowIfLessThan(turns, 1);
        var sortedTaps = (taps ?? []).Order().ToArray();
        if (sortedTaps.Any(t => t < 1 || t >= turns) || sortedTaps.Distinct().Count() != sortedTaps.Length)
        {
            throw new ArgumentOutOfRangeException(nameof(taps), "Taps must be distinct turn counts from 1 to turns − 1.");
        }

        if (rmsCurrentA is { } current && !(current >= 0 && double.IsFinite(current)))
        {
            throw new ArgumentOutOfRangeException(nameof(rmsCurrentA), rmsCurrentA, "The RMS current must be finite and at least 0.");
        }

        if (targetInductanceH is { } target && !(target > 0 && double.IsFinite(target)))
        {
            throw new ArgumentOutOfRangeException(nameof(targetInductanceH), targetInductanceH, "The target inductance must be finite and positive.");
        }

        return new WindingSpec(name, turns, wire, placement ?? WindingPlacement.Spread, wrap, sortedTaps, rmsCurrentA, targetInductanceH);
    }
}
