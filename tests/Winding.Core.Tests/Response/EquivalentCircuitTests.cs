using System.Numerics;
using Winding.Core.Response;

namespace Winding.Core.Tests.Response;

/// <summary>
/// The equivalent-circuit solver against the fully specified example circuits of physics-sources.md §9.2, whose
/// insertion loss was computed by an independent phasor solution and by ngspice-39 (the two agree to 8 digits).
/// </summary>
public sealed class EquivalentCircuitTests
{
    // Circuit A: 1:1, RS = RL = 50 Ω, Lm = 100 µH, Llk = 0.25 µH, Cw = 10 pF after the leakage.
    private static readonly EquivalentCircuit CircuitA = Circuit(50, 50, 100e-6, 0.25e-6, 10e-12);

    // Circuit B: 4:1 impedance, RS = 200 Ω, RL = 50 Ω, n = 2 → RL′ = 200 Ω; Lm = 400 µH, Llk = 1 µH, Cw = 5 pF.
    private static readonly EquivalentCircuit CircuitB = Circuit(200, 200, 400e-6, 1e-6, 5e-12);

    [Theory]
    [InlineData(1e3, 31.997948)]
    [InlineData(1e4, 12.261502)]
    [InlineData(39788.7358, 3.012746)]
    [InlineData(1e5, 0.642493)]
    [InlineData(1e6, 0.012616)]
    [InlineData(1e7, 0.090911)]
    [InlineData(3e7, 0.729793)]
    [InlineData(5e7, 1.807068)]
    [InlineData(1e8, 5.109962)]
    [InlineData(2e8, 11.103325)]
    public void CircuitA_InsertionLoss_MatchesNgspice(double frequencyHz, double lossDb)
    {
        Assert.Equal(lossDb, CircuitA.At(frequencyHz).InsertionLossDb, 5e-6);
    }

    [Theory]
    [InlineData(1e3, 31.997948)]
    [InlineData(1e4, 12.261470)]
    [InlineData(39788.7358, 3.012473)]
    [InlineData(1e5, 0.642022)]
    [InlineData(1e6, 0.011892)]
    [InlineData(1e7, 0.072827)]
    [InlineData(3e7, 0.610978)]
    [InlineData(5e7, 1.633969)]
    [InlineData(1e8, 5.508057)]
    [InlineData(2e8, 13.599299)]
    public void CircuitB_InsertionLoss_MatchesTheScriptAndNgspice(double frequencyHz, double lossDb)
    {
        Assert.Equal(lossDb, CircuitB.At(frequencyHz).InsertionLossDb, 5e-6);
    }

    [Fact]
    public void CircuitA_OutputVoltage_MatchesNgspiceMagnitude()
    {
        // physics-sources.md §9.2 circuit A at 1 MHz: |V_L| = 0.49927427 V for a 1 V source.
        Assert.Equal(0.49927427, CircuitA.At(1e6).OutputVoltage.Magnitude, 5e-9);
    }

    [Fact]
    public void MagnetizingInductanceAlone_Lower3DbEdge_FollowsTheClosedForm()
    {
        // physics-sources.md §9.1: with only Lm shunting RS ∥ RL′, IL = 10·log10(1 + (f_L/f)²), f_L = R_par/(2π·Lm)
        // = 39788.7358 Hz for 25 Ω and 100 µH. The 3 dB edge relative to the minimum (≈ 0 dB at the sweep's top) is
        // f_L/√(10^0.3 − 1) = 39883.3 Hz, to the ~1e-8 dB the minimum leaves.
        var circuit = Circuit(50, 50, 100e-6, 0, 0);
        var frequencies = FrequencySweep.LogSpaced(100, 1e9, 401);

        var band = BandEdges.Find(circuit, FrequencySweep.Run(circuit, frequencies));

        var fL = 25 / (2 * Math.PI * 100e-6);
        Assert.Equal(fL / Math.Sqrt(Math.Pow(10, 0.3) - 1), band.LowerCutoffHz!.Value, 1e-3);
        Assert.Equal(fL / Math.Sqrt(Math.Pow(10, 0.1) - 1), band.Lower1DbHz!.Value, 1e-3);
        Assert.Null(band.UpperCutoffHz);
    }

    [Fact]
    public void CircuitA_BandEdges_LieWhereTheLossIsOneAndThreeDbAboveTheMinimum()
    {
        var frequencies = FrequencySweep.LogSpaced(1e3, 1e9, 401);

        var band = BandEdges.Find(CircuitA, FrequencySweep.Run(CircuitA, frequencies));

        foreach (var (edge, excess) in new[] { (band.Lower1DbHz, 1.0), (band.Upper1DbHz, 1.0), (band.LowerCutoffHz, 3.0), (band.UpperCutoffHz, 3.0) })
        {
            Assert.NotNull(edge);
            Assert.Equal(band.MinimumInsertionLossDb + excess, CircuitA.At(edge.Value).InsertionLossDb, 1e-7);
        }

        // The lower edge sits near f_L = 39.79 kHz; the upper below the Llk–Cw resonance at 100.658 MHz (§9.2).
        Assert.InRange(band.LowerCutoffHz!.Value, 35e3, 45e3);
        Assert.InRange(band.UpperCutoffHz!.Value, 30e6, 100.658e6);
    }

    [Fact]
    public void LogSpaced_IncludesBothEndsAndIsGeometric()
    {
        var f = FrequencySweep.LogSpaced(1e3, 1e9, 301);

        Assert.Equal(1e3, f[0]);
        Assert.Equal(1e9, f[^1]);
        Assert.Equal(Math.Pow(10, 3 + 1.0 / 50), f[1], 1e-6);
    }

    private static EquivalentCircuit Circuit(double rs, double rl, double lm, double llk, double cw) =>
        new(rs, rl, 0, cw, llk, f => new Complex(0, 2 * Math.PI * f * lm), _ => 0);
}
