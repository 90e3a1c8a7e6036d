using Winding.Core.Quantities;

namespace Winding.Core.Wire;

/// <summary>
/// The wire a winding is wound with. One turn is <see cref="ElementsInHand"/> elements wound side by side (strands in
/// hand; 1 for a single wire); each element is a round body of <see cref="ElementOverallDiameter"/> holding
/// <see cref="StrandsPerElement"/> conductors of <see cref="StrandDiameter"/> (1 for solid and hook-up wire, the strand
/// count for Litz). The overall diameter sets the fit; the strands set the resistance and the skin effect.
/// </summary>
public sealed record WindingWire
{
    private WindingWire(
        WireKind kind,
        string description,
        ConductorMaterial metal,
        Length strandDiameter,
        int strandsPerElement,
        Length elementOverallDiameter,
        int elementsInHand,
        bool overallDiameterAssumed)
    {
        Kind = kind;
        Description = description;
        Metal = metal;
        StrandDiameter = strandDiameter;
        StrandsPerElement = strandsPerElement;
        ElementOverallDiameter = elementOverallDiameter;
        ElementsInHand = elementsInHand;
        OverallDiameterAssumed = overallDiameterAssumed;
    }

    /// <summary>Solid, Litz or hook-up.</summary>
    public WireKind Kind { get; }

    /// <summary>Plain description, e.g. "0.500 mm, grade 1" or "Litz 20 × 0.100 mm".</summary>
    public string Description { get; }

    /// <summary>The conductor metal.</summary>
    public ConductorMaterial Metal { get; }

    /// <summary>Bare diameter of each conductor strand (the conductor itself for solid and hook-up wire).</summary>
    public Length StrandDiameter { get; }

    /// <summary>Conductors in one element: 1 for solid and hook-up wire, the strand count for Litz.</summary>
    public int StrandsPerElement { get; }

    /// <summary>Overall diameter of one element over its insulation (sets the fit).</summary>
    public Length ElementOverallDiameter { get; }

    /// <summary>Elements wound side by side as one turn (parallel strands in hand), at least 1.</summary>
    public int ElementsInHand { get; }

    /// <summary>True when the overall diameter was not given and a standard build was assumed.</summary>
    public bool OverallDiameterAssumed { get; }

    /// <summary>Conductors in parallel per turn: elements in hand × strands per element.</summary>
    public int ParallelConductors => ElementsInHand * StrandsPerElement;

    /// <summary>Total conductor cross-section of one turn, m².</summary>
    public double ConductorAreaM2 => ParallelConductors * Math.PI * StrandDiameter.Metres * StrandDiameter.Metres / 4;

    /// <summary>Overall cross-section of one turn (all elements in hand), m².</summary>
    public double OverallAreaM2 => ElementsInHand * Math.PI * ElementOverallDiameter.Metres * ElementOverallDiameter.Metres / 4;

    /// <summary>A solid round wire with a stated overall diameter (not smaller than the conductor).</summary>
    /// <exception cref="ArgumentOutOfRangeException">A diameter is not positive, or overall &lt; conductor.</exception>
    public static WindingWire Solid(Length conductorDiameter, Length overallDiameter, ConductorMaterial? metal = null, string? description = null, bool overallDiameterAssumed = false)
    {
        RequirePositive(conductorDiameter, nameof(conductorDiameter));
        if (overallDiameter < conductorDiameter)
        {
            throw new ArgumentOutOfRangeException(nameof(overallDiameter), overallDiameter, "The overall diameter cannot be smaller than the conductor diameter.");
        }

        return new WindingWire(
            WireKind.Solid,
            description ?? FormattableString.Invariant($"{conductorDiameter.Millimetres:0.###} mm over {overallDiameter.Millimetres:0.###} mm"),
            metal ?? ConductorMaterial.Copper,
            conductorDiameter,
            1,
            overallDiameter,
            1,
            overallDiameterAssumed);
    }

    /// <summary>An enamelled copper wire whose overall diameter is the assumed grade 1 build (<see cref="EnamelBuild"/>).</summary>
    public static WindingWire Enamelled(Length conductorDiameter)
    {
        RequirePositive(conductorDiameter, nameof(conductorDiameter));
        var overall = EnamelBuild.Grade1OverallDiameter(conductorDiameter);
        return Solid(conductorDiameter, overall, ConductorMaterial.Copper, FormattableString.Invariant($"{conductorDiameter.Millimetres:0.###} mm enamelled, assumed grade 1 ({overall.Millimetres:0.###} mm)"), overallDiameterAssumed: true);
    }

    /// <summary>A Litz bundle: <paramref name="strandCount"/> strands of <paramref name="strandDiameter"/>, bundle overall diameter given.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Non-positive sizes, fewer than 2 strands, or a bundle too small for its copper.</exception>
    public static WindingWire Litz(int strandCount, Length strandDiameter, Length overallDiameter, ConductorMaterial? metal = null, string? description = null)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(strandCount, 2);
        RequirePositive(strandDiameter, nameof(strandDiameter));
        if (overallDiameter.Metres * overallDiameter.Metres < strandCount * strandDiameter.Metres * strandDiameter.Metres)
        {
            throw new ArgumentOutOfRangeException(nameof(overallDiameter), overallDiameter, "The bundle's overall diameter is too small to hold its strands.");
        }

        return new WindingWire(
            WireKind.Litz,
            description ?? FormattableString.Invariant($"Litz {strandCount} × {strandDiameter.Millimetres:0.###} mm, {overallDiameter.Millimetres:0.##} mm overall"),
            metal ?? ConductorMaterial.Copper,
            strandDiameter,
            strandCount,
            overallDiameter,
            1,
            overallDiameterAssumed: false);
    }

    /// <summary>Hook-up wire: a solid conductor with an insulation of the given radial thickness.</summary>
    public static WindingWire HookUp(Length conductorDiameter, Length insulationThickness, ConductorMaterial? metal = null, string? description = null)
    {
        RequirePositive(conductorDiameter, nameof(conductorDiameter));
        if (insulationThickness.Metres < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(insulationThickness), insulationThickness, "The insulation thickness cannot be negative.");
        }

        var overall = Length.FromMetres(conductorDiameter.Metres + 2 * insulationThickness.Metres);
        return new WindingWire(
            WireKind.HookUp,
            description ?? FormattableString.Invariant($"hook-up wire {conductorDiameter.Millimetres:0.###} mm, {insulationThickness.Millimetres:0.###} mm insulation"),
            metal ?? ConductorMaterial.Copper,
            conductorDiameter,
            1,
            overall,
            1,
            overallDiameterAssumed: false);
    }

    /// <summary>This wire with <paramref name="count"/> elements wound in hand as one turn.</summary>
    public WindingWire InHand(int count)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(count, 1);
        return new WindingWire(Kind, Description, Metal, StrandDiameter, StrandsPerElement, ElementOverallDiameter, count, OverallDiameterAssumed);
    }

    private static void RequirePositive(Length value, string name)
    {
        if (value.Metres <= 0)
        {
            throw new ArgumentOutOfRangeException(name, value, "The diameter must be positive.");
        }
    }
}
