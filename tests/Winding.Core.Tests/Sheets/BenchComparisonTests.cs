using Winding.Core.Plans;
using Winding.Core.Sheets;
using static Winding.Core.Tests.Sheets.SheetPlans;

namespace Winding.Core.Tests.Sheets;

public sealed class BenchComparisonTests
{
    private static readonly DateOnly Day = new(2025, 3, 14);

    private static BenchSheet Sheet(TransformerPlan? plan = null)
    {
        plan ??= RfOneToThree();
        return BenchSheetBuilder.Build(plan, PlanEvaluator.Evaluate(plan), Day, 1);
    }

    private static double?[] Nothing(BenchSheet sheet) => new double?[sheet.Checks.Count];

    private static int Index(BenchSheet sheet, string id) => sheet.Checks.ToList().FindIndex(c => c.Id == id);

    [Fact]
    public void Compare_FlagsWithinBelowAboveAndNotMeasured()
    {
        var sheet = Sheet();
        var measured = Nothing(sheet);
        var l1 = Index(sheet, "w0-inductance");
        var l2 = Index(sheet, "w1-inductance");
        var r1 = Index(sheet, "w0-resistance");
        measured[l1] = sheet.Checks[l1].Expected * 1.1;
        measured[l2] = sheet.Checks[l2].Lower * 0.99;
        measured[r1] = sheet.Checks[r1].Upper * 1.01;

        var comparison = BenchComparison.Compare(sheet, measured);

        Assert.Equal(CheckVerdict.Within, comparison.Outcomes[l1].Verdict);
        Assert.Equal(0.1, comparison.Outcomes[l1].Deviation!.Value, 1e-12);
        Assert.Null(comparison.Outcomes[l1].Advice);
        Assert.Equal(CheckVerdict.Below, comparison.Outcomes[l2].Verdict);
        Assert.Equal(CheckVerdict.Above, comparison.Outcomes[r1].Verdict);
        Assert.NotNull(comparison.Outcomes[r1].Advice);
        Assert.Equal(2, comparison.OutsideCount);
        Assert.All(comparison.Outcomes.Where((_, i) => i != l1 && i != l2 && i != r1), o => Assert.Equal(CheckVerdict.NotMeasured, o.Verdict));
    }

    [Fact]
    public void Compare_LimitsThemselves_AreWithin()
    {
        var sheet = Sheet();
        var measured = Nothing(sheet);
        measured[0] = sheet.Checks[0].Lower;
        measured[1] = sheet.Checks[1].Upper;

        var comparison = BenchComparison.Compare(sheet, measured);

        Assert.Equal(CheckVerdict.Within, comparison.Outcomes[0].Verdict);
        Assert.Equal(CheckVerdict.Within, comparison.Outcomes[1].Verdict);
    }

    [Fact]
    public void Compare_WrongCountOrBadValue_IsRefused()
    {
        var sheet = Sheet();

        Assert.Throws<ArgumentException>(() => BenchComparison.Compare(sheet, new double?[sheet.Checks.Count - 1]));
        var bad = Nothing(sheet);
        bad[0] = double.NaN;
        Assert.Throws<ArgumentOutOfRangeException>(() => BenchComparison.Compare(sheet, bad));
    }

    [Fact]
    public void Suggest_Al_IsMeasuredInductanceOverTurnsSquared_FromTheWindingWithMostTurns()
    {
        // AL = L/N² (IEC 60205 definition): 500 µH on 20 turns of the 10 × 5 × 4 mm ring is 1250 nH/turn²
        // (physics-sources §12). Here the plan's windings have 10 and 30 turns: 62.4 µH on 30 turns → 69.333 nH/turn².
        var sheet = Sheet();
        var measured = Nothing(sheet);
        measured[Index(sheet, "w0-inductance")] = 6.93e-6;
        measured[Index(sheet, "w1-inductance")] = 62.4e-6;

        var al = Assert.Single(BenchComparison.Compare(sheet, measured).Suggestions, s => s.Target == UpdateTarget.CoreAl);

        Assert.Equal(62.4e-6 / 900, al.Value!.Value, 1e-18);
        Assert.Contains("winding 2", al.Reason, StringComparison.Ordinal);
        Assert.Contains("100 kHz", al.Reason, StringComparison.Ordinal);
    }

    [Fact]
    public void Suggest_Al_Table12Value()
    {
        // physics-sources §12: N = 20, measured 500 µH → AL 1250 nH/turn².
        var sheet = Sheet(Plan(Ring10x5x4, Mu125, [Spec("test winding", 20)]));
        var measured = Nothing(sheet);
        measured[Index(sheet, "w0-inductance")] = 500e-6;

        var al = Assert.Single(BenchComparison.Compare(sheet, measured).Suggestions);

        Assert.Equal(1250e-9, al.Value!.Value, 1e-15);
    }

    [Fact]
    public void Suggest_Leakage_IsTheMeasuredValue()
    {
        var sheet = Sheet();
        var measured = Nothing(sheet);
        measured[Index(sheet, "leakage")] = 0.12e-6;

        var leakage = Assert.Single(BenchComparison.Compare(sheet, measured).Suggestions);

        Assert.Equal(UpdateTarget.LeakageInductance, leakage.Target);
        Assert.Equal(0.12e-6, leakage.Value);
    }

    [Fact]
    public void Suggest_SelfCapacitance_FromTheResonanceLessTheOtherWindings()
    {
        // C = 1/((2πf)²·L): 10 MHz with 10 µH is 25.3303 pF (LC resonance); the other windings' referred share is
        // taken off so the engine then reproduces the measured resonance.
        var sheet = Sheet();
        var measured = Nothing(sheet);
        measured[Index(sheet, "w0-inductance")] = 10e-6;
        measured[Index(sheet, "srf")] = 10e6;
        var others = sheet.Checks[Index(sheet, "srf")].OtherShuntCapacitanceF!.Value;

        var c = Assert.Single(BenchComparison.Compare(sheet, measured).Suggestions, s => s.Target == UpdateTarget.SelfCapacitance);

        Assert.Equal(0, c.WindingIndex);
        Assert.Equal(25.3303e-12 - others, c.Value!.Value, 1e-16);
    }

    [Fact]
    public void Suggest_SelfCapacitance_ResonanceTooHighForTheOthers_GivesNoValue()
    {
        var sheet = Sheet();
        var measured = Nothing(sheet);
        measured[Index(sheet, "w0-inductance")] = 10e-6;
        measured[Index(sheet, "srf")] = 10e12;

        var c = Assert.Single(BenchComparison.Compare(sheet, measured).Suggestions, s => s.Target == UpdateTarget.SelfCapacitance);

        Assert.Null(c.Value);
    }
}
