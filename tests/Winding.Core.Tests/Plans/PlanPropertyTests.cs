using CsCheck;
using Winding.Core.Geometry;
using Winding.Core.Magnetics;
using Winding.Core.Materials;
using Winding.Core.Plans;
using Winding.Core.Quantities;
using Winding.Core.Windings;
using Winding.Core.Wire;

namespace Winding.Core.Tests.Plans;

/// <summary>Property tests (CsCheck) over random valid geometry, wire and turns.</summary>
public sealed class PlanPropertyTests
{
    private static readonly Gen<ToroidCore> Toroids =
        Gen.Select(Gen.Double[2, 100], Gen.Double[0.05, 0.95], Gen.Double[0.5, 50])
            .Select((od, ratio, h) => ToroidCore.Create(Length.FromMillimetres(od), Length.FromMillimetres(od * ratio), Length.FromMillimetres(h)));

    private static readonly Gen<double> WireMm = Gen.Double[0.02, 3];

    [Fact]
    public void Inductance_GrowsAsTurnsSquared()
    {
        // L = AL·N² (IEC 60050-221 definition of AL): doubling N quadruples L; one more turn never lowers L.
        Gen.Select(Toroids, Gen.Double[1, 20_000], Gen.Int[1, 50_000]).Sample((core, mu, n) =>
        {
            var al = InductanceFactor.FromPermeability(mu, core.EffectiveParameters());
            var l = al.InductanceH(n);
            Assert.Equal(4 * l, al.InductanceH(2 * n), 4 * l * 1e-12);
            Assert.True(al.InductanceH(n + 1) > l);
        });
    }

    [Fact]
    public void Stacking_MultipliesAlByTheCount()
    {
        // IEC 60205: n identical rings side by side have C1/n, so AL × n.
        Gen.Select(Toroids, Gen.Int[1, 20]).Sample((core, n) =>
        {
            var one = InductanceFactor.FromPermeability(125, core.EffectiveParameters()).HenriesPerTurnSquared;
            var stack = InductanceFactor.FromPermeability(125, core.Stacked(n).EffectiveParameters()).HenriesPerTurnSquared;
            Assert.Equal(n * one, stack, n * one * 1e-9);
        });
    }

    [Fact]
    public void EffectiveParameters_AreConsistent()
    {
        // IEC 60205: Ve = le·Ae; the effective path lies within the ring (π·ID ≤ le ≤ π·OD) and Ae does not exceed the
        // geometric section h·(OD − ID)/2 (physics-sources.md §1.2: the mean-path AL is always low).
        Toroids.Sample(core =>
        {
            var p = core.EffectiveParameters();
            Assert.Equal(p.EffectiveLengthM * p.EffectiveAreaM2, p.EffectiveVolumeM3, p.EffectiveVolumeM3 * 1e-12);
            Assert.InRange(p.EffectiveLengthM, Math.PI * core.InnerDiameter.Metres, Math.PI * core.OuterDiameter.Metres);
            Assert.True(p.EffectiveAreaM2 <= core.Height.Metres * (core.OuterDiameter.Metres - core.InnerDiameter.Metres) / 2 * (1 + 1e-12));
        });
    }

    [Fact]
    public void ThickerWire_NeverFitsMoreTurns()
    {
        Gen.Select(Toroids, WireMm, WireMm).Sample((core, a, b) =>
        {
            var thin = Math.Min(a, b);
            var thick = Math.Max(a, b);
            var many = 1_000_000;
            var thinFit = ToroidLayerFit.Fit(core, core.InnerDiameter, WindingWire.Solid(Length.FromMillimetres(thin), Length.FromMillimetres(thin)), many);
            var thickFit = ToroidLayerFit.Fit(core, core.InnerDiameter, WindingWire.Solid(Length.FromMillimetres(thick), Length.FromMillimetres(thick)), many);
            var thinFirst = thinFit.TurnsPerLayer.Count > 0 ? thinFit.TurnsPerLayer[0] : 0;
            var thickFirst = thickFit.TurnsPerLayer.Count > 0 ? thickFit.TurnsPerLayer[0] : 0;
            Assert.True(thickFirst <= thinFirst, $"first layer: {thickFirst} of {thick} mm > {thinFirst} of {thin} mm");
            Assert.True(many - thickFit.UnplacedTurns <= many - thinFit.UnplacedTurns);
        });
    }

    [Fact]
    public void Evaluate_ValidPlans_GiveFiniteResultsAndFillBelowOne()
    {
        // Each layer's turns occupy at most π/4 of their annulus (derived from the layer convention), so a winding
        // that fits has an overall-area fill of at most π/4 < 1.
        Gen.Select(Toroids, Gen.Int[1, 3], Gen.Int[1, 5_000], WireMm, Gen.Double[1, 20_000]).Sample((core, stack, turns, wireMm, mu) =>
        {
            var wire = WindingWire.Enamelled(Length.FromMillimetres(wireMm));
            var plan = new TransformerPlan(
                "property",
                new PlanCore(core, stack, MagneticMaterial.Create("test", mu)),
                [WindingSpec.Create("a", turns, wire), WindingSpec.Create("b", turns, wire)],
                null,
                WireLengthAllowance.Default);

            var result = PlanEvaluator.Evaluate(plan);

            Assert.True(double.IsFinite(result.Core.InductanceFactor.HenriesPerTurnSquared));
            foreach (var w in result.Windings)
            {
                Assert.True(double.IsFinite(w.InductanceH) && double.IsFinite(w.WireLengthM) && double.IsFinite(w.DcResistanceOhm));
                Assert.True(double.IsFinite(w.Fit.MeanTurnLengthM) && w.Fit.MeanTurnLengthM > 0);
                Assert.True(w.Fit.RemainingHoleDiameter!.Value.Metres >= 0);
                if (w.Fit.Fits)
                {
                    var overallFill = w.Turns * wire.OverallAreaM2 / result.Core.WindowAreaM2;
                    Assert.True(overallFill <= Math.PI / 4 + 1e-12, $"fill {overallFill}");
                }
            }

            Assert.Equal(result.Windings.Any(w => !w.Fit.Fits), result.Warnings.Any(x => x.Code == WarningCodes.WireDoesNotFit));
        });
    }

    private static readonly Gen<CoreShape> Shapes = Gen.OneOf(
        Toroids.Select(t => (CoreShape)t),
        Gen.Select(Gen.Double[3, 60], Gen.Double[0.1, 0.9], Gen.Double[2, 60], Gen.Double[0, 0.2])
            .Select((od, ratio, length, gap) => (CoreShape)SleeveCore.Create(Length.FromMillimetres(od), Length.FromMillimetres(od * ratio), Length.FromMillimetres(length), Length.FromMillimetres(gap))),
        Gen.Select(Gen.Double[0.5, 8], Gen.Double[1.2, 3], Gen.Double[3, 40])
            .Select((hole, spacingRatio, length) => (CoreShape)TwoHoleCore.Create(Length.FromMillimetres(length), Length.FromMillimetres(hole), Length.FromMillimetres(hole * spacingRatio), Length.FromMillimetres(hole * spacingRatio + hole * 2), Length.FromMillimetres(hole * 2))),
        Gen.Select(Gen.Double[5, 500], Gen.Double[10, 150], Gen.Double[2, 40], Gen.Double[1, 20])
            .Select((ae, le, breadth, height) => (CoreShape)BobbinCore.Create("E", ae * 1e-6, le * 1e-3, null, Length.FromMillimetres(breadth), Length.FromMillimetres(height), CentreLeg.Round(Length.FromMillimetres(Math.Sqrt(ae))), Length.Zero)));

    private static readonly Gen<MagneticMaterial> Materials = Gen.Select(Gen.Double[5, 15_000], Gen.Bool).Select((mu, tabulated) =>
        MagneticMaterial.Create(
            "property",
            mu,
            tabulated ? ComplexPermeabilityCurve.Create([new(1e4, mu, mu * 0.01), new(1e6, mu, mu * 0.05), new(1e8, mu * 0.2, mu * 0.5)]) : null,
            SaturationFluxDensity.Create(0.45, 0.35),
            SteinmetzParameters.Create(10, 1.4, 2.6, 1e4, 1e6, 0.001, 0.3),
            null,
            200,
            0.25));

    private static readonly Gen<OperatingConditions> Operating =
        Gen.Select(Gen.Double[1, 7], Gen.Double[0.1, 3], Gen.Double[0, 1000], Gen.Double[0.1, 10_000], Gen.Double[0, 1000], Gen.Int[0, 2])
            .Select((logFmin, decades, rs, rl, volts, wave) => new OperatingConditions(Math.Pow(10, logFmin), Math.Pow(10, logFmin + decades), rs, rl, volts)
            {
                Waveform = wave == 0 ? VoltageWaveform.Sine : wave == 1 ? VoltageWaveform.Square : VoltageWaveform.Pulse(0.3),
            });

    [Fact]
    public void Evaluate_EveryShapeWithOperatingConditions_IsFiniteAndRacAtLeastRdc()
    {
        // Rac ≥ Rdc (skin and proximity effect only add loss; Dowell 1966) and no NaN or infinity anywhere.
        Gen.Select(Shapes, Materials, Operating, Gen.Int[1, 400], Gen.Int[1, 400], WireMm).Sample((shape, material, op, n1, n2, wireMm) =>
        {
            var wire = WindingWire.Enamelled(Length.FromMillimetres(wireMm));
            var plan = new TransformerPlan(
                "property",
                new PlanCore(shape, 1, material),
                [WindingSpec.Create("a", n1, wire), WindingSpec.Create("b", n2, wire)],
                op,
                WireLengthAllowance.Default);

            var result = PlanEvaluator.Evaluate(plan);

            var point = result.Operating!;
            Assert.True(double.IsFinite(point.PeakFluxDensityT) && double.IsFinite(point.TemperatureRiseK) && double.IsFinite(point.CopperLossW));
            Assert.True(point.CoreLossW is null || double.IsFinite(point.CoreLossW.Value));
            Assert.True(double.IsFinite(result.Magnetizing!.ReactanceOhm) && result.Magnetizing.PrimaryTurnsNeeded >= 1);
            foreach (var w in result.Windings)
            {
                var e = w.Electrical!;
                var rdcAmbient = w.DcResistanceOhm * w.Wire.Metal.ResistivityOhmM(op.AmbientTemperatureC) / w.Wire.Metal.Resistivity20OhmM;
                Assert.True(e.AcResistanceOhm >= rdcAmbient * (1 - 1e-12), $"Rac {e.AcResistanceOhm} < Rdc {rdcAmbient}");
                Assert.True(double.IsFinite(e.CurrentDensityAPerM2) && double.IsFinite(e.CopperLossW));
                Assert.True(double.IsFinite(w.WireLengthM) && w.WireLengthM > 0);
            }
        }, iter: 300);
    }
}
