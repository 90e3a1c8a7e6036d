using Winding.Core.Geometry;
using Winding.Core.Materials;
using Winding.Core.Plans;
using Winding.Core.Quantities;
using Winding.Core.Windings;
using Winding.Core.Wire;

namespace Winding.Core.Tests.Plans;

/// <summary>Parasitics from the build: how the arrangement, the wrap and measurements show in the results.</summary>
public sealed class ParasiticEstimatorTests
{
    private static readonly WindingWire Wire = WindingWire.Solid(Mm(0.45), Mm(0.5));

    // E-type bobbin: breadth 10 mm takes 20 turns per layer of 0.5 mm wire (full layers: coverage 1).
    private static readonly BobbinCore Bobbin = BobbinCore.Create("E", 52e-6, 57e-3, null, Mm(10), Mm(6), CentreLeg.Rectangular(Mm(7), Mm(7)), Length.Zero);

    [Fact]
    public void Leakage_FullBobbinLayers_IsTheOneDimensionalFormulaOfTheBuild()
    {
        // Two full layers of 20 turns, one over the other, no wrap: a = d = 0.5 mm each, c = 0; MLT the mean of both
        // layers, b_w = 10 mm. The 1-D MMF formula (McLyman; physics-sources §6.1) gives μ0·N²·MLT·(Σa/3)/b_w.
        var result = Evaluate(Bobbin, [Spec(20), Spec(20)]);

        var mlt = (28e-3 + 2 * Math.PI * 0.25e-3 + 28e-3 + 2 * Math.PI * 0.75e-3) / 2;
        var expected = 1.25663706212e-6 * 400 * mlt * (1e-3 / 3) / 10e-3;
        Assert.Equal(expected, result.Parasitics.LeakageInductanceH, expected * 1e-9);
    }

    [Fact]
    public void Wrap_LowersInterwindingCapacitanceAndRaisesLeakage()
    {
        var bare = Evaluate(Bobbin, [Spec(20), Spec(20)]);
        var wrapped = Evaluate(Bobbin, [Spec(20), Spec(20, InsulationWrap.Create("paper", Mm(0.1), 2.3))]);

        Assert.True(wrapped.Parasitics.InterwindingCapacitanceF < bare.Parasitics.InterwindingCapacitanceF);
        Assert.True(wrapped.Parasitics.LeakageInductanceH > bare.Parasitics.LeakageInductanceH);
    }

    [Fact]
    public void Sectors_LeakMoreThanOverlaidWindings()
    {
        // physics-sources §6.2 (common practice): side-by-side windings leak much more than overlaid ones.
        // 80 turns of 0.5 mm fill most of a 15 mm hole's circumference, so both windings cover their breadth.
        var ring = ToroidCore.Create(Mm(25), Mm(15), Mm(10));
        var overlaid = Evaluate(ring, [Spec(80), Spec(80)]);
        var sectored = Evaluate(ring, [Spec(80, placement: WindingPlacement.Sector(0, 170)), Spec(80, placement: WindingPlacement.Sector(190, 360))]);

        Assert.True(sectored.Parasitics.LeakageInductanceH > 3 * overlaid.Parasitics.LeakageInductanceH);
        Assert.Contains("sector", sectored.Parasitics.LeakageMethod, StringComparison.Ordinal);
    }

    [Fact]
    public void Bifilar_UsesTheTwoWireLine()
    {
        // Two-wire line L' = (μ0/π)·arcosh(D/d) with D = 0.5 mm, d = 0.45 mm (Ramo et al., from memory), times the
        // pair's length N·MLT.
        var ring = ToroidCore.Create(Mm(25), Mm(15), Mm(10));
        var result = Evaluate(ring, [Spec(10), Spec(10, placement: WindingPlacement.Bifilar(0))]);

        var perMetre = 1.25663706212e-6 / Math.PI * Math.Log(0.5 / 0.45 + Math.Sqrt(0.5 / 0.45 * (0.5 / 0.45) - 1));
        Assert.Equal(perMetre * 10 * result.Windings[0].Fit.MeanTurnLengthM, result.Parasitics.LeakageInductanceH, 1e-15);
    }

    [Fact]
    public void MeasuredValues_ReplaceTheEstimates()
    {
        var plan = Plan(Bobbin, [Spec(20), Spec(20)]) with
        {
            Measured = new MeasuredValues(null, 1.5e-6, 33e-12, [10e-12, null]),
        };

        var result = PlanEvaluator.Evaluate(plan);

        Assert.Equal(1.5e-6, result.Parasitics.LeakageInductanceH);
        Assert.Equal(33e-12, result.Parasitics.InterwindingCapacitanceF);
        Assert.Equal(10e-12, result.Parasitics.SelfCapacitancesF[0]);
        Assert.Equal(["interwindingCapacitance", "leakageInductance", "selfCapacitance[0]"], result.Parasitics.Measured.Order(StringComparer.Ordinal));
        Assert.Equal(1.5e-6, result.Response!.Circuit.LeakageInductanceH);
    }

    [Fact]
    public void SelfResonance_IsOneOverTwoPiRootLC()
    {
        var result = Evaluate(Bobbin, [Spec(60)]);

        var l = result.Windings[0].InductanceH;
        var c = result.Parasitics.SelfCapacitancesF[0];
        Assert.Equal(1 / (2 * Math.PI * Math.Sqrt(l * c)), result.Parasitics.SelfResonancesHz[0]!.Value, 1e-6);
    }

    private static PlanEvaluation Evaluate(CoreShape shape, IReadOnlyList<WindingSpec> windings) => PlanEvaluator.Evaluate(Plan(shape, windings));

    private static TransformerPlan Plan(CoreShape shape, IReadOnlyList<WindingSpec> windings) => new(
        "test",
        new PlanCore(shape, 1, MagneticMaterial.Create("test", 2000)),
        windings,
        new OperatingConditions(1e4, 1e6, 50, 50, 1),
        WireLengthAllowance.Default);

    private static WindingSpec Spec(int turns, InsulationWrap? wrap = null, WindingPlacement? placement = null) =>
        WindingSpec.Create("w", turns, Wire, placement, wrap);

    private static Length Mm(double value) => Length.FromMillimetres(value);
}
