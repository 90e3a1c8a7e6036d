using Winding.Core.Quantities;

namespace Winding.Core.Geometry;

/// <summary>
/// A sleeve (tube) core: a hollow cylinder whose bore the turns pass through — a solid sleeve, or a split clamp-on
/// sleeve whose two halves leave a residual air gap. Magnetically it is a ring core whose height is the sleeve's length
/// (physics-sources §1.3: the flux circulates around the bore), so the IEC 60205 ring formulas apply unchanged.
/// </summary>
public sealed record SleeveCore : CoreShape
{
    private SleeveCore(Length outerDiameter, Length boreDiameter, Length length, Length residualGap)
    {
        OuterDiameter = outerDiameter;
        BoreDiameter = boreDiameter;
        Length = length;
        ResidualGap = residualGap;
    }

    /// <inheritdoc />
    public override string ShapeName => "sleeve";

    /// <summary>Outer diameter.</summary>
    public Length OuterDiameter { get; }

    /// <summary>Bore diameter (the hole the turns pass through).</summary>
    public Length BoreDiameter { get; }

    /// <summary>Length of the sleeve along its axis.</summary>
    public Length Length { get; }

    /// <summary>
    /// Total residual air gap in the magnetic path of a split sleeve (the sum over both mating faces); zero for a solid
    /// sleeve.
    /// </summary>
    public Length ResidualGap { get; }

    /// <summary>True for a split clamp-on sleeve.</summary>
    public bool IsSplit => ResidualGap.Metres > 0;

    /// <inheritdoc />
    public override double GapLengthM => ResidualGap.Metres;

    /// <summary>The equivalent ring core (OD, bore, length).</summary>
    public ToroidCore Ring => ToroidCore.Create(OuterDiameter, BoreDiameter, Length);

    /// <summary>Creates a sleeve. Requires 0 &lt; bore &lt; OD, length &gt; 0, gap ≥ 0.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Impossible dimensions.</exception>
    public static SleeveCore Create(Length outerDiameter, Length boreDiameter, Length length, Length residualGap)
    {
        _ = ToroidCore.Create(outerDiameter, boreDiameter, length);
        if (residualGap.Metres < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(residualGap), residualGap, "The residual gap cannot be negative.");
        }

        return new SleeveCore(outerDiameter, boreDiameter, length, residualGap);
    }

    /// <summary>IEC 60205 ring-core formulas with the sleeve's length as the ring height (physics-sources §1.3).</summary>
    public override EffectiveParameters EffectiveParameters() => Ring.EffectiveParameters();

    /// <summary>The bore area π·d²/4, m².</summary>
    public override double WindowAreaM2 => Ring.WindowAreaM2;

    /// <summary>Sleeves end to end on one bundle: their lengths add (physics-sources §1.3). A split sleeve's gaps add too.</summary>
    public override CoreShape Stacked(int count)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(count, 1);
        return new SleeveCore(OuterDiameter, BoreDiameter, Length.FromMetres(Length.Metres * count), ResidualGap);
    }

    /// <inheritdoc />
    public override double SurfaceAreaM2 => Ring.SurfaceAreaM2;
}
