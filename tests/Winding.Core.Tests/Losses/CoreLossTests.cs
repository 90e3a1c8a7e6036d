using CsCheck;
using Winding.Core.Losses;
using Winding.Core.Magnetics;
using Winding.Core.Materials;

namespace Winding.Core.Tests.Losses;

/// <summary>
/// Core loss at an operating point: Steinmetz for sine (Steinmetz 1892), iGSE for square and pulse (Venkatachalam et
/// al. 2002); both from memory. Expected values: physics-sources.md §8.3 (script t08) with the illustrative parameters
/// k = 10, α = 1.4, β = 2.6 (f in Hz, B in T, W/m³), six significant figures. Flux from Faraday's law with N = 10 and
/// Ae = 10 mm².
/// </summary>
public sealed class CoreLossTests
{
    private const double Relative = 1e-5;
    private const double Ve = 2e-6; // m³, 2 cm³, chosen for the test
    private static readonly SteinmetzParameters SetA = SteinmetzParameters.Create(10, 1.4, 2.6, 20e3, 500e3, 0.01, 0.3);

    [Fact]
    public void Sine_MatchesSteinmetzCheckValue()
    {
        // physics-sources.md §8.3: Pv(sine, 100 kHz, 0.1 T) = 251189 W/m³ = 251.189 mW/cm³.
        Assert.Equal(251189, CoreLoss.SinePowerDensityWPerM3(SetA, 0.1, 100e3), 251189 * Relative);

        // V_rms = √2·π·f·N·Ae·B̂ = 4.442883 · 100 kHz · 10 · 10 mm² · 0.1 T = 4.442883 V gives B̂ = 0.1 T.
        var loss = CoreLoss.Calculate(SetA, PeakFluxDensity.Sine(4.442883, 100e3, 10, 10e-6), Ve);

        Assert.Equal(CoreLossMethod.Steinmetz, loss.Method);
        Assert.Equal(251189, loss.PowerDensityWPerM3, 251189 * Relative);
        Assert.Equal(0.502378, loss.PowerW, 0.502378 * Relative);
        Assert.False(loss.IsOutsideFittedRange);
    }

    [Fact]
    public void Square_UsesIgseTriangleAtHalfDuty()
    {
        // ±4 V at 100 kHz, N = 10, Ae = 10 mm²: B̂ = 4/(4·f·N·Ae) = 0.1 T. physics-sources.md §8.3: iGSE, D = 0.5 → 234140 W/m³.
        var loss = CoreLoss.Calculate(SetA, PeakFluxDensity.Square(4, 100e3, 10, 10e-6), Ve);

        Assert.Equal(CoreLossMethod.ImprovedGeneralisedSteinmetz, loss.Method);
        Assert.Equal(234140, loss.PowerDensityWPerM3, 234140 * Relative);
        Assert.Equal(0.468280, loss.PowerW, 0.468280 * Relative);
    }

    [Fact]
    public void Pulse_UsesIgseTriangleWithTheDutyAsRiseFraction()
    {
        // 10 V pulses at duty 0.2, 100 kHz: ΔB = 10·0.2/(f·N·Ae) = 0.2 T, B̂ = 0.1 T. physics-sources.md §8.3: D = 0.2 → 265903 W/m³.
        var loss = CoreLoss.Calculate(SetA, PeakFluxDensity.Pulse(10, 0.2, 100e3, 10, 10e-6), Ve);

        Assert.Equal(265903, loss.PowerDensityWPerM3, 265903 * Relative);
        Assert.False(loss.IsOutsideFittedRange);
    }

    [Theory]
    [InlineData(1e6, 0.1)] // above fMax
    [InlineData(100e3, 0.4)] // above B̂max
    [InlineData(100e3, 0.005)] // below B̂min
    public void OutsideTheFittedRange_IsFlagged(double frequencyHz, double peakT)
    {
        var flux = PeakFluxDensity.Square(4 * frequencyHz * 10 * 10e-6 * peakT, frequencyHz, 10, 10e-6);

        var loss = CoreLoss.Calculate(SetA, flux, Ve);

        Assert.True(loss.IsOutsideFittedRange);
        Assert.True(double.IsFinite(loss.PowerW));
    }

    [Theory]
    [InlineData(0)]
    [InlineData(-1e-6)]
    [InlineData(double.NaN)]
    public void Calculate_InvalidVolume_Throws(double volumeM3) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => CoreLoss.Calculate(SetA, PeakFluxDensity.Square(4, 100e3, 10, 10e-6), volumeM3));

    [Fact]
    public void Loss_GrowsWithFluxAndFrequency_AndIsFinite()
    {
        // Steinmetz and iGSE are power laws in B and f with positive exponents: more voltage (more B̂) at fixed f, or a
        // higher f at fixed B̂, always costs more loss.
        var parameters = Gen.Select(Gen.Double[0.1, 100], Gen.Double[1.0, 2.0], Gen.Double[2.0, 3.0])
            .Select((k, a, b) => SteinmetzParameters.Create(k, a, b, 1e3, 1e7, 0.001, 0.5));
        Gen.Select(parameters, Gen.Double[1e3, 1e7], Gen.Double[0.001, 0.4], Gen.Double[0.01, 0.99])
            .Sample((p, f, peakT, duty) =>
            {
                const int n = 10;
                const double ae = 10e-6;
                PeakFluxDensity[] Fluxes(double frequencyHz, double amplitudeT) =>
                [
                    PeakFluxDensity.Sine(amplitudeT * PeakFluxDensity.SineConstant * frequencyHz * n * ae, frequencyHz, n, ae),
                    PeakFluxDensity.Square(amplitudeT * 4 * frequencyHz * n * ae, frequencyHz, n, ae),
                    PeakFluxDensity.Pulse(2 * amplitudeT * frequencyHz * n * ae / duty, duty, frequencyHz, n, ae),
                ];

                var baseline = Fluxes(f, peakT);
                var moreFlux = Fluxes(f, peakT * 1.05);
                var higherFrequency = Fluxes(f * 1.05, peakT);
                for (var i = 0; i < baseline.Length; i++)
                {
                    var loss = CoreLoss.Calculate(p, baseline[i], Ve).PowerW;
                    Assert.True(double.IsFinite(loss) && loss > 0);
                    Assert.True(CoreLoss.Calculate(p, moreFlux[i], Ve).PowerW > loss);
                    Assert.True(CoreLoss.Calculate(p, higherFrequency[i], Ve).PowerW > loss);
                }
            });
    }
}
