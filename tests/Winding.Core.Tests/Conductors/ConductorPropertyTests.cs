using CsCheck;
using Winding.Core.Conductors;
using Winding.Core.Quantities;
using Winding.Core.Wire;

namespace Winding.Core.Tests.Conductors;

/// <summary>Property tests (CsCheck) of skin depth, the isolated-wire solution, Dowell's factor and winding F_R.</summary>
public sealed class ConductorPropertyTests
{
    /// <summary>Frequencies spread over the logarithm, 1 Hz to 1 THz.</summary>
    private static readonly Gen<double> FrequenciesHz = Gen.Double[0, 12].Select(e => Math.Pow(10, e));

    private static readonly Gen<double> TemperaturesC = Gen.Double[-40, 200];

    private static readonly Gen<int> Layers = Gen.Int[1, 200];

    private static readonly Gen<WindingWire> Wires = Gen.OneOf(
        Gen.Select(Gen.Double[0.02, 3], Gen.Double[1, 1.3]).Select((d, build) => WindingWire.Solid(Length.FromMillimetres(d), Length.FromMillimetres(d * build))),
        Gen.Select(Gen.Double[0.1, 3], Gen.Double[0, 1]).Select((d, insulation) => WindingWire.HookUp(Length.FromMillimetres(d), Length.FromMillimetres(insulation))),
        Gen.Select(Gen.Int[2, 2000], Gen.Double[0.02, 0.5], Gen.Double[1.05, 1.6]).Select((n, d, packing) =>
            WindingWire.Litz(n, Length.FromMillimetres(d), Length.FromMillimetres(d * Math.Sqrt(n) * packing))))
        .SelectMany(w => Gen.Int[1, 6].Select(w.InHand));

    [Fact]
    public void SkinDepth_ScalesAsOneOverRootFrequency()
    {
        // δ = √(ρ/(π·f·μ0)) (Ramo et al., from memory): δ(k²·f) = δ(f)/k.
        Gen.Select(FrequenciesHz, Gen.Double[1, 1000], TemperaturesC).Sample((f, k, t) =>
        {
            var low = SkinDepth.Of(ConductorMaterial.Copper, f / (k * k), t).Metres;
            var high = SkinDepth.Of(ConductorMaterial.Copper, f, t).Metres;
            Assert.Equal(low / k, high, high * 1e-12);
        });
    }

    [Fact]
    public void WindingFactor_IsFiniteAndRacAtLeastRdc()
    {
        Gen.Select(Wires, Layers, FrequenciesHz, TemperaturesC).Sample((wire, p, f, t) =>
        {
            var r = WindingAcResistance.Evaluate(wire, p, f, t);
            Assert.True(double.IsFinite(r.RacPerRdc), $"{wire.Description}, p = {p}, f = {f}: {r.RacPerRdc}");
            Assert.True(r.RacPerRdc >= 1, $"{wire.Description}, p = {p}, f = {f}: {r.RacPerRdc}");
            Assert.True(r.SkinFactor >= 1 && r.ProximityFactor >= 0);
            Assert.True(double.IsFinite(r.SkinDepthRatio) && r.SkinDepthRatio > 0);
            Assert.True(r.AcResistanceOhm(0.1) >= 0.1);
        });
    }

    [Fact]
    public void WindingFactor_NeverFallsWithLayersOrFrequency()
    {
        Gen.Select(Wires, Layers, Layers, FrequenciesHz, FrequenciesHz).Sample((wire, p1, p2, f1, f2) =>
        {
            var (pLow, pHigh) = (Math.Min(p1, p2), Math.Max(p1, p2));
            var (fLow, fHigh) = (Math.Min(f1, f2), Math.Max(f1, f2));
            var baseline = WindingAcResistance.Evaluate(wire, pLow, fLow).RacPerRdc;
            var moreLayers = WindingAcResistance.Evaluate(wire, pHigh, fLow).RacPerRdc;
            var higherFrequency = WindingAcResistance.Evaluate(wire, pLow, fHigh).RacPerRdc;
            Assert.True(moreLayers >= baseline * (1 - 1e-12), $"{wire.Description}: p {pLow}→{pHigh} at {fLow} Hz: {baseline} → {moreLayers}");
            Assert.True(higherFrequency >= baseline * (1 - 1e-12), $"{wire.Description}: f {fLow}→{fHigh} Hz, p {pLow}: {baseline} → {higherFrequency}");
        });
    }

    [Fact]
    public void DowellFactor_IsFiniteAtLeastOneAndNonDecreasing()
    {
        // Δ spread over the logarithm from 1e-8 to the accepted maximum, with any layer count an int can hold.
        var deltas = Gen.Double[-8, 100].Select(e => Math.Pow(10, e));
        Gen.Select(deltas, deltas, Gen.Int[1, int.MaxValue], Gen.Int[1, int.MaxValue]).Sample((d1, d2, p1, p2) =>
        {
            var (dLow, dHigh) = (Math.Min(d1, d2), Math.Max(d1, d2));
            var (pLow, pHigh) = (Math.Min(p1, p2), Math.Max(p1, p2));
            var f = DowellFactor.Average(dLow, pLow);
            Assert.True(double.IsFinite(f) && f >= 1, $"Δ = {dLow}, p = {pLow}: {f}");
            Assert.True(double.IsFinite(DowellFactor.Average(dHigh, pHigh)));
            Assert.True(DowellFactor.Average(dHigh, pLow) >= f * (1 - 1e-12), $"Δ {dLow}→{dHigh}, p = {pLow}");
            Assert.True(DowellFactor.Average(dLow, pHigh) >= f * (1 - 1e-12), $"p {pLow}→{pHigh}, Δ = {dLow}");
            Assert.True(double.IsFinite(DowellFactor.Layer(dHigh, pHigh)));
        });
    }

    [Fact]
    public void DowellFactor_NonDecreasingInDeltaOnAFineGrid()
    {
        // A dense sweep through the oscillating region of ς1 and ς2 (0 < Δ ≤ 45) and both switches.
        foreach (var p in new[] { 1, 2, 3, 10 })
        {
            var previous = 1.0;
            for (var i = 1; i <= 45_000; i++)
            {
                var f = DowellFactor.Average(i * 1e-3, p);
                Assert.True(f >= previous * (1 - 1e-13), $"p = {p}, Δ = {i * 1e-3}: {f} < {previous}");
                previous = f;
            }
        }
    }

    [Fact]
    public void IsolatedWire_IsFiniteAndNonDecreasing()
    {
        // Any finite x ≥ 0: Rac/Rdc ≥ 1, finite; Rac/Rdc never falls as x grows (spread over the logarithm to 1e300).
        var xs = Gen.Double[-6, 300].Select(e => Math.Pow(10, e));
        Gen.Select(xs, xs).Sample((a, b) =>
        {
            var low = IsolatedWireSkinEffect.Evaluate(Math.Min(a, b));
            var high = IsolatedWireSkinEffect.Evaluate(Math.Max(a, b));
            Assert.True(double.IsFinite(low.ResistanceRatio) && low.ResistanceRatio >= 1, $"x = {low.X}: {low.ResistanceRatio}");
            Assert.True(double.IsFinite(low.InternalReactanceRatio) && low.InternalReactanceRatio >= 0, $"x = {low.X}: {low.InternalReactanceRatio}");
            Assert.True(high.ResistanceRatio >= low.ResistanceRatio * (1 - 1e-12), $"x {low.X}→{high.X}");
        });
    }

    [Fact]
    public void IsolatedWire_NonDecreasingOnAFineGrid()
    {
        // Through all three branches, 0 to 1000 in steps of 0.01.
        var previous = 1.0;
        for (var i = 0; i <= 100_000; i++)
        {
            var r = IsolatedWireSkinEffect.ResistanceRatio(i * 0.01);
            Assert.True(r >= previous, $"x = {i * 0.01}: {r} < {previous}");
            previous = r;
        }
    }
}
