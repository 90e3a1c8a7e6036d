using CsCheck;
using Winding.Core.Geometry;
using Winding.Core.Plans;
using Winding.Core.Quantities;
using Winding.Core.Sheets;
using Winding.Core.Windings;
using static Winding.Core.Tests.Sheets.SheetPlans;

namespace Winding.Core.Tests.Sheets;

public sealed class BenchSheetBuilderTests
{
    private static readonly DateOnly Day = new(2025, 3, 14);

    [Fact]
    public void Build_PassesTitleDateAndRevision()
    {
        var plan = RfOneToThree();

        var sheet = BenchSheetBuilder.Build(plan, PlanEvaluator.Evaluate(plan), Day, 3);

        Assert.Equal("bench test", sheet.Title);
        Assert.Equal(Day, sheet.Date);
        Assert.Equal(3, sheet.Revision);
    }

    [Fact]
    public void Build_NoName_IsAnUntitledPlan()
    {
        var plan = RfOneToThree() with { Name = "  " };

        Assert.Equal("Untitled plan", BenchSheetBuilder.Build(plan, PlanEvaluator.Evaluate(plan), Day, 0).Title);
    }

    [Fact]
    public void Build_NegativeRevision_IsRefused()
    {
        var plan = RfOneToThree();

        Assert.Throws<ArgumentOutOfRangeException>(() => BenchSheetBuilder.Build(plan, PlanEvaluator.Evaluate(plan), Day, -1));
    }

    [Fact]
    public void Core_Ring10x5x4_GivesItsDimensionsAndAl()
    {
        // AL = 69.3147 nH/turn² for μi 125 on this ring (IEC 60205 ring formulas; physics-sources §2.2); a material known
        // only by μi carries the ±25 % AL tolerance of ungapped ferrite (physics-sources §2.3, common practice).
        var plan = RfOneToThree();

        var core = BenchSheetBuilder.Build(plan, PlanEvaluator.Evaluate(plan), Day, 1).Core;

        Assert.Equal("toroid", core.ShapeName);
        Assert.Equal(["outer diameter", "inner diameter", "height"], core.Dimensions.Select(d => d.Name));
        Assert.Equal([10e-3, 5e-3, 4e-3], core.Dimensions.Select(d => Math.Round(d.Metres, 9)));
        Assert.Equal(69.3147e-9, core.AlHenriesPerTurnSquared, 69.3147e-9 * 1e-5);
        Assert.Equal(0.25, core.AlTolerance);
        Assert.Equal("μi 125", core.MaterialName);
    }

    [Fact]
    public void Windings_CarryTheEnginesLengthsAndLayersAndMarks()
    {
        var plan = Plan(Ring10x5x4, Mu125, [Spec("primary", 10, taps: [3, 6]), Spec("secondary", 30, wrap: InsulationWrap.Create("polyester", Mm(0.05), 3.2))]);
        var evaluation = PlanEvaluator.Evaluate(plan);

        var rows = BenchSheetBuilder.Build(plan, evaluation, Day, 1).Windings;

        for (var i = 0; i < rows.Count; i++)
        {
            Assert.Equal(evaluation.Windings[i].WireLengthM, rows[i].LengthToCutM);
            Assert.Equal(evaluation.Windings[i].Fit.Layers, rows[i].Layers);
            Assert.Equal(plan.Windings[i].Turns, rows[i].Turns);
        }

        Assert.Equal(["1T1", "1T2"], rows[0].Taps.Select(t => t.Mark));
        Assert.Equal([3, 6], rows[0].Taps.Select(t => t.Turn));
        Assert.Equal(("1S", "1F", "2S", "2F"), (rows[0].StartMark, rows[0].FinishMark, rows[1].StartMark, rows[1].FinishMark));
        Assert.Equal("polyester", rows[1].InsulationUnder!.Name);
        Assert.Null(rows[0].InsulationUnder);
    }

    [Fact]
    public void Steps_WrapAndBifilar_AppearAsInsulateAndMarkSteps()
    {
        var plan = Plan(Ring10x5x4, Mu125, [
            Spec("driver", 8),
            Spec("gate", 8, placement: WindingPlacement.Bifilar(0)),
            Spec("sense", 4, wrap: InsulationWrap.Create("ptfe", Mm(0.1), 2.1)),
        ]);

        var steps = BenchSheetBuilder.Build(plan, PlanEvaluator.Evaluate(plan), Day, 1).Steps;

        var kinds = steps.Select(s => (s.Kind, s.WindingIndex)).ToList();
        // Both wires of the bifilar pair are cut before the pair is wound; the partner is then identified and marked.
        Assert.True(kinds.IndexOf((BuildStepKind.CutWire, 1)) < kinds.IndexOf((BuildStepKind.Wind, 0)));
        Assert.DoesNotContain((BuildStepKind.Wind, (int?)1), kinds);
        Assert.Contains((BuildStepKind.Mark, (int?)1), kinds);
        Assert.True(kinds.IndexOf((BuildStepKind.Insulate, 2)) < kinds.IndexOf((BuildStepKind.Wind, 2)));
        Assert.Contains("together with the wire of winding 2 (gate)", steps.Single(s => s is { Kind: BuildStepKind.Wind, WindingIndex: 0 }).Text, StringComparison.Ordinal);
        Assert.Equal(BuildStepKind.Check, steps[^1].Kind);
    }

    [Fact]
    public void Steps_MultilayerWinding_SaysBackAndForthAsTheCapacitanceEstimateAssumes()
    {
        var plan = Plan(Ring10x5x4, Mu125, [Spec("primary", 120)]);
        var evaluation = PlanEvaluator.Evaluate(plan);

        var wind = BenchSheetBuilder.Build(plan, evaluation, Day, 1).Steps.Single(s => s.Kind == BuildStepKind.Wind);

        Assert.True(evaluation.Windings[0].Fit.Layers > 1);
        Assert.Contains("each layer wound back over the one before", wind.Text, StringComparison.Ordinal);
        Assert.Contains(string.Join(" + ", evaluation.Windings[0].Fit.TurnsPerLayer), wind.Text, StringComparison.Ordinal);
    }

    [Fact]
    public void Cautions_HighDrive_RepeatTheEnginesSafetyWarningsThenDeferToLocalCodes()
    {
        // 100 V RMS across a 50 Ω primary at 1.8–30 MHz: above the 50 V AC extra-low-voltage band (IEC 61140) and far
        // above 10 W of RF.
        var plan = RfOneToThree(driveV: 100);
        var evaluation = PlanEvaluator.Evaluate(plan);

        var cautions = BenchSheetBuilder.Build(plan, evaluation, Day, 1).Cautions;

        Assert.Contains(cautions, c => c.Code == WarningCodes.AboveExtraLowVoltage);
        Assert.Contains(cautions, c => c.Code == WarningCodes.HighPower);
        Assert.Equal(SheetCautions.LocalCodes, cautions[^1].Code);
        Assert.Contains("local electrical codes", cautions[^1].Text, StringComparison.Ordinal);
        var engine = evaluation.Warnings.Where(w => SheetCautions.SafetyCodes.Contains(w.Code)).Select(w => w.Message);
        Assert.Equal(engine, cautions.SkipLast(1).Select(c => c.Text));
    }

    [Fact]
    public void Cautions_LowDrive_AreEmpty()
    {
        var plan = RfOneToThree(driveV: 1);

        Assert.Empty(BenchSheetBuilder.Build(plan, PlanEvaluator.Evaluate(plan), Day, 1).Cautions);
    }

    [Fact]
    public void Cautions_NoOperatingConditions_SayNothingWasChecked()
    {
        var plan = Plan(Ring10x5x4, Mu125, [Spec("primary", 10)]);

        var cautions = BenchSheetBuilder.Build(plan, PlanEvaluator.Evaluate(plan), Day, 1).Cautions;

        Assert.Equal([SheetCautions.NoOperatingConditions, SheetCautions.LocalCodes], cautions.Select(c => c.Code));
    }

    private static readonly Gen<TransformerPlan> Plans =
        Gen.Select(Gen.Double[8, 60], Gen.Double[0.3, 0.8], Gen.Double[2, 20], Gen.Int[1, 4], Gen.Int[1, 80], Gen.Double[0.1, 1.0], Gen.Bool, Gen.Int[1, 3])
            .Select((od, ratio, h, count, turns, wireMm, operating, stack) =>
            {
                var ring = ToroidCore.Create(Length.FromMillimetres(od), Length.FromMillimetres(od * ratio), Length.FromMillimetres(h));
                var windings = Enumerable.Range(0, count).Select(i => Spec($"w{i}", turns + i * 3, wireMm, wireMm * 1.08)).ToList();
                return Plan(ring, Mu125, windings, operating ? new OperatingConditions(1e6, 30e6, 50, 200, 5) : null, stack: stack);
            });

    [Fact]
    public void Property_EveryWindingOnceInOrder_StepsNumberedOneToN_LimitsBracketTheExpectedValue()
    {
        Plans.Sample(plan =>
        {
            var sheet = BenchSheetBuilder.Build(plan, PlanEvaluator.Evaluate(plan), Day, 1);

            Assert.Equal(plan.Windings.Select(w => w.Name), sheet.Windings.Select(w => w.Name));
            Assert.Equal(Enumerable.Range(1, plan.Windings.Count), sheet.Windings.Select(w => w.Number));
            Assert.Equal(Enumerable.Range(1, sheet.Steps.Count), sheet.Steps.Select(s => s.Number));
            Assert.Equal(plan.Windings.Count, sheet.Steps.Count(s => s.Kind == BuildStepKind.Wind));
            Assert.Equal(sheet.Checks.Count, sheet.Checks.Select(c => c.Id).Distinct().Count());
            foreach (var check in sheet.Checks)
            {
                Assert.True(check.Lower > 0 && check.Lower <= check.Expected && check.Expected <= check.Upper, $"{check.Id}: {check.Lower} ≤ {check.Expected} ≤ {check.Upper}");
                Assert.False(string.IsNullOrWhiteSpace(check.Condition));
                Assert.False(string.IsNullOrWhiteSpace(check.Basis));
                Assert.False(string.IsNullOrWhiteSpace(check.Source));
            }

            Assert.Equal(plan.Windings.Count, sheet.Checks.Count(c => c.Quantity == BenchQuantity.Inductance));
            Assert.Equal(plan.Windings.Count, sheet.Checks.Count(c => c.Quantity == BenchQuantity.DcResistance));
            Assert.Equal(plan.Windings.Count - 1, sheet.Checks.Count(c => c.Quantity == BenchQuantity.TurnsRatio));
        });
    }
}
