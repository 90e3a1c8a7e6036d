using System.Numerics;
using Winding.Core.Geometry;
using Winding.Core.Plans;
using Winding.Core.Sheets;
using Winding.Core.Windings;
using Winding.Core.Wire;
using static Winding.Core.Tests.Sheets.SheetPlans;

namespace Winding.Core.Tests.Sheets;

public sealed class BenchChecksTests
{
    private static readonly DateOnly Day = new(2025, 3, 14);

    private static (TransformerPlan Plan, PlanEvaluation Evaluation, BenchSheet Sheet) Sheet(TransformerPlan plan)
    {
        var evaluation = PlanEvaluator.Evaluate(plan);
        return (plan, evaluation, BenchSheetBuilder.Build(plan, evaluation, Day, 1));
    }

    [Fact]
    public void Inductance_TenTurnsOnTheRing_IsAlTimesNSquaredWithinTwentyFivePercent()
    {
        // L = AL·N² = 69.3147 nH × 10² = 6.93147 µH (physics-sources §2.2); ±25 % AL tolerance (physics-sources §2.3):
        // 5.19860 … 8.66434 µH. Constant μ and a resonance far above: the meter's 100 kHz.
        var (_, _, sheet) = Sheet(RfOneToThree());

        var check = sheet.Checks.Single(c => c.Id == "w0-inductance");

        Assert.Equal(6.93147e-6, check.Expected, 6.93147e-6 * 1e-5);
        Assert.Equal(5.19860e-6, check.Lower, 5.19860e-6 * 1e-5);
        Assert.Equal(8.66434e-6, check.Upper, 8.66434e-6 * 1e-5);
        Assert.Equal(100e3, check.FrequencyHz);
        Assert.Equal("H", check.Unit);
        Assert.Contains("100 kHz", check.Condition, StringComparison.Ordinal);
        Assert.Contains("other winding open", check.Condition, StringComparison.Ordinal);
    }

    [Fact]
    public void Inductance_MeasuredAl_UsesFivePercent()
    {
        var plan = RfOneToThree();
        plan = plan with { Core = plan.Core with { MeasuredAl = InductanceFactor.FromHenriesPerTurnSquared(70e-9) } };

        var check = Sheet(plan).Sheet.Checks.Single(c => c.Id == "w0-inductance");

        Assert.Equal(7e-6, check.Expected, 1e-15);
        Assert.Equal(7e-6 * 0.95, check.Lower, 1e-15);
        Assert.Equal(7e-6 * 1.05, check.Upper, 1e-15);
    }

    [Theory]
    // Limits / expected = (d/(d ± Δd))² × (1 ∓ 0.00393·5): Δd from IEC 60317-0-1 (from memory; 0.003 mm at 0.100 mm
    // read), α20 = 0.00393 /K for copper (IEC 60028), a room 5 K either side of 20 °C.
    [InlineData(0.5, 0.544, 0.9610332, 1.0403530)]
    [InlineData(0.2, 0.226, 0.9515882, 1.0509418)]
    public void DcResistance_LimitsComeFromDiameterToleranceAndTemperature(double conductorMm, double overallMm, double lowerFactor, double upperFactor)
    {
        var plan = Plan(Ring10x5x4, Mu125, [Spec("primary", 10, conductorMm, overallMm)]);
        var (_, evaluation, sheet) = Sheet(plan);

        var check = sheet.Checks.Single(c => c.Id == "w0-resistance");

        Assert.Equal(evaluation.Windings[0].DcResistanceOhm, check.Expected);
        Assert.Equal(lowerFactor, check.Lower / check.Expected, 1e-6);
        Assert.Equal(upperFactor, check.Upper / check.Expected, 1e-6);
        Assert.Null(check.FrequencyHz);
        Assert.Equal("Ω", check.Unit);
        Assert.Contains("IEC 60028", check.Source, StringComparison.Ordinal);
        Assert.Contains("15 … 25 °C", check.Condition, StringComparison.Ordinal);
    }

    [Fact]
    public void DcResistance_OneMetreOfHalfMillimetreCopper_IsTheIec60028Value()
    {
        // R′(20 °C) of 0.5 mm copper = 0.0878096 Ω/m (IEC 60028, physics-sources §3.2); a 1 m lead with no turns to
        // speak of: one turn, no margin, 0.5 m leads each end makes the length to cut 1 m plus one turn.
        var plan = Plan(Ring10x5x4, Mu125, [Spec("primary", 1, 0.5, 0.544)]) with { Allowance = new WireLengthAllowance(0.5, 0) };
        var (_, evaluation, sheet) = Sheet(plan);
        var lengthM = evaluation.Windings[0].WireLengthM;

        Assert.Equal(0.0878096 * lengthM, sheet.Checks.Single(c => c.Id == "w0-resistance").Expected, 0.0878096 * lengthM * 1e-5);
    }

    [Fact]
    public void Leakage_BobbinOverlaidLayers_IsTheEstimateWithinThirtyPercent()
    {
        // The 1-D MMF formula on a bobbin is stated as ±30 % (McLyman, from memory; physics-sources §6.1).
        var bobbin = BobbinCore.Create("E", 52e-6, 57e-3, null, Mm(10), Mm(6), CentreLeg.Rectangular(Mm(7), Mm(7)), Quantities.Length.Zero);
        var (_, evaluation, sheet) = Sheet(Plan(bobbin, Mu125, [Spec("primary", 20, 0.45, 0.5), Spec("secondary", 20, 0.45, 0.5)]));

        var check = sheet.Checks.Single(c => c.Id == "leakage");

        Assert.Equal(evaluation.Parasitics.LeakageInductanceH, check.Expected);
        Assert.Equal(0.7, check.Lower / check.Expected, 1e-12);
        Assert.Equal(1.3, check.Upper / check.Expected, 1e-12);
        Assert.Contains("±30 %", check.Basis, StringComparison.Ordinal);
        Assert.Contains("shorted", check.Condition, StringComparison.Ordinal);
    }

    [Fact]
    public void Leakage_Sectors_IsWithinAFactorOfThree()
    {
        // The sectored estimate states "within a factor of about 3" (no published formula; physics-sources §6.2).
        var ring = ToroidCore.Create(Mm(25), Mm(15), Mm(10));
        var sheet = Sheet(Plan(ring, Mu125, [Spec("a", 40, placement: WindingPlacement.Sector(0, 170)), Spec("b", 40, placement: WindingPlacement.Sector(190, 360))])).Sheet;

        var check = sheet.Checks.Single(c => c.Id == "leakage");

        Assert.Equal(1.0 / 3, check.Lower / check.Expected, 1e-12);
        Assert.Equal(3, check.Upper / check.Expected, 1e-12);
        Assert.Contains("a factor of 3 either way", check.Basis, StringComparison.Ordinal);
    }

    [Fact]
    public void LeakageAccuracy_AgreesWithTheMethodText()
    {
        // The accuracy the engine states in words and as factors must say the same thing.
        var ring = ToroidCore.Create(Mm(25), Mm(15), Mm(10));
        var plans = new[]
        {
            Plan(ring, Mu125, [Spec("a", 10), Spec("b", 10, placement: WindingPlacement.Bifilar(0))]),
            Plan(ring, Mu125, [Spec("a", 40, placement: WindingPlacement.Sector(0, 170)), Spec("b", 40, placement: WindingPlacement.Sector(190, 360))]),
            Plan(ring, Mu125, [Spec("a", 10), Spec("b", 20)]),
            Plan(ring, Mu125, [Spec("a", 10), Spec("b", 20)]) with { Measured = new MeasuredValues(null, 1e-6, null, []) },
        };
        foreach (var plan in plans)
        {
            var p = PlanEvaluator.Evaluate(plan).Parasitics;
            var words = p.LeakageAccuracy.UpperFactor switch
            {
                1.3 => "±30 %",
                1.1 => "±10 %",
                3 => "factor of about 3",
                2 => "factor of 2",
                _ => "unexpected",
            };
            Assert.Contains(words, p.LeakageMethod, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void TurnsRatio_IsTheOpenCircuitDividerOfTheEquivalentCircuit()
    {
        // With winding 2 open and winding 1's voltage measured at its terminals, the referred circuit leaves the series
        // R + jωL_lk into C_out: V2/V1 = n/(1 + (R + jωL)·jωC) (a voltage divider, circuit theory). Computed here from
        // the engine's element values at the band centre, as a consistency check of the sheet against the engine.
        var (plan, evaluation, sheet) = Sheet(RfOneToThree());
        var response = evaluation.Response!;
        var f = response.ElementsFrequencyHz;
        var omega = 2 * Math.PI * f;
        var zs = new Complex(response.Elements["RSERIES"], omega * response.Elements["LLK"]);
        var expected = 3.0 / (Complex.One + zs * new Complex(0, omega * response.Elements["C2"])).Magnitude;

        var check = sheet.Checks.Single(c => c.Id == "w1-ratio");

        Assert.Equal(Math.Sqrt(1.8e6 * 30e6), f, 1e-3);
        Assert.Equal(f, check.FrequencyHz);
        Assert.Equal(expected, check.Expected, expected * 1e-6);
        Assert.NotEqual(3.0, check.Expected);
        Assert.True(check.Lower <= check.Expected * 0.98 && check.Upper >= check.Expected * 1.02);
        Assert.Equal(1, check.WindingIndex);
        Assert.Equal(string.Empty, check.Unit);
        Assert.Contains("at 7.35 MHz (the band's geometric centre)", check.Condition, StringComparison.Ordinal);
        Assert.NotNull(plan.Operating);
    }

    [Fact]
    public void TurnsRatio_NoBand_IsTheTurnsRatioWithinTwoPercent()
    {
        var (_, _, sheet) = Sheet(Plan(Ring10x5x4, Mu125, [Spec("primary", 10), Spec("secondary", 30)]));

        var check = sheet.Checks.Single(c => c.Id == "w1-ratio");

        Assert.Equal(3, check.Expected);
        Assert.Equal(2.94, check.Lower, 1e-12);
        Assert.Equal(3.06, check.Upper, 1e-12);
    }

    [Fact]
    public void SelfResonance_ConstantPermeability_SpreadsByCapacitanceAndAl()
    {
        // f ∝ 1/√(L·C) (LC resonance): C ±30 % and AL ±25 % put f between f/√(1.25·1.3) = 0.784465·f and
        // f/√(0.75·0.7) = 1.380131·f. μ is constant, so no roll-off widens it.
        var (_, evaluation, sheet) = Sheet(RfOneToThree());

        var check = sheet.Checks.Single(c => c.Id == "srf");

        Assert.Equal(evaluation.Parasitics.TransformerSelfResonanceHz, check.Expected);
        Assert.Equal(0.7844645, check.Lower / check.Expected, 1e-6);
        Assert.Equal(1.3801311, check.Upper / check.Expected, 1e-6);
        Assert.Equal("Hz", check.Unit);
        var p = evaluation.Parasitics;
        Assert.Equal(p.SelfCapacitancesF[1] * 9 + p.InterwindingCapacitanceF * 4, check.OtherShuntCapacitanceF!.Value, 1e-24);
    }
}
