using Winding.Core.Quantities;

namespace Winding.Core.Geometry;

/// <summary>
/// A two-hole (multi-aperture) core: a block of length <see cref="Length"/> with two parallel holes of diameter
/// <see cref="HoleDiameter"/> whose centres are <see cref="HoleSpacing"/> apart; every turn passes through both holes.
/// </summary>
/// <remarks>
/// No published closed-form effective parameters exist for this shape (IEC 60205 does not cover it; physics-sources
/// §1.4). Unless entered, they are approximated as two ring cores in parallel, one around each hole, each with inner
/// diameter = hole diameter, outer diameter = hole spacing and height = length (common practice, no source): AL ≈ 2 ×
/// AL of one such tube, i.e. C1 and C2 of one tube halved and quartered. The centre web carries both fluxes.
/// </remarks>
public sealed record TwoHoleCore : CoreShape
{
    private TwoHoleCore(Length length, Length holeDiameter, Length holeSpacing, Length width, Length height, EffectiveParameters? entered)
    {
        Length = length;
        HoleDiameter = holeDiameter;
        HoleSpacing = holeSpacing;
        Width = width;
        Height = height;
        EnteredParameters = entered;
    }

    /// <inheritdoc />
    public override string ShapeName => "two-hole";

    /// <summary>Length of the block along the holes.</summary>
    public Length Length { get; }

    /// <summary>Diameter of each hole.</summary>
    public Length HoleDiameter { get; }

    /// <summary>Distance between the hole centres.</summary>
    public Length HoleSpacing { get; }

    /// <summary>Outer width of the end face (across both holes).</summary>
    public Length Width { get; }

    /// <summary>Outer height of the end face.</summary>
    public Length Height { get; }

    /// <summary>Effective parameters entered from a datasheet or a measurement, if any (they replace the approximation).</summary>
    public EffectiveParameters? EnteredParameters { get; }

    /// <summary>Creates a two-hole core. Requires hole &lt; spacing, width &gt; spacing + hole, height &gt; hole, all positive.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Impossible dimensions.</exception>
    public static TwoHoleCore Create(Length length, Length holeDiameter, Length holeSpacing, Length width, Length height, EffectiveParameters? entered = null)
    {
        if (length.Metres <= 0 || holeDiameter.Metres <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(length), length, "Length and hole diameter must be positive.");
        }

        if (holeSpacing <= holeDiameter)
        {
            throw new ArgumentOutOfRangeException(nameof(holeSpacing), holeSpacing, "The hole spacing must exceed the hole diameter.");
        }

        if (width.Metres <= holeSpacing.Metres + holeDiameter.Metres)
        {
            throw new ArgumentOutOfRangeException(nameof(width), width, "The width must exceed the hole spacing plus one hole diameter.");
        }

        if (height <= holeDiameter)
        {
            throw new ArgumentOutOfRangeException(nameof(height), height, "The height must exceed the hole diameter.");
        }

        return new TwoHoleCore(length, holeDiameter, holeSpacing, width, height, entered);
    }

    /// <summary>Entered parameters, or two tubes in parallel (see the remarks).</summary>
    public override EffectiveParameters EffectiveParameters() =>
        EnteredParameters ?? ToroidCore.Create(HoleSpacing, HoleDiameter, Length).EffectiveParameters().Stacked(2);

    /// <summary>The area of one hole (every turn passes through each hole once), m².</summary>
    public override double WindowAreaM2 => Math.PI * HoleDiameter.Metres * HoleDiameter.Metres / 4;

    /// <summary>Blocks end to end along the holes: the lengths add (entered parameters scale as a stack).</summary>
    public override CoreShape Stacked(int count)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(count, 1);
        return new TwoHoleCore(Length.FromMetres(Length.Metres * count), HoleDiameter, HoleSpacing, Width, Height, EnteredParameters?.Stacked(count));
    }

    /// <summary>Block surface (outer faces and hole walls) less the hole openings, m².</summary>
    public override double SurfaceAreaM2 =>
        2 * (Width.Metres * Height.Metres - 2 * WindowAreaM2)
        + 2 * (Width.Metres + Height.Metres) * Length.Metres
        + 2 * Math.PI * HoleDiameter.Metres * Length.Metres;
}
