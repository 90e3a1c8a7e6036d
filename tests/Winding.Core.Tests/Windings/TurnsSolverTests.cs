using Winding.Core.Windings;

namespace Winding.Core.Tests.Windings;

/// <summary>N = ⌈√(L/(AL·(1 − t)))⌉ — worked values from physics-sources.md §2.3 (AL tolerance, common practice).</summary>
public sealed class TurnsSolverTests
{
    private static readonly InductanceFactor Al1000nH = InductanceFactor.FromHenriesPerTurnSquared(1000e-9);

    [Fact]
    public void ForInductance_Nominal_100uH_On1000nH_Is10Turns()
    {
        Assert.Equal(10, TurnsSolver.ForInductance(Al1000nH, 100e-6, 0));
    }

    [Fact]
    public void ForInductance_GuaranteedAtMinus25Percent_Is12Turns()
    {
        // physics-sources.md §2.3: N_guaranteed = 11.547 → 12 turns (108 … 180 µH).
        Assert.Equal(12, TurnsSolver.ForInductance(Al1000nH, 100e-6, 0.25));
    }

    [Fact]
    public void ForReactance_Ring10x5x4Mu125At1MHz_NeedsX200Ohm()
    {
        // Ring 10/5/4 mm at μ′ = 125 has AL = 69.3147 nH (physics-sources.md §2.2). X ≥ 4·50 Ω at 1 MHz needs
        // L ≥ 31.831 µH, i.e. N ≥ √(31.831 µH / 69.3147 nH) = 21.43 → 22 nominal; at −25 % AL, √(612.3) = 24.74 → 25.
        var al = InductanceFactor.FromHenriesPerTurnSquared(69.3147e-9);

        Assert.Equal(22, TurnsSolver.ForReactance(al, 1e6, 50, 4, 0));
        Assert.Equal(25, TurnsSolver.ForReactance(al, 1e6, 50, 4, 0.25));
    }

    [Theory]
    [InlineData(0)]
    [InlineData(-1)]
    [InlineData(double.NaN)]
    public void ForInductance_RejectsNonPositiveTargets(double target)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => TurnsSolver.ForInductance(Al1000nH, target, 0));
    }
}
