using Winding.Core.Plans;

namespace Winding.Core.Windings;

/// <summary>
/// The arc of a ring core a winding occupies: a sector's own arc, the arc of the winding an "over" or bifilar winding
/// follows (followed to the end of the chain), or the whole circumference.
/// </summary>
public static class PlacementRegion
{
    /// <summary>The region of winding <paramref name="index"/> as start and end angles in degrees.</summary>
    public static (double Start, double End) Of(IReadOnlyList<WindingSpec> windings, int index)
    {
        ArgumentNullException.ThrowIfNull(windings);
        var placement = windings[index].Placement;
        var guard = 0;
        while (placement.Kind is PlacementKind.Over or PlacementKind.Bifilar && placement.OtherWinding != index && guard++ < windings.Count)
        {
            index = placement.OtherWinding;
            placement = windings[index].Placement;
        }

        return placement.Kind == PlacementKind.Sector ? (placement.StartDegrees, placement.EndDegrees) : (0, 360);
    }

    /// <summary>The arc of winding <paramref name="index"/>, degrees.</summary>
    public static double ArcDegrees(IReadOnlyList<WindingSpec> windings, int index)
    {
        var (start, end) = Of(windings, index);
        return end - start;
    }
}
