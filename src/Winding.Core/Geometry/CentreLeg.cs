using Winding.Core.Quantities;

namespace Winding.Core.Geometry;

/// <summary>The centre leg a bobbin sits on: round (diameter) or rectangular (width × depth).</summary>
public sealed record CentreLeg
{
    private CentreLeg(bool round, Length width, Length depth)
    {
        IsRound = round;
        Width = width;
        Depth = depth;
    }

    /// <summary>True for a round leg (pot and RM-like cores), false for a rectangular one (E-like cores).</summary>
    public bool IsRound { get; }

    /// <summary>Diameter of a round leg, or width of a rectangular one.</summary>
    public Length Width { get; }

    /// <summary>Depth of a rectangular leg (equal to the diameter for a round one).</summary>
    public Length Depth { get; }

    /// <summary>Perimeter of the leg, m: π·d for a round leg, 2·(w + t) for a rectangular one.</summary>
    public double PerimeterM => IsRound ? Math.PI * Width.Metres : 2 * (Width.Metres + Depth.Metres);

    /// <summary>A round leg of the given diameter.</summary>
    public static CentreLeg Round(Length diameter)
    {
        if (diameter.Metres <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(diameter), diameter, "The leg diameter must be positive.");
        }

        return new CentreLeg(true, diameter, diameter);
    }

    /// <summary>A rectangular leg of the given width and depth.</summary>
    public static CentreLeg Rectangular(Length width, Length depth)
    {
        if (width.Metres <= 0 || depth.Metres <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(width), width, "The leg width and depth must be positive.");
        }

        return new CentreLeg(false, width, depth);
    }
}
