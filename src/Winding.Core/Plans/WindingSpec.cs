using Winding.Core.Wire;

namespace Winding.Core.Plans;

/// <summary>One winding of a plan, in winding order: name, number of turns and wire.</summary>
public sealed record WindingSpec
{
    private WindingSpec(string name, int turns, WindingWire wire)
    {
        Name = name;
        Turns = turns;
        Wire = wire;
    }

    /// <summary>Display name, e.g. "primary".</summary>
    public string Name { get; }

    /// <summary>Number of turns, at least 1.</summary>
    public int Turns { get; }

    /// <summary>The wire.</summary>
    public WindingWire Wire { get; }

    /// <summary>Creates a winding.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Fewer than one turn.</exception>
    public static WindingSpec Create(string name, int turns, WindingWire wire)
    {
        ArgumentNullException.ThrowIfNull(name);
        ArgumentNullException.ThrowIfNull(wire);
        ArgumentOutOfRangeException.ThrowIfLessThan(turns, 1);
        return new WindingSpec(name, turns, wire);
    }
}
