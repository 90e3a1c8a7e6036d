using Winding.Core.Losses;
using Winding.Core.Materials;

namespace Winding.Core.Tests.Losses;

/// <summary>
/// The MSE for triangular flux (Reinert, Brockmeyer, De Doncker 2001; from memory). Expected values: computed from the
/// MSE in physics-sources.md §8.3 (script t08), set k = 10, α = 1.4, β = 2.6, B̂ = 0.1 T, 100 kHz; six significant figures.
/// </summary>
public sealed class ModifiedSteinmetzTests
{
    private static readonly SteinmetzParameters SetA = SteinmetzParameters.Create(10, 1.4, 2.6, 1e3, 1e6, 0.001, 0.3);

    [Theory]
    [InlineData(0.5, 230949)]
    [InlineData(0.3, 247631)]
    [InlineData(0.2, 276086)]
    [InlineData(0.1, 347532)]
    public void Triangular_MatchesCheckTable(double riseFraction, double expectedWPerM3) =>
        Assert.Equal(expectedWPerM3, ModifiedSteinmetz.TriangularPowerDensityWPerM3(SetA, 0.1, 100e3, riseFraction), expectedWPerM3 * 1e-5);

    [Theory]
    [InlineData(0)]
    [InlineData(1)]
    public void Triangular_RiseFractionOutOfRange_Throws(double riseFraction) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => ModifiedSteinmetz.TriangularPowerDensityWPerM3(SetA, 0.1, 100e3, riseFraction));
}
