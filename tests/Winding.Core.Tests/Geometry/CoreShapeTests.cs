using Winding.Core.Geometry;
using Winding.Core.Materials;
using Winding.Core.Plans;
using Winding.Core.Quantities;
using Winding.Core.Windings;

namespace Winding.Core.Tests.Geometry;

/// <summary>Sleeve, split sleeve, two-hole and bobbin cores, and one contract every shape must keep.</summary>
public sealed class CoreShapeTests
{
    public static TheoryData<CoreShape> AllShapes() =>
    [
        ToroidCore.Create(Mm(36), Mm(23), Mm(15)),
        ToroidCore.Create(Mm(10), Mm(5), Mm(4)).WithCoating(Mm(0.05)),
        SleeveCore.Create(Mm(17), Mm(7), Mm(28), Length.Zero),
        SleeveCore.Create(Mm(17), Mm(7), Mm(28), Mm(0.05)),
        TwoHoleCore.Create(Mm(14), Mm(3.5), Mm(6), Mm(13), Mm(7.5)),
        BobbinCore.Create("E", 52e-6, 57e-3, null, Mm(10), Mm(4), CentreLeg.Rectangular(Mm(7), Mm(7)), Mm(0.5)),
        BobbinCore.Create("pot", 63e-6, 45e-3, InductanceFactor.FromHenriesPerTurnSquared(250e-9), Mm(7), Mm(4), CentreLeg.Round(Mm(9)), Mm(0.6)),
    ];

    [Theory]
    [MemberData(nameof(AllShapes))]
    public void EveryShape_HasPositiveConsistentParametersAndAWindow(CoreShape shape)
    {
        // IEC 60205 definitions: le = C1²/C2, Ae = C1/C2, Ve = le·Ae, all positive; a non-empty window.
        var p = shape.EffectiveParameters();

        Assert.True(p.EffectiveLengthM > 0 && p.EffectiveAreaM2 > 0 && p.EffectiveVolumeM3 > 0);
        Assert.Equal(p.EffectiveLengthM * p.EffectiveAreaM2, p.EffectiveVolumeM3, p.EffectiveVolumeM3 * 1e-12);
        Assert.True(shape.WindowAreaM2 > 0);
        Assert.True(shape.SurfaceAreaM2 > 0);
        Assert.False(string.IsNullOrEmpty(shape.ShapeName));
    }

    [Fact]
    public void Sleeve_IsARingWhoseHeightIsItsLength()
    {
        // physics-sources.md §1.2/§1.3: tube OD 6, ID 3, length 10 mm has C1 = 0.906472 mm⁻¹ (IEC 60205 ring formula).
        var sleeve = SleeveCore.Create(Mm(6), Mm(3), Mm(10), Length.Zero);

        Assert.Equal(0.906472, sleeve.EffectiveParameters().CoreFactorC1PerM / 1e3, 0.906472 * 1e-5);
    }

    [Fact]
    public void SplitSleeve_GapLowersPermeabilityByTheGappedCoreFormula()
    {
        // μe = μi/(1 + μi·g/le) (Snelling 1988, ch. 2). Tube 6/3/10 mm: le = 13.0655 mm (physics-sources.md §1.2);
        // μi = 1000, g = 0.02 mm → μe = 1000/(1 + 1000·0.02/13.0655) = 1000/2.530740 = 395.1412.
        var sleeve = SleeveCore.Create(Mm(6), Mm(3), Mm(10), Mm(0.02));
        var core = new PlanCore(sleeve, 1, MagneticMaterial.Create("test", 1000));

        Assert.Equal(395.1412, core.EffectivePermeability, 395.1412 * 1e-5);
    }

    [Fact]
    public void TwoHole_IsApproximatedByTwoTubesInParallel()
    {
        // physics-sources.md §1.4 (common practice): AL ≈ 2 × AL of one tube; two tubes OD 6, ID 3, length 10 mm at
        // μr 1000 give 2 × 1386.29 = 2772.59 nH per turn².
        var core = TwoHoleCore.Create(Mm(10), Mm(3), Mm(6), Mm(9.5), Mm(5));
        var plan = new PlanCore(core, 1, MagneticMaterial.Create("test", 1000));

        Assert.Equal(2772.59, plan.InductanceFactor.NanohenriesPerTurnSquared, 2772.59 * 1e-5);
    }

    [Fact]
    public void Bobbin_EnteredAlIsUsedAsIs()
    {
        var bobbin = BobbinCore.Create("pot", 63e-6, 45e-3, InductanceFactor.FromHenriesPerTurnSquared(250e-9), Mm(7), Mm(4), CentreLeg.Round(Mm(9)), Mm(0.6));
        var plan = new PlanCore(bobbin, 1, MagneticMaterial.Create("test", 2000));

        Assert.Equal(250, plan.InductanceFactor.NanohenriesPerTurnSquared, 1e-9);
    }

    [Fact]
    public void Bobbin_WithoutAl_UsesMu0MuiAeOverLe()
    {
        // AL = μ0·μi·Ae/le (IEC 60205): μ0 = 1.25663706e-6, μi 2000, Ae 52 mm², le 57 mm → 2292.8 nH.
        var bobbin = BobbinCore.Create("E", 52e-6, 57e-3, null, Mm(10), Mm(4), CentreLeg.Rectangular(Mm(7), Mm(7)), Length.Zero);
        var plan = new PlanCore(bobbin, 1, MagneticMaterial.Create("test", 2000));

        Assert.Equal(2292.8, plan.InductanceFactor.NanohenriesPerTurnSquared, 0.1);
    }

    [Fact]
    public void TwoHole_RejectsHolesThatOverlap()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => TwoHoleCore.Create(Mm(10), Mm(4), Mm(3), Mm(12), Mm(6)));
    }

    private static Length Mm(double value) => Length.FromMillimetres(value);
}
