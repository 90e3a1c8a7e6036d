namespace Winding.Core.Geometry;

/// <summary>
/// A core shape: its magnetic effective parameters (IEC 60205 where they follow from dimensions) and the window the
/// windings pass through. Concrete shapes: <see cref="ToroidCore"/>, <see cref="SleeveCore"/>, <see cref="TwoHoleCore"/>,
/// <see cref="BobbinCore"/>.
/// </summary>
public abstract record CoreShape
{
    /// <summary>The shape word used in files and the API (<c>toroid</c>, <c>sleeve</c>, <c>two-hole</c>, <c>bobbin</c>).</summary>
    public abstract string ShapeName { get; }

    /// <summary>Effective parameters of one core of this shape.</summary>
    public abstract EffectiveParameters EffectiveParameters();

    /// <summary>Area available to the windings, m² (the hole of a ring, one hole of a two-hole core, a bobbin's window).</summary>
    public abstract double WindowAreaM2 { get; }

    /// <summary>True when several identical cores can be stacked and wound as one.</summary>
    public virtual bool CanStack => true;

    /// <summary>The shape of <paramref name="count"/> identical cores stacked and wound as one.</summary>
    public abstract CoreShape Stacked(int count);

    /// <summary>
    /// The air gap in the magnetic path, m (0 for an ungapped core). Used for the gapped effective permeability
    /// μe = μi / (1 + μi·g/le) (Snelling 1988, ch. 2).
    /// </summary>
    public virtual double GapLengthM => 0;

    /// <summary>The outer surface area of the bare core, m², for the temperature-rise estimate.</summary>
    public abstract double SurfaceAreaM2 { get; }
}
