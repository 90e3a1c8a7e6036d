using Winding.Core.Conductors;
using Winding.Core.Quantities;

namespace Winding.Core.Tests.Conductors;

/// <summary>
/// Dowell's F_R = Δ·[ς1 + (2/3)(p² − 1)·ς2] (Dowell 1966, from memory). Expected values: physics-sources.md §5 F_R table
/// and per-layer factors (script t05_dowell.py), printed to 6 decimals (tolerance 5e-7).
/// </summary>
public sealed class DowellFactorTests
{
    private const double SixDecimals = 5e-7;

    public static TheoryData<double, int, double> FrTable()
    {
        int[] layers = [1, 2, 3, 4, 5, 10];
        (double Delta, double[] Row)[] rows =
        [
            (0.1, [1.000009, 1.000042, 1.000098, 1.000176, 1.000276, 1.001109]),
            (0.5, [1.005542, 1.026323, 1.060958, 1.109446, 1.171788, 1.691308]),
            (1.0, [1.085636, 1.406009, 1.939965, 2.687503, 3.648623, 11.657957]),
            (1.5, [1.378094, 2.779311, 5.114672, 8.384177, 12.587827, 47.618240]),
            (2.0, [1.897806, 5.146489, 10.560961, 18.141221, 27.887270, 109.104344]),
            (3.0, [3.010136, 9.538301, 20.418577, 35.650964, 55.235460, 218.439600]),
            (5.0, [4.999372, 15.089115, 31.905352, 55.448085, 85.717312, 337.960874]),
        ];
        var data = new TheoryData<double, int, double>();
        foreach (var (delta, row) in rows)
        {
            for (var i = 0; i < layers.Length; i++)
            {
                data.Add(delta, layers[i], row[i]);
            }
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(FrTable))]
    public void Average_MatchesFrTable(double delta, int layers, double expected)
    {
        Assert.Equal(expected, DowellFactor.Average(delta, layers), SixDecimals);
    }

    [Theory]
    [InlineData(1, 1.085636)]
    [InlineData(2, 1.726382)]
    [InlineData(3, 3.007876)]
    [InlineData(4, 4.930116)]
    public void Layer_AtDeltaOne_MatchesPerLayerFactors(int layer, double expected)
    {
        // physics-sources.md §5: per-layer factors at Δ = 1.0.
        Assert.Equal(expected, DowellFactor.Layer(1.0, layer), SixDecimals);
    }

    [Theory]
    [InlineData(0.001)]
    [InlineData(0.3)]
    [InlineData(1.0)]
    [InlineData(7.5)]
    [InlineData(45)]
    public void MeanOfLayerFactors_EqualsAverage(double delta)
    {
        // physics-sources.md §5 [DERIVED]: the mean of the per-layer factors equals F_R (Σ m(m−1) = p(p²−1)/3).
        for (var p = 1; p <= 12; p++)
        {
            var mean = Enumerable.Range(1, p).Average(m => DowellFactor.Layer(delta, m));
            var average = DowellFactor.Average(delta, p);
            Assert.Equal(average, mean, average * 1e-13);
        }
    }

    [Fact]
    public void LowFrequencySeriesCheck_DeltaPoint3FiveLayers()
    {
        // physics-sources.md §5 [DERIVED]: at Δ = 0.3, p = 5 the exact form gives 1.02231270 and the expansion
        // 1 + (5p² − 1)Δ⁴/45 gives 1 + 124·0.0081/45 = 1.02232000 (by hand). The note lists the pair without saying which
        // is which; the hand arithmetic fixes it. Tolerance: 8 printed decimals.
        Assert.Equal(1.02231270, DowellFactor.Average(0.3, 5), 5e-9);
    }

    [Theory]
    [InlineData(0.005, 1, 1.0000000000555556)]
    [InlineData(0.005, 3, 1.0000000006111111)]
    [InlineData(0.001, 10, 1.0000000000110889)]
    public void BelowSeriesLimit_FollowsTheLowFrequencySeries(double delta, int layers, double expected)
    {
        // physics-sources.md §5: F_R ≈ 1 + (5p² − 1)·Δ⁴/45, evaluated by hand (e.g. 1 + 44·6.25e-10/45 for p = 3).
        Assert.Equal(expected, DowellFactor.Average(delta, layers), 1e-15);
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(10)]
    [InlineData(100)]
    [InlineData(1000)]
    public void SeriesSwitch_IsContinuousWithTheExactForm(int layers)
    {
        var below = DowellFactor.Average(Math.BitDecrement(DowellFactor.SeriesLimit), layers);
        var at = DowellFactor.Average(DowellFactor.SeriesLimit, layers);

        Assert.Equal(at, below, at * 1e-12);
    }

    [Theory]
    [InlineData(1)]
    [InlineData(4)]
    [InlineData(1000)]
    public void LimitingFormSwitch_IsContinuous(int layers)
    {
        var below = DowellFactor.Average(Math.BitDecrement(DowellFactor.LimitingFormStart), layers);
        var at = DowellFactor.Average(DowellFactor.LimitingFormStart, layers);

        Assert.Equal(at, below, at * 1e-14);
    }

    [Theory]
    [InlineData(400)]
    [InlineData(1e6)]
    public void SingleLayer_AtLargeDelta_TendsToDelta(double delta)
    {
        // physics-sources.md §5 [DERIVED]: for Δ ≫ 1 a single layer tends to F_R → Δ. Beyond Δ ≈ 355 sinh and cosh
        // overflow, so this also checks the limiting form.
        Assert.Equal(delta, DowellFactor.Average(delta, 1), delta * 1e-15);
    }

    [Fact]
    public void RoundWireDelta_HalfMillimetreAt10kHz_MatchesWorkedExample()
    {
        // physics-sources.md §5 worked example: d = 0.5 mm, t = 0.544 mm, δ = 0.660855 mm → Δ = 0.605155.
        var delta = DowellFactor.RoundWireDelta(Length.FromMillimetres(0.5), Length.FromMillimetres(0.544), Length.FromMillimetres(0.660855));

        Assert.Equal(0.605155, delta, 5e-7);
    }

    [Fact]
    public void Porosity_TouchingBareWire_IsRootPiOverTwo()
    {
        // η = h/t with h = (√π/2)·d (physics-sources.md §5); at t = d, η = √π/2 = 0.886227 (by hand).
        Assert.Equal(0.886227, DowellFactor.Porosity(Length.FromMillimetres(1), Length.FromMillimetres(1)), 5e-7);
    }

    [Theory]
    [InlineData(-0.1, 1)]
    [InlineData(double.NaN, 1)]
    [InlineData(double.PositiveInfinity, 1)]
    [InlineData(1e101, 1)]
    public void Average_InvalidDelta_Throws(double delta, int layers)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => DowellFactor.Average(delta, layers));
        Assert.Equal("delta", ex.ParamName);
    }

    [Fact]
    public void Average_ZeroLayers_Throws()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => DowellFactor.Average(1, 0));
        Assert.Equal("layers", ex.ParamName);
    }

    [Fact]
    public void RoundWireDelta_PitchBelowDiameter_Throws()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(
            () => DowellFactor.RoundWireDelta(Length.FromMillimetres(0.5), Length.FromMillimetres(0.4), Length.FromMillimetres(0.1)));
        Assert.Equal("pitch", ex.ParamName);
    }
}
