using CsCheck;
using Winding.Core.Parasitics;

namespace Winding.Core.Tests.Parasitics;

/// <summary>
/// Property tests (CsCheck) of the leakage and capacitance formulas: monotone behaviour that follows from each formula's
/// published form (cited per test), physical identities, and finite results over wide input ranges.
/// </summary>
public sealed class ParasiticsPropertyTests
{
    /// <summary>Lengths spread over the logarithm, 1 µm to 1 m.</summary>
    private static readonly Gen<double> LengthsM = Gen.Double[-6, 0].Select(e => Math.Pow(10, e));

    private static readonly Gen<double> Permittivities = Gen.Double[1, 20];

    private static readonly Gen<DielectricLayer> Layers =
        Gen.Select(Gen.Double[0, 1e-3], Permittivities).Select((t, e) => new DielectricLayer(t, e));

    /// <summary>Enamel-like coatings: r_c from 10 µm to 2 mm, r_o/r_c from just above 1 to 3 (past the π/6 cell).</summary>
    private static readonly Gen<(double Rc, double Ro)> Coatings =
        Gen.Select(Gen.Double[-5, -2.7].Select(e => Math.Pow(10, e)), Gen.Double[1e-6, 2])
            .Select((rc, excess) => (rc, rc * (1 + excess)));

    [Fact]
    public void OverlaidLayersH_ScalesAsTurnsSquared_AndInterleavingNeverRaisesIt()
    {
        // L ∝ N² (McLyman 2004, from memory, physics-sources.md §6.1); (M·c + Σa/3)/M² falls as M grows.
        Gen.Select(Gen.Int[1, 10_000], LengthsM, LengthsM, LengthsM, LengthsM, Gen.Double[0, 1e-2], Gen.Int[1, 20]).Sample((n, mlt, bw, a1, a2, c, m) =>
        {
            var one = LeakageInductance.OverlaidLayersH(1, mlt, bw, a1, a2, c, m);
            var many = LeakageInductance.OverlaidLayersH(n, mlt, bw, a1, a2, c, m);
            var interleaved = LeakageInductance.OverlaidLayersH(n, mlt, bw, a1, a2, c, m + 1);
            Assert.True(double.IsFinite(many) && many > 0, $"{many}");
            Assert.Equal((double)n * n * one, many, many * 1e-12);
            Assert.True(interleaved <= many, $"M {m}→{m + 1}: {many} → {interleaved}");
        });
    }

    [Fact]
    public void OverlaidLayersH_NeverFallsWithAWiderGap()
    {
        // The gap c enters the numerator linearly (physics-sources.md §6.1).
        Gen.Select(LengthsM, LengthsM, Gen.Double[0, 1e-2], Gen.Double[0, 1e-2]).Sample((mlt, a, c1, c2) =>
        {
            var (low, high) = (Math.Min(c1, c2), Math.Max(c1, c2));
            Assert.True(LeakageInductance.OverlaidLayersH(10, mlt, 0.02, a, a, low)
                <= LeakageInductance.OverlaidLayersH(10, mlt, 0.02, a, a, high));
        });
    }

    [Fact]
    public void LayeredPlateF_AThickerOrExtraLayerNeverRaisesIt()
    {
        // C = ε0·A/Σ(t/ε) (electrostatics, physics-sources.md §7.1): each t/ε ≥ 0 only adds to the denominator.
        Gen.Select(Layers.Array[1, 6], Gen.Double[0, 1e-3], Layers, Gen.Double[1e-6, 1]).Sample((stack, extra, added, area) =>
        {
            if (stack.Sum(l => l.ThicknessM) <= 0)
            {
                return;
            }

            var c = Capacitance.LayeredPlateF(area, stack);
            var thicker = stack.ToArray();
            thicker[0] = thicker[0] with { ThicknessM = thicker[0].ThicknessM + extra };
            var withLayer = stack.Append(added).ToArray();

            Assert.True(double.IsFinite(c) && c > 0, $"{c}");
            Assert.True(Capacitance.LayeredPlateF(area, thicker) <= c * (1 + 1e-12));
            Assert.True(Capacitance.LayeredPlateF(area, withLayer) <= c * (1 + 1e-12));

            // ε_eff is a weighted harmonic mean, so it lies between the extreme ε_r of the layers that have thickness.
            var present = stack.Where(l => l.ThicknessM > 0).ToArray();
            var eff = Capacitance.EffectivePermittivity(stack);
            Assert.InRange(eff, present.Min(l => l.RelativePermittivity) * (1 - 1e-12), present.Max(l => l.RelativePermittivity) * (1 + 1e-12));
        });
    }

    [Fact]
    public void MultilayerSelfF_NeverRisesAboveTwoLayersAndFallsWithMoreLayers()
    {
        // (n − 1)/n² has derivative n(2 − n)/n⁴ ≤ 0 for n ≥ 2 (physics-sources.md §7.2): from two layers on, more layers
        // never raise C_s. The flyback value is 3/4 of the back-and-forth value (the two formulas).
        Gen.Select(Gen.Double[1e-15, 1e-6], Gen.Int[2, 100_000], Gen.Bool).Sample((cl, n, flyback) =>
        {
            var two = Capacitance.MultilayerSelfF(cl, 2, flyback);
            var c = Capacitance.MultilayerSelfF(cl, n, flyback);
            var next = Capacitance.MultilayerSelfF(cl, n + 1, flyback);
            Assert.True(double.IsFinite(c) && c > 0);
            Assert.True(c <= two * (1 + 1e-12), $"n = {n}: {c} > {two}");
            Assert.True(next <= c * (1 + 1e-12), $"n {n}→{n + 1}: {c} → {next}");
            Assert.Equal(0.75 * Capacitance.MultilayerSelfF(cl, n), Capacitance.MultilayerSelfF(cl, n, flyback: true), c * 1e-12);
        });
    }

    [Fact]
    public void TurnToTurnF_GrowsWithPermittivityAndTurnLength_AndFallsWithCoatingThickness()
    {
        // Massarini & Kazimierczuk 1997 (from memory): with u = θ*, ε_r·θ*/ln(r_o/r_c) = u/(1 − cos u), and
        // u/(1 − cos u) + cot(u/2) falls as u grows; θ* falls as ε_r grows and rises with r_o. C_tt ∝ l_t.
        Gen.Select(Coatings, Permittivities, Permittivities, Gen.Double[1e-3, 1], Gen.Double[1, 100]).Sample((coating, e1, e2, lt, k) =>
        {
            var (rc, ro) = coating;
            var (eLow, eHigh) = (Math.Min(e1, e2), Math.Max(e1, e2));
            var c = Capacitance.TurnToTurnF(rc, ro, eLow, lt);
            Assert.True(double.IsFinite(c) && c > 0, $"r_c {rc}, r_o {ro}, ε {eLow}: {c}");
            Assert.True(Capacitance.TurnToTurnF(rc, ro, eHigh, lt) >= c * (1 - 1e-12), $"ε {eLow}→{eHigh}, r_o/r_c {ro / rc}");
            Assert.Equal(k * c, Capacitance.TurnToTurnF(rc, ro, eLow, k * lt), k * c * 1e-12);
            var thicker = rc + (ro - rc) * 1.5;
            Assert.True(Capacitance.TurnToTurnF(rc, thicker, eLow, lt) <= c * (1 + 1e-12), $"r_o {ro}→{thicker}, ε {eLow}");
        });
    }

    [Fact]
    public void SingleLayerSelfF_LiesBetweenTheLimitAndTwoCtt_AndAboveTheNeighbourChain()
    {
        // The ladder value falls from 2·C_tt (N = 2) towards (1 + √3)/2·C_tt (physics-sources.md §7.3 [DERIVED]); the
        // neighbour chain C_tt/(N − 1) is at most C_tt. Both never rise with N.
        Gen.Select(Gen.Double[1e-15, 1e-9], Gen.Int[2, 100_000]).Sample((ctt, n) =>
        {
            var core = Capacitance.SingleLayerSelfF(ctt, n, conductiveCore: true);
            var chain = Capacitance.SingleLayerSelfF(ctt, n, conductiveCore: false);
            Assert.InRange(core / ctt, 1.3660254037844386 * (1 - 1e-12), 2 * (1 + 1e-12));
            Assert.True(chain <= ctt * (1 + 1e-12) && chain > 0);
            Assert.True(core > chain);
            Assert.True(Capacitance.SingleLayerSelfF(ctt, n + 1, conductiveCore: true) <= core * (1 + 1e-12));
            Assert.True(Capacitance.SingleLayerSelfF(ctt, n + 1, conductiveCore: false) <= chain);
        });
    }

    [Fact]
    public void TwoWireLine_ProductIsMu0Eps0Eps_AndInductanceGrowsWithSpacing()
    {
        // L′·C′ = μ0·ε0·ε_eff for a TEM line (physical identity); arcosh is increasing, so L′ grows with D/d.
        Gen.Select(LengthsM, Gen.Double[1e-6, 1e3], Gen.Double[1, 10], Permittivities).Sample((d, excess, k, eps) =>
        {
            var spacing = d * (1 + excess);
            var l = LeakageInductance.TwoWireLinePerMetreHPerM(spacing, d);
            var c = Capacitance.TwoWireLinePerMetreFPerM(spacing, d, eps);
            Assert.True(double.IsFinite(l) && l > 0 && double.IsFinite(c) && c > 0);
            var expected = PhysicalConstants.VacuumPermeabilityHPerM * PhysicalConstants.VacuumPermittivityFPerM * eps;
            Assert.Equal(expected, l * c, expected * 1e-12);
            Assert.True(LeakageInductance.TwoWireLinePerMetreHPerM(spacing * k, d) >= l);
        });
    }
}
