namespace Winding.Core.Windings;

/// <summary>Where a winding lies on the core.</summary>
public enum PlacementKind
{
    /// <summary>Spread over the whole core (the whole circumference of a ring; the whole bobbin breadth).</summary>
    Spread,

    /// <summary>On a ring core, an arc from a start angle to an end angle (side-by-side sectored windings).</summary>
    Sector,

    /// <summary>Layered over another winding, in the same region.</summary>
    Over,

    /// <summary>Wound together with another winding as a bifilar or twisted pair (same turns, side by side).</summary>
    Bifilar,
}

/// <summary>A winding's placement.</summary>
/// <param name="Kind">Spread, sector, over or bifilar.</param>
/// <param name="StartDegrees">Sector start angle, 0 ≤ start &lt; end (sector only).</param>
/// <param name="EndDegrees">Sector end angle, ≤ 360 (sector only).</param>
/// <param name="OtherWinding">Index of the winding this one lies over or is paired with (over and bifilar only).</param>
public sealed record WindingPlacement(PlacementKind Kind, double StartDegrees, double EndDegrees, int OtherWinding)
{
    /// <summary>Spread over the whole core.</summary>
    public static WindingPlacement Spread { get; } = new(PlacementKind.Spread, 0, 360, -1);

    /// <summary>An arc of a ring core.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not 0 ≤ start &lt; end ≤ 360.</exception>
    public static WindingPlacement Sector(double startDegrees, double endDegrees)
    {
        if (!(startDegrees >= 0) || !(endDegrees <= 360) || !(endDegrees > startDegrees))
        {
            throw new ArgumentOutOfRangeException(nameof(startDegrees), startDegrees, "A sector needs 0 ≤ start < end ≤ 360 degrees.");
        }

        return new WindingPlacement(PlacementKind.Sector, startDegrees, endDegrees, -1);
    }

    /// <summary>Layered over winding <paramref name="other"/>.</summary>
    public static WindingPlacement Over(int other)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(other);
        return new WindingPlacement(PlacementKind.Over, 0, 360, other);
    }

    /// <summary>Bifilar with winding <paramref name="other"/>.</summary>
    public static WindingPlacement Bifilar(int other)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(other);
        return new WindingPlacement(PlacementKind.Bifilar, 0, 360, other);
    }

    /// <summary>The arc covered, in degrees.</summary>
    public double ArcDegrees => EndDegrees - StartDegrees;
}
