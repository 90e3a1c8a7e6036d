using Winding.Core.Quantities;
using Winding.Core.Windings;

namespace Winding.Core.Geometry;

/// <summary>
/// A bobbin core of the E, pot or RM-like families, described generically: effective parameters Ae and le entered from
/// a datasheet (IEC 60205 values as makers publish them), an optional AL (for a gapped core), the bobbin's winding window
/// (breadth along the leg and build height), the centre leg for the mean turn length, and the bobbin wall thickness
/// between leg and first layer.
/// </summary>
public sealed record BobbinCore : CoreShape
{
    private BobbinCore(
        string family, double effectiveAreaM2, double effectiveLengthM, InductanceFactor? enteredAl,
        Length windowBreadth, Length windowHeight, CentreLeg leg, Length bobbinWall, double surfaceAreaM2)
    {
        Family = family;
        EffectiveAreaM2 = effectiveAreaM2;
        EffectiveLengthM = effectiveLengthM;
        EnteredAl = enteredAl;
        WindowBreadth = windowBreadth;
        WindowHeight = windowHeight;
        Leg = leg;
        BobbinWall = bobbinWall;
        SurfaceAreaM2 = surfaceAreaM2;
    }

    /// <inheritdoc />
    public override string ShapeName => "bobbin";

    /// <summary>Family word, for display: <c>E</c>, <c>pot</c>, <c>RM</c> or <c>other</c>.</summary>
    public string Family { get; }

    /// <summary>Effective area Ae, m².</summary>
    public double EffectiveAreaM2 { get; }

    /// <summary>Effective length le, m.</summary>
    public double EffectiveLengthM { get; }

    /// <summary>AL entered from a datasheet (gapped cores); when null, AL follows from μi, Ae and le.</summary>
    public InductanceFactor? EnteredAl { get; }

    /// <summary>Breadth of the bobbin's winding space along the leg (the layer length b_w).</summary>
    public Length WindowBreadth { get; }

    /// <summary>Height of the bobbin's winding space (radial build available).</summary>
    public Length WindowHeight { get; }

    /// <summary>The centre leg.</summary>
    public CentreLeg Leg { get; }

    /// <summary>Bobbin wall thickness between the leg and the first layer.</summary>
    public Length BobbinWall { get; }

    /// <summary>Creates a bobbin core from entered values.</summary>
    /// <param name="family">Family word for display.</param>
    /// <param name="effectiveAreaM2">Ae, m², positive.</param>
    /// <param name="effectiveLengthM">le, m, positive.</param>
    /// <param name="enteredAl">AL from the datasheet, or null.</param>
    /// <param name="windowBreadth">Bobbin breadth, positive.</param>
    /// <param name="windowHeight">Bobbin height, positive.</param>
    /// <param name="leg">Centre leg.</param>
    /// <param name="bobbinWall">Wall thickness, at least zero.</param>
    /// <param name="surfaceAreaM2">Outer surface of the core set for the thermal estimate, m²; when 0 it is estimated as
    /// 6·Ve^(2/3) (the surface of a cube of the effective volume; common practice, no source).</param>
    /// <exception cref="ArgumentOutOfRangeException">Values not positive.</exception>
    public static BobbinCore Create(
        string family, double effectiveAreaM2, double effectiveLengthM, InductanceFactor? enteredAl,
        Length windowBreadth, Length windowHeight, CentreLeg leg, Length bobbinWall, double surfaceAreaM2 = 0)
    {
        ArgumentNullException.ThrowIfNull(family);
        ArgumentNullException.ThrowIfNull(leg);
        if (!(effectiveAreaM2 > 0) || !(effectiveLengthM > 0) || !double.IsFinite(effectiveAreaM2) || !double.IsFinite(effectiveLengthM))
        {
            throw new ArgumentOutOfRangeException(nameof(effectiveAreaM2), effectiveAreaM2, "Ae and le must be finite and positive.");
        }

        if (windowBreadth.Metres <= 0 || windowHeight.Metres <= 0 || bobbinWall.Metres < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(windowBreadth), windowBreadth, "The window must be positive and the wall at least zero.");
        }

        var surface = surfaceAreaM2 > 0 ? surfaceAreaM2 : 6 * Math.Pow(effectiveAreaM2 * effectiveLengthM, 2.0 / 3);
        return new BobbinCore(family, effectiveAreaM2, effectiveLengthM, enteredAl, windowBreadth, windowHeight, leg, bobbinWall, surface);
    }

    /// <summary>From the entered values: C1 = le/Ae, C2 = le/Ae² (IEC 60205 definitions).</summary>
    public override EffectiveParameters EffectiveParameters() =>
        new(EffectiveLengthM / EffectiveAreaM2, EffectiveLengthM / (EffectiveAreaM2 * EffectiveAreaM2));

    /// <summary>The bobbin window, breadth × height, m².</summary>
    public override double WindowAreaM2 => WindowBreadth.Metres * WindowHeight.Metres;

    /// <summary>Bobbin cores are not stacked here.</summary>
    public override bool CanStack => false;

    /// <summary>Only a count of 1 is accepted.</summary>
    public override CoreShape Stacked(int count)
    {
        ArgumentOutOfRangeException.ThrowIfNotEqual(count, 1);
        return this;
    }

    /// <inheritdoc />
    public override double SurfaceAreaM2 { get; }
}
