using Winding.Core.Geometry;
using Winding.Core.Materials;
using Winding.Core.Plans;
using Winding.Core.Quantities;
using Winding.Core.Windings;

namespace Winding.Core.Tests.Plans;

/// <summary>The wound core's μe and AL when an AL was measured.</summary>
public sealed class PlanCoreTests
{
    [Fact]
    public void MeasuredAl_Ring10x5x4_69p3147nH_GivesMuE125_WhateverTheMaterialSays()
    {
        // physics-sources.md §2.2: ring OD 10 / ID 5 / h 4 mm with μr = 125 has AL = 69.3147 nH/turn² (IEC 60205
        // AL = μ0·μe/C1). A measured AL of that value means μe = 125, even on a material class of μi 250.
        var ring = ToroidCore.Create(Length.FromMillimetres(10), Length.FromMillimetres(5), Length.FromMillimetres(4));
        var material = MagneticMaterial.Create("class", 250, null, null, null, null, null, 0.25);
        var core = new PlanCore(ring, 1, material) { MeasuredAl = InductanceFactor.FromHenriesPerTurnSquared(69.3147e-9) };

        Assert.Equal(125, core.EffectivePermeability, 125 * 1e-5);
        Assert.Equal(69.3147e-9, core.InductanceFactor.HenriesPerTurnSquared, 1e-15);
        Assert.Equal(250, new PlanCore(ring, 1, material).EffectivePermeability, 1e-9);
    }
}
