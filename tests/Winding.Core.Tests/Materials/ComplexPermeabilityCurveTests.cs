using CsCheck;
using Winding.Core.Materials;

namespace Winding.Core.Tests.Materials;

/// <summary>
/// The complex-permeability table and its interpolation, linear in log10 f with the end values held outside the
/// table. The table rows are those of physics-sources.md §2.2 (an illustrative generic NiZn material, μi 125).
/// </summary>
public sealed class ComplexPermeabilityCurveTests
{
    private static readonly ComplexPermeabilityPoint[] Table =
    [
        new(1e6, 125, 2),
        new(10e6, 100, 40),
        new(100e6, 20, 60),
    ];

    [Fact]
    public void At_TableFrequencies_ReproducesThePointsExactly()
    {
        var curve = ComplexPermeabilityCurve.Create(Table);

        foreach (var p in Table)
        {
            var mu = curve.At(p.FrequencyHz);
            Assert.Equal(p.MuPrime, mu.MuPrime);
            Assert.Equal(p.MuDoublePrime, mu.MuDoublePrime);
            Assert.False(mu.IsExtrapolated);
        }
    }

    [Fact]
    public void At_GeometricMeanOfTwoPoints_IsTheArithmeticMeanOfTheirValues()
    {
        // Definition of linear interpolation on a log10 f axis: log10 √(f1·f2) lies half-way between log10 f1 and log10 f2.
        var curve = ComplexPermeabilityCurve.Create(Table);

        var mu = curve.At(Math.Sqrt(1e6 * 10e6));

        Assert.Equal(112.5, mu.MuPrime, 1e-9);
        Assert.Equal(21, mu.MuDoublePrime, 1e-9);
        Assert.False(mu.IsExtrapolated);
    }

    [Theory]
    [InlineData(1e3, 125, 2)]
    [InlineData(0.999e6, 125, 2)]
    [InlineData(100.001e6, 20, 60)]
    [InlineData(1e9, 20, 60)]
    public void At_OutsideTheTable_HoldsTheEndValueAndSaysSo(double frequencyHz, double muPrime, double muDoublePrime)
    {
        var mu = ComplexPermeabilityCurve.Create(Table).At(frequencyHz);

        Assert.Equal(muPrime, mu.MuPrime);
        Assert.Equal(muDoublePrime, mu.MuDoublePrime);
        Assert.True(mu.IsExtrapolated);
    }

    [Fact]
    public void Constant_IsLosslessAndTheSameAtEveryFrequency()
    {
        var curve = ComplexPermeabilityCurve.Constant(850);

        Assert.True(curve.IsFrequencyIndependent);
        Assert.Empty(curve.Points);
        foreach (var f in new[] { 1.0, 1e6, 1e12 })
        {
            var mu = curve.At(f);
            Assert.Equal(850, mu.MuPrime);
            Assert.Equal(0, mu.MuDoublePrime);
            Assert.Equal(0, mu.LossTangent);
            Assert.False(mu.IsExtrapolated);
        }
    }

    [Fact]
    public void Curves_WithTheSamePoints_AreEqual()
    {
        Assert.Equal(ComplexPermeabilityCurve.Create(Table), ComplexPermeabilityCurve.Create(Table.ToList()));
        Assert.Equal(ComplexPermeabilityCurve.Constant(125), ComplexPermeabilityCurve.Constant(125));
        Assert.NotEqual(ComplexPermeabilityCurve.Create(Table), ComplexPermeabilityCurve.Create(Table[..2]));
        Assert.NotEqual(ComplexPermeabilityCurve.Constant(125), ComplexPermeabilityCurve.Constant(126));
    }

    public static TheoryData<ComplexPermeabilityPoint[]> InvalidTables => new()
    {
        new ComplexPermeabilityPoint[] { new(1e6, 125, 2) },
        new ComplexPermeabilityPoint[] { new(1e6, 125, 2), new(1e6, 100, 40) },
        new ComplexPermeabilityPoint[] { new(10e6, 125, 2), new(1e6, 100, 40) },
        new ComplexPermeabilityPoint[] { new(0, 125, 2), new(1e6, 100, 40) },
        new ComplexPermeabilityPoint[] { new(1e6, 0, 2), new(10e6, 100, 40) },
        new ComplexPermeabilityPoint[] { new(1e6, 125, -0.1), new(10e6, 100, 40) },
        new ComplexPermeabilityPoint[] { new(1e6, double.NaN, 2), new(10e6, 100, 40) },
        new ComplexPermeabilityPoint[] { new(1e6, 125, 2), new(double.PositiveInfinity, 100, 40) },
    };

    [Theory]
    [MemberData(nameof(InvalidTables))]
    public void Create_InvalidTable_Throws(ComplexPermeabilityPoint[] points) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => ComplexPermeabilityCurve.Create(points));

    [Theory]
    [InlineData(0.5)]
    [InlineData(double.NaN)]
    public void Constant_InvalidPermeability_Throws(double mu) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => ComplexPermeabilityCurve.Constant(mu));

    [Theory]
    [InlineData(0)]
    [InlineData(-1)]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    public void At_InvalidFrequency_Throws(double frequencyHz) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => ComplexPermeabilityCurve.Create(Table).At(frequencyHz));

    [Fact]
    public void At_MonotoneTable_IsMonotoneAndBoundedBetweenThePoints()
    {
        // Linear interpolation cannot overshoot: over a table with falling μ′ and rising μ″ the curve falls and rises too,
        // and never leaves the range of the table values.
        var tables = Gen.Select(Gen.Int[2, 8], Gen.Double[1e3, 1e7]).SelectMany((n, f0) =>
            Gen.Select(Gen.Double[0.01, 2].Array[n], Gen.Double[0, 500].Array[n], Gen.Double[0, 50].Array[n])
                .Select((logSteps, muPrimeDrops, muDoublePrimeRises) =>
                {
                    var points = new ComplexPermeabilityPoint[n];
                    double logF = Math.Log10(f0), muPrime = 1 + muPrimeDrops.Sum(), muDoublePrime = 0;
                    for (var i = 0; i < n; i++)
                    {
                        logF += logSteps[i];
                        muPrime -= muPrimeDrops[i];
                        muDoublePrime += muDoublePrimeRises[i];
                        points[i] = new ComplexPermeabilityPoint(Math.Pow(10, logF), muPrime, muDoublePrime);
                    }

                    return points;
                }));

        Gen.Select(tables, Gen.Double[0, 1].Array[20]).Sample((points, fractions) =>
        {
            var curve = ComplexPermeabilityCurve.Create(points);
            var logLow = Math.Log10(points[0].FrequencyHz);
            var logHigh = Math.Log10(points[^1].FrequencyHz);
            var samples = fractions.Order().Select(u => curve.At(Math.Pow(10, logLow + u * (logHigh - logLow)))).ToArray();
            for (var i = 1; i < samples.Length; i++)
            {
                // A slack of 1e-12 relative allows for the last bit of rounding at a node, nothing more.
                Assert.True(samples[i].MuPrime <= samples[i - 1].MuPrime * (1 + 1e-12));
                Assert.True(samples[i].MuDoublePrime >= samples[i - 1].MuDoublePrime * (1 - 1e-12));
            }

            Assert.All(samples, s =>
            {
                Assert.InRange(s.MuPrime, points[^1].MuPrime * (1 - 1e-12), points[0].MuPrime * (1 + 1e-12));
                Assert.InRange(s.MuDoublePrime, points[0].MuDoublePrime * (1 - 1e-12), points[^1].MuDoublePrime * (1 + 1e-12));
            });
        });
    }
}
