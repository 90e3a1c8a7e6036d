using Winding.Core.Quantities;

namespace Winding.Core.Geometry;

/// <summary>
/// A ring core (toroid) of rectangular cross-section, described by its outer diameter, inner diameter and height.
/// </summary>
public sealed record ToroidCore : CoreShape
{
    private ToroidCore(Length outerDiameter, Length innerDiameter, Length height, Length coatingThickness)
    {
        OuterDiameter = outerDiameter;
        InnerDiameter = innerDiameter;
        Height = height;
        CoatingThickness = coatingThickness;
    }

    /// <inheritdoc />
    public override string ShapeName => "toroid";

    /// <summary>Thickness of the insulating coating the winding sits on (0 for a bare core).</summary>
    public Length CoatingThickness { get; }

    /// <summary>Outer diameter OD.</summary>
    public Length OuterDiameter { get; }

    /// <summary>Inner diameter ID (the hole the winding passes through).</summary>
    public Length InnerDiameter { get; }

    /// <summary>Height (axial thickness) h.</summary>
    public Length Height { get; }

    /// <summary>Creates a toroid. Requires 0 &lt; ID &lt; OD and h &gt; 0.</summary>
    /// <exception cref="ArgumentOutOfRangeException">A dimension is not positive or ID is not below OD.</exception>
    public static ToroidCore Create(Length outerDiameter, Length innerDiameter, Length height)
    {
        if (innerDiameter.Metres <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(innerDiameter), innerDiameter, "The inner diameter must be greater than zero.");
        }

        if (outerDiameter <= innerDiameter)
        {
            throw new ArgumentOutOfRangeException(nameof(outerDiameter), outerDiameter, "The outer diameter must be greater than the inner diameter.");
        }

        if (height.Metres <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(height), height, "The height must be greater than zero.");
        }

        return new ToroidCore(outerDiameter, innerDiameter, height, Length.Zero);
    }

    /// <summary>
    /// This toroid with an insulating coating of the given thickness. The coating does not change the magnetic
    /// parameters; the winding sits on it (its hole is ID − 2c and each turn is longer).
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">Negative, or so thick that it closes the hole.</exception>
    public ToroidCore WithCoating(Length thickness)
    {
        if (thickness.Metres < 0 || 2 * thickness.Metres >= InnerDiameter.Metres)
        {
            throw new ArgumentOutOfRangeException(nameof(thickness), thickness, "The coating must be at least zero and thinner than half the inner diameter.");
        }

        return new ToroidCore(OuterDiameter, InnerDiameter, Height, thickness);
    }

    /// <summary>
    /// <paramref name="count"/> identical toroids stacked face to face and wound as one: geometrically a single ring of
    /// <paramref name="count"/> times the height (the IEC 60205 ring formulas then give C1/n and C2/n²).
    /// </summary>
    public override CoreShape Stacked(int count) => StackedToroid(count);

    /// <summary>The stacked toroid (see <see cref="Stacked"/>), typed.</summary>
    public ToroidCore StackedToroid(int count)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(count, 1);
        return new ToroidCore(OuterDiameter, InnerDiameter, Length.FromMetres(Height.Metres * count), CoatingThickness);
    }

    /// <summary>
    /// Effective parameters of a ring core of rectangular section by the IEC 60205 ring-core formulas (clause 5.1):
    /// with r1 = ID/2, r2 = OD/2, k = r2/r1:
    /// C1 = 2π / (h·ln k), C2 = 2π·(1/r1 − 1/r2) / (h²·ln³ k); hence le = 2π·ln k / (1/r1 − 1/r2),
    /// Ae = h·ln² k / (1/r1 − 1/r2), Ve = le·Ae.
    /// Valid for a sharp-edged rectangular section of uniform linear material with a uniformly distributed winding;
    /// chamfers reduce the area slightly and are not modelled.
    /// </summary>
    public override EffectiveParameters EffectiveParameters()
    {
        var r1M = InnerDiameter.Metres / 2;
        var r2M = OuterDiameter.Metres / 2;
        var hM = Height.Metres;
        var lnK = Math.Log(r2M / r1M);
        var c1PerM = 2 * Math.PI / (hM * lnK);
        var c2PerM3 = 2 * Math.PI * (1 / r1M - 1 / r2M) / (hM * hM * lnK * lnK * lnK);
        return new EffectiveParameters(c1PerM, c2PerM3);
    }

    /// <summary>Window area: the area of the hole inside the coating, π·(ID − 2c)²/4, in m².</summary>
    public override double WindowAreaM2 => Math.PI * Math.Pow(InnerDiameter.Metres - 2 * CoatingThickness.Metres, 2) / 4;

    /// <summary>Bare ring surface: two annular faces, the outer and the inner cylinder, m² (plane geometry).</summary>
    public override double SurfaceAreaM2 =>
        2 * Math.PI / 4 * (OuterDiameter.Metres * OuterDiameter.Metres - InnerDiameter.Metres * InnerDiameter.Metres)
        + Math.PI * (OuterDiameter.Metres + InnerDiameter.Metres) * Height.Metres;
}
