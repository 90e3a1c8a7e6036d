using CsCheck;
using Winding.Core.Geometry;
using Winding.Core.Materials;
using Winding.Core.Plans;
using Winding.Core.Quantities;
using Winding.Core.Windings;
using Winding.Core.Wire;

namespace Winding.Core.Tests.Windings;

/// <summary>
/// The wire-gauge picker checked against its rules, each recomputed here by hand rather than with the code under test.
/// The limits themselves — 4 A/mm², d ≤ 2δ, copper ≤ share × window × 0.4 — are common practice, no source. Skin depth
/// in copper at 20 °C is δ[mm] = 66.0855/√f[Hz] (physics-sources.md §4.1); copper resistance R′ = ρ20/A with
/// ρ20 = 1/58 Ω·mm²/m (IEC 60028, physics-sources.md §3.2).
/// </summary>
public sealed class WireGaugePickerTests
{
    private const double HandWindingUtilisation = 0.4; // common practice, no source (McLyman K_u ≈ 0.4, from memory)
    private const double JLimitAPerMm2 = 4; // common practice, no source
    private const double SkinRatioLimit = 2; // common practice, no source

    private static readonly MagneticMaterial Ferrite = MagneticMaterial.Create("NiZn, μi 125", 125);

    private static readonly Gen<CoreShape> Toroids =
        Gen.Select(Gen.Double[5, 60], Gen.Double[0.3, 0.8], Gen.Double[2, 30])
            .Select(CoreShape (od, ratio, h) => ToroidCore.Create(Length.FromMillimetres(od), Length.FromMillimetres(od * ratio), Length.FromMillimetres(h)));

    private static readonly Gen<CoreShape> Bobbins =
        Gen.Select(Gen.Double[5, 25], Gen.Double[2, 10], Gen.Double[3, 12], Gen.Double[0, 1])
            .Select(CoreShape (breadth, height, leg, wall) => BobbinCore.Create(
                "E", 50e-6, 50e-3, null, Length.FromMillimetres(breadth), Length.FromMillimetres(height), CentreLeg.Round(Length.FromMillimetres(leg)), Length.FromMillimetres(wall)));

    private static readonly Gen<CoreShape> TwoHoleCores =
        Gen.Select(Gen.Double[3, 15], Gen.Double[1, 5])
            .Select(CoreShape (length, hole) => TwoHoleCore.Create(
                Length.FromMillimetres(length), Length.FromMillimetres(hole), Length.FromMillimetres(2 * hole), Length.FromMillimetres(4 * hole), Length.FromMillimetres(2 * hole)));

    /// <summary>One or two spread windings; the picker works on a random one of them.</summary>
    private static readonly Gen<(TransformerPlan Plan, int Index)> Plans =
        Gen.Select(Gen.OneOf(Toroids, Bobbins, TwoHoleCores), Gen.Int[1, 300], Gen.Int[1, 300], Gen.Bool, Gen.Bool)
            .Select((shape, turnsA, turnsB, two, second) =>
            {
                var wire = WindingWire.Enamelled(Length.FromMillimetres(0.2));
                WindingSpec[] windings = two
                    ? [WindingSpec.Create("primary", turnsA, wire), WindingSpec.Create("secondary", turnsB, wire)]
                    : [WindingSpec.Create("primary", turnsA, wire)];
                return (Plan(shape, windings), two && second ? 1 : 0);
            });

    private static readonly Gen<double> Currents = Gen.Double[-2, 1.5].Select(x => Math.Pow(10, x)); // 0.01 A … 31.6 A
    private static readonly Gen<double> Frequencies = Gen.Double[Math.Log10(50), Math.Log10(30e6)].Select(x => Math.Pow(10, x));

    [Fact]
    public void Choose_1AAt50Hz_PicksTheThickestWireWhenItFitsWithRoom()
    {
        // One winding of 20 turns on a 40/20/10 mm toroid: window π·20²/4 = 314.16 mm², copper limit
        // 1 × 314.16 × 0.4 = 125.66 mm². The thickest standard wire, AWG 10 (d = 2.58819 mm, A = 5.26115 mm², ASTM B258,
        // physics-sources.md §3.1), takes 20 × 5.26115 = 105.2 mm², within it, and its 20 turns lie in one layer
        // (⌊π·(20 − d_o)/d_o⌋ = 20 for d_o ≈ 2.67 mm, physics-sources.md §11) with a wide hole left. At 50 Hz
        // δ = 9.3459 mm (§4.1), so Rac ≈ Rdc ∝ length/area: the most copper has the least loss, and the single build,
        // the thinner insulation, the shorter turns. J = 1 A / 5.26115 mm² = 0.19007 A/mm² ≤ 4.
        var plan = Plan(ToroidCore.Create(Length.FromMillimetres(40), Length.FromMillimetres(20), Length.FromMillimetres(10)), [WindingSpec.Create("primary", 20, WindingWire.Enamelled(Length.FromMillimetres(0.5)))]);

        var choices = WireGaugePicker.Choose(plan, 0, 1, 50, WireChoiceOptions.Default);

        var best = choices[0];
        Assert.Equal("awg-10-single", best.StandardId);
        Assert.Equal(1, best.Rank);
        Assert.True(best.Passes);
        Assert.Equal(FitOutcome.Fits, best.Outcome);
        Assert.Equal(1, best.Layers);
        Assert.Equal(0.19007, best.CurrentDensityAPerM2 * 1e-6, 5e-6);
        Assert.Equal(2.58819 / 9.3459, best.SkinDepthRatio, 1e-5);
        // R′(20 °C) of AWG 10 = 0.00327711 Ω/m (physics-sources.md §3.1 table, IEC 60028 ρ20).
        Assert.Equal(0.00327711, best.DcResistance20COhm / best.LengthToCutM, 5e-9);
        // Δ ≈ 0.23: Dowell's low-frequency form 1 + (5p² − 1)Δ⁴/45 (physics-sources.md §5) gives F_R − 1 ≈ 2.4·10⁻⁴.
        Assert.InRange(best.AcResistanceOhm / best.DcResistance20COhm, 1, 1.0005);
        Assert.Equal(Enumerable.Range(1, choices.Count), choices.Select(c => c.Rank));
        Assert.Equal(WireChoiceOptions.DefaultMaximumChoices, choices.Count);
    }

    [Fact]
    public void Choose_TightWire_IsListedAfterWiresThatFitAndSaysSo()
    {
        // 20 turns of 1.400 mm grade 1 (1.468 mm overall) in a 10 mm hole take two layers (18 + 2; physics-sources.md
        // §11 arc count ⌊π·(10 − 1.468)/1.468⌋ = 18) and leave 10 − 4·1.468 = 4.13 mm, under three wire diameters:
        // tight. It has more copper (1.5394 mm², within the 31.416 mm² share: 30.79 mm²) and less loss than any wire
        // that fits with room, yet must rank after all of them.
        var plan = Plan(ToroidCore.Create(Length.FromMillimetres(20), Length.FromMillimetres(10), Length.FromMillimetres(5)), [WindingSpec.Create("primary", 20, WindingWire.Enamelled(Length.FromMillimetres(0.5)))]);

        var choices = WireGaugePicker.Choose(plan, 0, 1, 50, WireChoiceOptions.Create(maximumChoices: 500));

        var tight = Assert.Single(choices, c => c.StandardId == "metric-1-400-g1");
        Assert.Equal(FitOutcome.Tight, tight.Outcome);
        Assert.Equal([18, 2], tight.Fit.TurnsPerLayer);
        Assert.True(tight.Passes);
        Assert.Contains(tight.Reasons, r => r.StartsWith("Tight:", StringComparison.Ordinal));
        Assert.Equal(FitOutcome.Fits, choices[0].Outcome);
        Assert.True(tight.CopperLossW < choices[0].CopperLossW);
        Assert.All(choices.Where(c => c.Passes && c.Outcome == FitOutcome.Fits), c => Assert.True(c.Rank < tight.Rank));
    }

    [Fact]
    public void Choose_WindingThatNoStandardWireCanHold_GivesAnEmptyListAndSaysWhy()
    {
        // A 4/2/2 mm toroid cannot take 100 000 turns of even the thinnest standard wire (0.020 mm, 0.024 mm overall:
        // its hole of 2 mm holds about π·2²/4 / 0.024² ≈ 5 500 wire sections at most).
        var plan = Plan(ToroidCore.Create(Length.FromMillimetres(4), Length.FromMillimetres(2), Length.FromMillimetres(2)), [WindingSpec.Create("primary", 100_000, WindingWire.Enamelled(Length.FromMillimetres(0.1)))]);

        var report = WireGaugePicker.ChooseWithReport(plan, 0, 0.01, 1e3);

        Assert.Empty(report.Choices);
        Assert.Empty(WireGaugePicker.Choose(plan, 0, 0.01, 1e3));
        Assert.Equal(0, report.AcceptedCount);
        Assert.Equal(StandardWireTable.All.Count, report.SingleWiresTried);
        Assert.Equal(report.SingleWiresTried, report.DoesNotFitCount);
        Assert.Contains("None fits", report.Summary, StringComparison.Ordinal);
    }

    [Fact]
    public void Choose_1AAt1MHz_SuggestsThinWireOrStrandsAndNoThickPassingWire()
    {
        // δ(1 MHz) = 66.0855 µm (physics-sources.md §4.1), so d ≤ 2δ = 0.132171 mm. 1 A at ≤ 4 A/mm² needs 0.25 mm²,
        // while 8 strands of at most 0.132171 mm give 8·π·0.132171²/4 = 0.1098 mm²: nothing can meet both rules.
        var plan = Plan(ToroidCore.Create(Length.FromMillimetres(20), Length.FromMillimetres(10), Length.FromMillimetres(5)), [WindingSpec.Create("primary", 10, WindingWire.Enamelled(Length.FromMillimetres(0.5)))]);
        const double limitMm = 2 * 0.0660855;

        var report = WireGaugePicker.ChooseWithReport(plan, 0, 1, 1e6);
        var choices = report.Choices;

        Assert.NotEmpty(choices);
        Assert.DoesNotContain(choices, c => c.Passes);
        Assert.DoesNotContain(choices, c => c.Passes && c.Wire.StrandDiameter.Millimetres > limitMm);
        Assert.True(choices[0].Wire.StrandDiameter.Millimetres <= limitMm, choices[0].Description);
        Assert.True(report.StrandSetsTried > 0);
        Assert.Contains(choices, c => c.StrandsInHand is >= 2 and <= 8);
        Assert.All(choices.Where(c => c.Wire.StrandDiameter.Millimetres > limitMm), c =>
            Assert.Contains(c.Reasons, r => r.StartsWith("Thicker than two skin depths at 1 MHz", StringComparison.Ordinal) && r.Contains("Litz", StringComparison.Ordinal)));
        Assert.All(choices.Where(c => c.StrandsInHand > 1), c =>
        {
            // Strands in hand have at least the copper of some standard wire above the skin-depth limit.
            Assert.True(c.Wire.StrandDiameter.Millimetres <= limitMm);
            Assert.Contains(StandardWireTable.All, w => w.ConductorDiameter.Millimetres > limitMm && w.ConductorAreaM2 <= c.CopperAreaM2 * (1 + 1e-9));
        });
    }

    [Fact]
    public void Choose_TwoWindings_EachGetsHalfTheWindowByDefault()
    {
        // Equal share: 1/2 × 78.540 mm² × 0.4 = 15.708 mm² for 20 turns → A ≤ 0.7854 mm², d ≤ 1.000 mm.
        var wire = WindingWire.Enamelled(Length.FromMillimetres(0.3));
        var plan = Plan(ToroidCore.Create(Length.FromMillimetres(20), Length.FromMillimetres(10), Length.FromMillimetres(5)), [WindingSpec.Create("primary", 20, wire), WindingSpec.Create("secondary", 20, wire)]);

        var report = WireGaugePicker.ChooseWithReport(plan, 0, 1, 50);

        Assert.Equal(15.708, report.CopperLimitM2 * 1e6, 1e-3);
        Assert.NotEmpty(report.Choices);
        Assert.All(report.Choices, c => Assert.True(c.Wire.StrandDiameter.Millimetres <= 1.0 + 1e-9, c.Description));
        Assert.True(report.OverWindowShareCount > 0);
    }

    [Fact]
    public void Choose_InvalidArguments_Throw()
    {
        var plan = Plan(ToroidCore.Create(Length.FromMillimetres(20), Length.FromMillimetres(10), Length.FromMillimetres(5)), [WindingSpec.Create("primary", 20, WindingWire.Enamelled(Length.FromMillimetres(0.5)))]);

        Assert.Throws<ArgumentOutOfRangeException>(() => WireGaugePicker.Choose(plan, 1, 1, 50));
        Assert.Throws<ArgumentOutOfRangeException>(() => WireGaugePicker.Choose(plan, -1, 1, 50));
        Assert.Throws<ArgumentOutOfRangeException>(() => WireGaugePicker.Choose(plan, 0, double.NaN, 50));
        Assert.Throws<ArgumentOutOfRangeException>(() => WireGaugePicker.Choose(plan, 0, 0, 50));
        Assert.Throws<ArgumentOutOfRangeException>(() => WireGaugePicker.Choose(plan, 0, 1, 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => WireGaugePicker.Choose(plan, 0, 1, double.PositiveInfinity));
        Assert.Throws<ArgumentOutOfRangeException>(() => WireChoiceOptions.Create(windowShare: 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => WireChoiceOptions.Create(windowShare: 1.5));
        Assert.Throws<ArgumentOutOfRangeException>(() => WireChoiceOptions.Create(maximumCurrentDensityAPerM2: double.NaN));
        Assert.Throws<ArgumentOutOfRangeException>(() => WireChoiceOptions.Create(maximumSkinDepthRatio: -1));
        Assert.Throws<ArgumentOutOfRangeException>(() => WireChoiceOptions.Create(maximumChoices: 0));
    }

    [Fact]
    public void Choose_AnyPlan_EveryPassingChoiceMeetsEveryRuleAndTheListFollowsTheRanking()
    {
        Gen.Select(Plans, Currents, Frequencies).Sample((planAndIndex, currentA, frequencyHz) =>
        {
            var (plan, index) = planAndIndex;
            var report = WireGaugePicker.ChooseWithReport(plan, index, currentA, frequencyHz);
            var choices = report.Choices;
            var turns = plan.Windings[index].Turns;
            var limitM2 = plan.Core.WoundGeometry.WindowAreaM2 / plan.Windings.Count * HandWindingUtilisation;
            var deltaMm = 66.0855 / Math.Sqrt(frequencyHz);

            Assert.True(choices.Count <= WireChoiceOptions.DefaultMaximumChoices);
            Assert.Equal(Math.Min(report.AcceptedCount, WireChoiceOptions.DefaultMaximumChoices), choices.Count);
            foreach (var c in choices)
            {
                var dMm = c.Wire.StrandDiameter.Millimetres;
                var areaMm2 = c.StrandsInHand * Math.PI * dMm * dMm / 4;
                Assert.NotEqual(FitOutcome.DoesNotFit, c.Outcome);
                Assert.True(turns * areaMm2 * 1e-6 <= limitM2 * (1 + 1e-12), "within the window share");
                Assert.InRange(c.StrandsInHand, 1, 8);
                Assert.True(double.IsFinite(c.CopperLossW) && c.AcResistanceOhm >= c.DcResistance20COhm * (1 - 1e-12));
                Assert.Equal(currentA * currentA * c.AcResistanceOhm, c.CopperLossW, c.CopperLossW * 1e-12);
                if (c.Passes)
                {
                    Assert.True(currentA / areaMm2 <= JLimitAPerMm2 * (1 + 1e-9), $"J of {c.Description}");
                    Assert.True(dMm / deltaMm <= SkinRatioLimit * (1 + 1e-5), $"d/δ of {c.Description}");
                }

                if (c.Outcome == FitOutcome.Tight)
                {
                    Assert.Contains(c.Reasons, r => r.Contains("ight", StringComparison.Ordinal));
                }
            }

            for (var i = 1; i < choices.Count; i++)
            {
                Assert.True(RankedNoLower(choices[i - 1], choices[i]), $"{choices[i - 1].Description} before {choices[i].Description}");
            }
        });
    }

    [Fact]
    public void Choose_ShuffledStandardTable_GivesTheSameList()
    {
        var table = StandardWireTable.All.ToArray();
        Gen.Select(Plans, Currents, Frequencies, Gen.Shuffle(table)).Sample((planAndIndex, currentA, frequencyHz, shuffled) =>
        {
            var (plan, index) = planAndIndex;
            var plain = WireGaugePicker.ChooseWithReport(plan, index, currentA, frequencyHz);
            var mixed = WireGaugePicker.ChooseWithReport(plan, index, currentA, frequencyHz, WireChoiceOptions.Create(candidates: shuffled));

            Assert.Equal(plain.Choices.Select(Key), mixed.Choices.Select(Key));
            Assert.Equal(plain.Summary, mixed.Summary);
        });
    }

    [Fact]
    public void Choose_LargerCurrent_NeverPicksAThinnerBestWire()
    {
        Gen.Select(Plans, Currents, Currents, Frequencies).Sample((planAndIndex, a, b, frequencyHz) =>
        {
            var (plan, index) = planAndIndex;
            var small = WireGaugePicker.Choose(plan, index, Math.Min(a, b), frequencyHz);
            var large = WireGaugePicker.Choose(plan, index, Math.Max(a, b), frequencyHz);

            Assert.Equal(small.Count == 0, large.Count == 0);
            if (small.Count > 0)
            {
                Assert.True(large[0].CopperAreaM2 >= small[0].CopperAreaM2 * (1 - 1e-12), $"{large[0].Description} after {small[0].Description}");
            }
        });
    }

    private static (string, int, int) Key(WireChoice c) => (c.StandardId, c.StrandsInHand, c.Rank);

    /// <summary>
    /// The stated ranking, written out again: every rule met; within the skin-depth limit; within the current-density
    /// limit (above it, lower density first); fits before tight; lower copper loss; fewer layers; more room left.
    /// </summary>
    private static bool RankedNoLower(WireChoice a, WireChoice b)
    {
        if (a.Passes != b.Passes)
        {
            return a.Passes;
        }

        if (a.MeetsSkinDepth != b.MeetsSkinDepth)
        {
            return a.MeetsSkinDepth;
        }

        if (a.MeetsCurrentDensity != b.MeetsCurrentDensity)
        {
            return a.MeetsCurrentDensity;
        }

        if (!a.MeetsCurrentDensity && a.CurrentDensityAPerM2 != b.CurrentDensityAPerM2)
        {
            return a.CurrentDensityAPerM2 < b.CurrentDensityAPerM2;
        }

        if (a.Outcome != b.Outcome)
        {
            return a.Outcome == FitOutcome.Fits;
        }

        if (a.CopperLossW != b.CopperLossW)
        {
            return a.CopperLossW < b.CopperLossW;
        }

        return a.Layers != b.Layers ? a.Layers < b.Layers : a.RoomLeftM >= b.RoomLeftM;
    }

    private static TransformerPlan Plan(CoreShape shape, WindingSpec[] windings) =>
        new("picker", new PlanCore(shape, 1, Ferrite), windings, null, WireLengthAllowance.Default);
}
