using Winding.Core.Materials;
using Winding.Core.Plans;
using Winding.Core.Sheets;
using static Winding.Core.Tests.Sheets.SheetPlans;

namespace Winding.Core.Tests.Sheets;

public sealed class TestFrequencyTests
{
    private static readonly PlanCore ConstantCore = new(Ring10x5x4, 1, Mu125);

    [Fact]
    public void ForInductance_ConstantPermeabilityFarResonance_TakesTheHighestMeterFrequency()
    {
        var (f, share, clean) = TestFrequency.ForInductance(ConstantCore, 50e6);

        Assert.Equal(100e3, f);
        Assert.Equal(1, share, 1e-9);
        Assert.True(clean);
    }

    [Fact]
    public void ForInductance_ResonanceAt500kHz_StaysAtATenthOfIt()
    {
        // L_apparent = L/(1 − (f/f0)²): at f0/10 the capacitance adds about 1 % (LC resonance, circuit theory).
        var (f, _, clean) = TestFrequency.ForInductance(ConstantCore, 500e3);

        Assert.Equal(10e3, f);
        Assert.True(clean);
    }

    [Fact]
    public void ForInductance_PermeabilityRollingOffAbove10kHz_StaysBelowTheRollOff()
    {
        // μ′ falls from 2000 to 1500 by 100 kHz (an invented table for the test): 100 kHz would read 25 % low.
        var table = ComplexPermeabilityCurve.Create([new(1e3, 2000, 10), new(1e4, 2000, 20), new(1e5, 1500, 600), new(1e6, 300, 900)]);
        var material = MagneticMaterial.Create("MnZn-like", 2000, table, null, null, 1, null, 0.25);
        var core = new PlanCore(Ring10x5x4, 1, material);

        var (f, share, clean) = TestFrequency.ForInductance(core, null);

        Assert.Equal(10e3, f);
        Assert.Equal(1, share, 1e-9);
        Assert.True(clean);
        Assert.Equal(0.75, TestFrequency.PermeabilityShare(core, 100e3), 1e-9);
    }

    [Fact]
    public void ForLeakage_TakesTheLowestFrequencyWithEnoughReactance()
    {
        // 1 µH against 0.1 Ω: ωL ≥ 3·R needs f ≥ 47.7 kHz, so 100 kHz; no capacitance limits it.
        var (f, clean) = TestFrequency.ForLeakage(1e-6, 0.1, 0);

        Assert.Equal(100e3, f);
        Assert.True(clean);
    }

    [Fact]
    public void ForLeakage_SmallRfLeakage_GoesToTenMegahertz()
    {
        // 24 nH against 0.45 Ω: ωL ≥ 3·R needs f ≥ 8.95 MHz.
        var (f, clean) = TestFrequency.ForLeakage(24e-9, 0.45, 0);

        Assert.Equal(10e6, f);
        Assert.True(clean);
    }

    [Fact]
    public void ForLeakage_ResonanceTooLow_SaysSo()
    {
        // 1 µH with 1 nF resonates at 5.03 MHz; its tenth (503 kHz) leaves 100 kHz, where ωL is 0.63 Ω < 3 × 1 Ω.
        var (f, clean) = TestFrequency.ForLeakage(1e-6, 1, 1e-9);

        Assert.Equal(100e3, f);
        Assert.False(clean);
    }
}
