using CsCheck;
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

    [Theory]
    // A 1:9 impedance ratio is a 1:3 turns ratio ((N₂/N₁)² = Z₂/Z₁, ideal-transformer relation).
    [InlineData(new[] { 2, 6 }, 5, new[] { 5, 15 })]
    [InlineData(new[] { 3, 5 }, 7, new[] { 9, 15 })]
    [InlineData(new[] { 4, 8 }, 7, new[] { 7, 14 })]
    [InlineData(new[] { 4, 2, 2 }, 9, new[] { 10, 5, 5 })]
    [InlineData(new[] { 10, 1 }, 3, new[] { 10, 1 })]
    public void ScaleKeepingRatio_SmallestWholeMultiple(int[] turns, int minimum, int[] expected)
    {
        Assert.Equal(expected, TurnsSolver.ScaleKeepingRatio(turns, minimum));
    }

    [Fact]
    public void ScaleKeepingRatio_Property_KeepsEveryRatio_ReachesTheMinimum_AndIsTheSmallestSuch()
    {
        Gen.Select(Gen.Int[1, 60].Array[1, 4], Gen.Int[1, 400]).Sample((turns, minimum) =>
        {
            var scaled = TurnsSolver.ScaleKeepingRatio(turns, minimum);

            Assert.True(scaled[0] >= minimum);
            for (var i = 1; i < turns.Length; i++)
            {
                Assert.Equal((long)turns[i] * scaled[0], (long)scaled[i] * turns[0]);
            }

            // One step smaller in the lowest-terms ratio falls short of the minimum (or would be zero turns).
            var g = turns.Aggregate(0, (a, t) => (int)MathNet.Numerics.Euclid.GreatestCommonDivisor(a, t));
            Assert.True(scaled[0] - turns[0] / g < minimum);
        });
    }

    [Fact]
    public void ScaleKeepingRatio_NoTurns_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => TurnsSolver.ScaleKeepingRatio([3, 0], 5));
        Assert.Throws<ArgumentOutOfRangeException>(() => TurnsSolver.ScaleKeepingRatio([3], 0));
    }
}
