using Winding.Core.Geometry;
using Winding.Core.Quantities;
using Winding.Core.Windings;

namespace Winding.Core.Tests.Windings;

/// <summary>
/// AL = μ0·μr/C1 and L = AL·N² (IEC 60050-221 / IEC 60205 definitions). Expected values: physics-sources.md §2.2 and
/// §1.3 (script t02_inductance.py), cross-checked there against the textbook exact inductance of a rectangular-section
/// toroid, L = μ0·μr·N²·h·ln(OD/ID)/(2π) (Ampère's law).
/// </summary>
public sealed class InductanceFactorTests
{
    private static readonly EffectiveParameters Ring10x5x4 =
        ToroidCore.Create(Length.FromMillimetres(10), Length.FromMillimetres(5), Length.FromMillimetres(4)).EffectiveParameters();

    [Theory]
    [InlineData(125, 69.3147)]
    [InlineData(850, 471.340)]
    [InlineData(5000, 2772.59)]
    public void FromPermeability_Ring10x5x4_MatchesHandbookCheckValues(double mu, double alNanohenries)
    {
        var al = InductanceFactor.FromPermeability(mu, Ring10x5x4);

        Assert.Equal(alNanohenries, al.NanohenriesPerTurnSquared, alNanohenries * 1e-5);
    }

    [Theory]
    [InlineData(10, 6.93147e-6)]
    [InlineData(25, 43.3217e-6)]
    public void InductanceH_Ring10x5x4Mu125_MatchesTextbookToroidFormula(int turns, double expectedH)
    {
        var al = InductanceFactor.FromPermeability(125, Ring10x5x4);

        Assert.Equal(expectedH, al.InductanceH(turns), expectedH * 1e-5);
    }

    [Fact]
    public void FromPermeability_Tube6x3x10Mu1000_MatchesCheckValue()
    {
        // physics-sources.md §1.3: tube OD 6, ID 3, length 10 mm, μr 1000 → AL = 1386.29 nH/turn².
        var tube = ToroidCore.Create(Length.FromMillimetres(6), Length.FromMillimetres(3), Length.FromMillimetres(10)).EffectiveParameters();

        Assert.Equal(1386.29, InductanceFactor.FromPermeability(1000, tube).NanohenriesPerTurnSquared, 1386.29 * 1e-5);
    }
}
