using Winding.Core.Geometry;
using Winding.Core.Materials;

namespace Winding.Core.Plans;

/// <summary>The core of a plan: one toroid's geometry, how many identical cores are stacked, and the material.</summary>
/// <param name="Toroid">The geometry of one core.</param>
/// <param name="StackCount">Number of identical cores side by side, wound as one (at least 1).</param>
/// <param name="Material">The core material.</param>
public sealed record PlanCore(ToroidCore Toroid, int StackCount, MagneticMaterial Material)
{
    /// <summary>The stacked geometry that the winding goes around.</summary>
    public ToroidCore WoundGeometry => Toroid.Stacked(StackCount);
}
