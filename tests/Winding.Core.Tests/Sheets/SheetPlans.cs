using Winding.Core.Geometry;
using Winding.Core.Materials;
using Winding.Core.Plans;
using Winding.Core.Quantities;
using Winding.Core.Windings;
using Winding.Core.Wire;

namespace Winding.Core.Tests.Sheets;

/// <summary>Small plans for the sheet tests (round numbers chosen for the tests, no catalogue data).</summary>
internal static class SheetPlans
{
    /// <summary>Ring 10 × 5 × 4 mm: C1 = 2.26618 mm⁻¹; with μi 125, AL = 69.3147 nH/turn² (physics-sources §2.2).</summary>
    public static ToroidCore Ring10x5x4 { get; } = ToroidCore.Create(Mm(10), Mm(5), Mm(4));

    /// <summary>A material known only by μi: constant μ, the default ±25 % AL tolerance.</summary>
    public static MagneticMaterial Mu125 { get; } = MagneticMaterial.Create("μi 125", 125);

    public static Length Mm(double millimetres) => Length.FromMillimetres(millimetres);

    public static WindingSpec Spec(string name, int turns, double conductorMm = 0.2, double overallMm = 0.226, WindingPlacement? placement = null, InsulationWrap? wrap = null, IReadOnlyList<int>? taps = null) =>
        WindingSpec.Create(name, turns, WindingWire.Solid(Mm(conductorMm), Mm(overallMm)), placement, wrap, taps);

    public static TransformerPlan Plan(CoreShape shape, MagneticMaterial material, IReadOnlyList<WindingSpec> windings, OperatingConditions? operating = null, string? name = "bench test", int stack = 1) =>
        new(name, new PlanCore(shape, stack, material), windings, operating, WireLengthAllowance.Default);

    /// <summary>A 1:3 RF transformer on the 10 × 5 × 4 mm ring, 1.8–30 MHz between 50 Ω and 450 Ω.</summary>
    public static TransformerPlan RfOneToThree(double driveV = 1) => Plan(
        Ring10x5x4,
        Mu125,
        [Spec("primary", 10), Spec("secondary", 30)],
        new OperatingConditions(1.8e6, 30e6, 50, 450, driveV));
}
