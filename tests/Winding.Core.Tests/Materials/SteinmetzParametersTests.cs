using Winding.Core.Materials;

namespace Winding.Core.Tests.Materials;

/// <summary>
/// Steinmetz parameters and their fitted range. The parameters k = 10, α = 1.4, β = 2.6 are the illustrative set of
/// physics-sources.md §8.3 (not a real material); the range is chosen for the test.
/// </summary>
public sealed class SteinmetzParametersTests
{
    private static readonly SteinmetzParameters Fit = SteinmetzParameters.Create(10, 1.4, 2.6, 20e3, 500e3, 0.01, 0.3);

    [Theory]
    [InlineData(100e3, 0.1, true)]
    [InlineData(20e3, 0.01, true)]
    [InlineData(500e3, 0.3, true)]
    [InlineData(19.9e3, 0.1, false)]
    [InlineData(501e3, 0.1, false)]
    [InlineData(100e3, 0.005, false)]
    [InlineData(100e3, 0.31, false)]
    public void Contains_TellsWhetherThePointLiesInTheFittedRange(double frequencyHz, double peakT, bool inside) =>
        Assert.Equal(inside, Fit.Contains(frequencyHz, peakT));

    [Theory]
    [InlineData(0, 1.4, 2.6, 20e3, 500e3, 0.01, 0.3)]
    [InlineData(10, 0, 2.6, 20e3, 500e3, 0.01, 0.3)]
    [InlineData(10, 4.1, 2.6, 20e3, 500e3, 0.01, 0.3)]
    [InlineData(10, 1.4, 0, 20e3, 500e3, 0.01, 0.3)]
    [InlineData(10, 1.4, 5.1, 20e3, 500e3, 0.01, 0.3)]
    [InlineData(10, 1.4, 2.6, 0, 500e3, 0.01, 0.3)]
    [InlineData(10, 1.4, 2.6, 20e3, 20e3, 0.01, 0.3)]
    [InlineData(10, 1.4, 2.6, 20e3, 500e3, -0.01, 0.3)]
    [InlineData(10, 1.4, 2.6, 20e3, 500e3, 0.01, 0.01)]
    [InlineData(double.NaN, 1.4, 2.6, 20e3, 500e3, 0.01, 0.3)]
    [InlineData(10, 1.4, 2.6, 20e3, double.PositiveInfinity, 0.01, 0.3)]
    public void Create_OutOfRange_Throws(double k, double alpha, double beta, double fMin, double fMax, double bMin, double bMax) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => SteinmetzParameters.Create(k, alpha, beta, fMin, fMax, bMin, bMax));
}
