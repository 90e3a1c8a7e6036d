using CsCheck;
using Winding.Core.Magnetics;

namespace Winding.Core.Tests.Magnetics;

/// <summary>
/// Peak flux density from Faraday's law (McLyman 2004 ch. 1; Snelling 1988; from memory). Expected values: computed
/// from these formulas in physics-sources.md §8.1 (script t08), six significant figures, hence 1e-5 relative.
/// </summary>
public sealed class PeakFluxDensityTests
{
    private const double Relative = 1e-5;

    [Fact]
    public void SineConstant_IsRootTwoPi()
    {
        // physics-sources.md §8.1: √2·π = 4.442883 (seven significant figures).
        Assert.Equal(4.442883, PeakFluxDensity.SineConstant, 1e-6);
    }

    [Theory]
    // V rms, f (Hz), N, Ae (mm²) → B̂ (mT)
    [InlineData(1, 100e3, 10, 10, 22.5079)]
    [InlineData(10, 1e6, 5, 20, 22.5079)]
    [InlineData(2, 1.8e6, 3, 9.609, 8.67547)]
    [InlineData(230, 50, 1000, 1000, 1035.36)]
    public void Sine_MatchesFaradayCheckValues(double voltageRms, double frequencyHz, int turns, double aeMm2, double peakMilliteslas)
    {
        var b = PeakFluxDensity.Sine(voltageRms, frequencyHz, turns, aeMm2 * 1e-6);

        Assert.Equal(peakMilliteslas, b.AmplitudeT * 1e3, peakMilliteslas * Relative);
        Assert.Equal(2 * peakMilliteslas, b.PeakToPeakT * 1e3, peakMilliteslas * Relative);
        Assert.Equal(WaveformShape.Sine, b.Waveform.Shape);
    }

    [Fact]
    public void Square_MatchesFaradayCheckValue()
    {
        // physics-sources.md §8.1: ±12 V, 100 kHz, N = 10, Ae = 10 mm² → B̂ = 300 mT.
        var b = PeakFluxDensity.Square(12, 100e3, 10, 10e-6);

        Assert.Equal(0.300, b.AmplitudeT, 0.300 * Relative);
        Assert.Equal(0.5, b.Waveform.DutyCycle);
    }

    [Fact]
    public void Pulse_MatchesFaradayVoltSecondsCheckValue()
    {
        // physics-sources.md §8.1: 5 V for 2 µs, N = 10, Ae = 10 mm² → ΔB = 100 mT (2 µs = duty 0.2 at 100 kHz).
        var b = PeakFluxDensity.Pulse(5, 0.2, 100e3, 10, 10e-6);

        Assert.Equal(0.100, b.PeakToPeakT, 0.100 * Relative);
        Assert.Equal(0.050, b.AmplitudeT, 0.050 * Relative);
        Assert.Equal(WaveformShape.Pulse, b.Waveform.Shape);
    }

    [Fact]
    public void FromRmsVoltage_UsesTheRmsValueOfEachShape()
    {
        // A ±V square wave has V_rms = V; a 0…5 V pulse train at duty 0.25 has V_rms = 5·√0.25 = 2.5 V (definition of RMS).
        var square = PeakFluxDensity.FromRmsVoltage(VoltageWaveform.Square, 12, 100e3, 10, 10e-6);
        var pulse = PeakFluxDensity.FromRmsVoltage(VoltageWaveform.Pulse(0.25), 2.5, 100e3, 10, 10e-6);

        Assert.Equal(0.300, square.AmplitudeT, 0.300 * Relative);
        // ΔB = 5 V · 0.25 / (100 kHz · 10 · 10 mm²) = 0.125 T.
        Assert.Equal(0.125, pulse.PeakToPeakT, 0.125 * Relative);
    }

    [Theory]
    [InlineData(-1, 1e5, 10, 1e-5)]
    [InlineData(double.NaN, 1e5, 10, 1e-5)]
    [InlineData(1, 0, 10, 1e-5)]
    [InlineData(1, 1e5, 0, 1e-5)]
    [InlineData(1, 1e5, 10, 0)]
    [InlineData(1, 1e5, 10, double.PositiveInfinity)]
    public void Sine_OutOfRange_Throws(double voltage, double frequencyHz, int turns, double aeM2) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => PeakFluxDensity.Sine(voltage, frequencyHz, turns, aeM2));

    [Theory]
    [InlineData(0)]
    [InlineData(0.0005)]
    [InlineData(1)]
    [InlineData(double.NaN)]
    public void Pulse_DutyOutOfRange_Throws(double duty) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => PeakFluxDensity.Pulse(5, duty, 1e5, 10, 1e-5));

    [Fact]
    public void Flux_FallsWithTurnsAndFrequency_AndIsFinite()
    {
        // Faraday's law: B ∝ V/(f·N·Ae) for every waveform, so one more turn or a higher frequency always lowers B.
        Gen.Select(Gen.Double[0.001, 1000], Gen.Double[10, 1e8], Gen.Int[1, 10_000], Gen.Double[1e-8, 1e-2], Gen.Double[0.001, 0.999])
            .Sample((v, f, n, ae, duty) =>
            {
                foreach (var waveform in new[] { VoltageWaveform.Sine, VoltageWaveform.Square, VoltageWaveform.Pulse(duty) })
                {
                    var b = PeakFluxDensity.FromRmsVoltage(waveform, v, f, n, ae);
                    Assert.True(double.IsFinite(b.AmplitudeT) && b.AmplitudeT > 0);
                    Assert.True(PeakFluxDensity.FromRmsVoltage(waveform, v, f, n + 1, ae).AmplitudeT < b.AmplitudeT);
                    Assert.True(PeakFluxDensity.FromRmsVoltage(waveform, v, f * 1.01, n, ae).AmplitudeT < b.AmplitudeT);
                }
            });
    }
}
