using Winding.Core.Geometry;
using Winding.Core.Magnetics;
using Winding.Core.Materials;
using Winding.Core.Plans;
using Winding.Core.Quantities;
using Winding.Core.Windings;
using Winding.Core.Wire;

namespace Winding.Core.Tests.Plans;

/// <summary>The whole evaluation at operating conditions against worked values from the named sources.</summary>
public sealed class OperatingAnalysisTests
{
    // A bobbin core with Ae = 10 mm² and le = 20 mm (Ve = 200 mm³) keeps the flux arithmetic plain.
    private static readonly BobbinCore Bobbin10 =
        BobbinCore.Create("other", 10e-6, 20e-3, null, Mm(20), Mm(10), CentreLeg.Round(Mm(4)), Length.Zero);

    // Illustrative Steinmetz parameters of physics-sources.md §8.3 (not a real material).
    private static readonly SteinmetzParameters Illustrative = SteinmetzParameters.Create(10, 1.4, 2.6, 1e4, 1e6, 0.01, 0.35);

    [Fact]
    public void Flux_Sine_1Vrms100kHz10TurnsAe10mm2_Is22p5079mT()
    {
        // Faraday's law, physics-sources.md §8.1 check table: B̂ = 22.5079 mT.
        var result = Evaluate(Bobbin10, Material(), 10, 10, Operating(1e5, 1e6, 1));

        Assert.Equal(22.5079e-3, result.Operating!.PeakFluxDensityT, 22.5079e-3 * 1e-5);
    }

    [Fact]
    public void Flux_Square_12V100kHz10TurnsAe10mm2_Is300mT()
    {
        // physics-sources.md §8.1: square ±12 V, 100 kHz, N = 10, Ae = 10 mm² → B̂ = 300 mT.
        var result = Evaluate(Bobbin10, Material(), 10, 10, Operating(1e5, 1e6, 12) with { Waveform = VoltageWaveform.Square });

        Assert.Equal(0.3, result.Operating!.PeakFluxDensityT, 1e-9);
    }

    [Fact]
    public void CoreLoss_Steinmetz_SineAt100kHzAnd100mT_Is251189WPerM3TimesVe()
    {
        // physics-sources.md §8.3: P_v(sine, 100 kHz, 0.1 T) = 251189 W/m³ for k = 10, α = 1.4, β = 2.6.
        // 0.1 T needs V = 0.1·√2·π·1e5·10·1e-5 = 4.442883 V; Ve = 200 mm³ → 0.0502378 W.
        var result = Evaluate(Bobbin10, Material(steinmetz: Illustrative), 10, 10, Operating(1e5, 1.1e5, 4.442883));

        Assert.Equal(0.1, result.Operating!.PeakFluxDensityT, 1e-7);
        Assert.Equal(251189 * 200e-9, result.Operating.CoreLossW!.Value, 251189 * 200e-9 * 1e-5);
        Assert.Contains("Steinmetz", result.Operating.CoreLossMethod, StringComparison.Ordinal);
    }

    [Fact]
    public void CoreLoss_SquareWave_UsesIgse()
    {
        // physics-sources.md §8.3: triangular flux with D = 0.5, B̂ = 0.1 T, 100 kHz → iGSE P_v = 234140 W/m³.
        // ±V square for B̂ = 0.1 T: V = 4·f·N·Ae·B̂ = 4 V.
        var result = Evaluate(Bobbin10, Material(steinmetz: Illustrative), 10, 10, Operating(1e5, 1.1e5, 4) with { Waveform = VoltageWaveform.Square });

        Assert.Equal(234140 * 200e-9, result.Operating!.CoreLossW!.Value, 234140 * 200e-9 * 2e-5);
        Assert.Contains("iGSE", result.Operating.CoreLossMethod, StringComparison.Ordinal);
    }

    [Fact]
    public void CoreLoss_FromMuDoublePrime_IsVSquaredOverParallelResistance()
    {
        // physics-sources.md §2.2: ring 10/5/4 mm, N = 10, μ′ = 100, μ″ = 40 at 10 MHz → R_p = 1010.40 Ω; a flat table
        // makes R_p grow with f, so the band's worst is at f_min = 10 MHz: 10 V → 100/1010.40 = 0.0989707 W.
        var table = ComplexPermeabilityCurve.Create([new(1e6, 100, 40), new(1e8, 100, 40)]);
        var material = MagneticMaterial.Create("flat", 100, table, null, null, null, null, 0.25);

        var result = Evaluate(ToroidCore.Create(Mm(10), Mm(5), Mm(4)), material, 10, 10, Operating(10e6, 30e6, 10));

        Assert.Equal(100 / 1010.40, result.Operating!.CoreLossW!.Value, 100 / 1010.40 * 1e-5);
    }

    [Fact]
    public void MagnetizingReactance_Ring10x5x4Mu125At1MHz_Is43p5517Ohm_AndTooLittle()
    {
        // physics-sources.md §2.2: X_s = 43.5517 Ω for N = 10 at 1 MHz and μ′ = 125 (L = 6.93147 µH). Against 50 Ω with
        // k = 4 that is too little (an error, being under 1 × 50 Ω); 25 turns meet it at −25 % AL (TurnsSolverTests).
        var result = Evaluate(ToroidCore.Create(Mm(10), Mm(5), Mm(4)), Material(), 10, 10, Operating(1e6, 30e6, 1));

        Assert.Equal(6.93147e-6, result.Magnetizing!.InductanceH, 6.93147e-6 * 1e-5);
        Assert.Equal(43.5517, result.Magnetizing.ReactanceOhm, 43.5517 * 1e-5);
        Assert.Equal(50, result.Magnetizing.ImpedanceSeenOhm);
        Assert.Equal(25, result.Magnetizing.PrimaryTurnsNeeded);
        Assert.Contains(result.Warnings, w => w.Code == WarningCodes.LowReactance && w.Severity == WarningSeverity.Error && w.Field == "windings[0].turns");
    }

    [Fact]
    public void AcResistance_OneLayerOf0p5mmAt100kHz_IsDowellTimesDc()
    {
        // physics-sources.md §5 worked example: d = 0.5 mm, pitch 0.544 mm, 100 kHz, p = 1 → F_R = 1.79855 (20 °C).
        var op = Operating(1e4, 1e5, 1) with { AmbientTemperatureC = 20 };
        var result = Evaluate(ToroidCore.Create(Mm(36), Mm(23), Mm(15)), Material(), 10, 10, op, WindingWire.Solid(Mm(0.5), Mm(0.544)));

        var w = result.Windings[0];
        Assert.Equal(1.79855 * w.DcResistanceOhm, w.Electrical!.AcResistanceOhm, 1.79855 * w.DcResistanceOhm * 1e-5);
        Assert.True(w.Electrical.AcResistanceOhm >= w.DcResistanceOhm);
    }

    [Fact]
    public void Currents_AreDerivedFromDriveAndLoad()
    {
        // Ideal transformer: 1:2 turns into 200 Ω with 10 V on the primary: the secondary carries 10·2/200 = 0.1 A;
        // the primary carries the reflected load current 10/50 = 0.2 A plus the magnetising current in quadrature.
        var result = Evaluate(ToroidCore.Create(Mm(36), Mm(23), Mm(15)), Material(), 10, 20, Operating(1e6, 30e6, 10) with { }, loadOhm: 200);

        var primary = result.Windings[0].Electrical!;
        var secondary = result.Windings[1].Electrical!;
        var magnetizingA = 10 / result.Magnetizing!.ReactanceOhm;
        Assert.Equal(0.1, secondary.RmsCurrentA, 1e-12);
        Assert.Equal(Math.Sqrt(0.04 + magnetizingA * magnetizingA), primary.RmsCurrentA, 1e-9);
        Assert.Equal(20, secondary.VoltageRms, 1e-12);
        Assert.False(primary.CurrentStated);
    }

    [Fact]
    public void HighVoltage_GetsTheExtraLowVoltageCaution()
    {
        // IEC 61140 voltage bands: above 50 V AC RMS is outside extra-low voltage.
        var result = Evaluate(ToroidCore.Create(Mm(61), Mm(36), Mm(13)), Material(), 40, 40, Operating(1e6, 30e6, 60), loadOhm: 5000, sourceOhm: 5000);

        Assert.Contains(result.Warnings, w => w.Code == WarningCodes.AboveExtraLowVoltage && w.Message.Contains("licensed practice", StringComparison.Ordinal));
    }

    [Fact]
    public void HotTemperature_IsAmbientPlusRise()
    {
        var result = Evaluate(Bobbin10, Material(steinmetz: Illustrative), 10, 10, Operating(1e5, 1.1e5, 4.442883) with { AmbientTemperatureC = 40 });

        Assert.True(result.Operating!.TemperatureRiseK > 0);
        Assert.Equal(40 + result.Operating.TemperatureRiseK, result.Operating.HotTemperatureC, 12);
    }

    [Fact]
    public void WideAlTolerance_IsWarned_UnlessTheAlWasMeasured()
    {
        // ±25 % is a common AL tolerance of ferrite classes (common practice, no source); a measured AL replaces it.
        var ring = ToroidCore.Create(Mm(10), Mm(5), Mm(4));
        var plan = new TransformerPlan(
            "test",
            new PlanCore(ring, 1, Material()),
            [WindingSpec.Create("primary", 10, WindingWire.Solid(Mm(0.5), Mm(0.544))), WindingSpec.Create("secondary", 10, WindingWire.Solid(Mm(0.5), Mm(0.544)))],
            Operating(1e6, 30e6, 1),
            WireLengthAllowance.Default);

        var estimated = PlanEvaluator.Evaluate(plan);
        var measured = PlanEvaluator.Evaluate(plan with { Measured = new MeasuredValues(700e-9, null, null, []) });

        Assert.Contains(estimated.Warnings, w => w.Code == WarningCodes.WideAlTolerance);
        Assert.DoesNotContain(measured.Warnings, w => w.Code == WarningCodes.WideAlTolerance);
    }

    [Fact]
    public void HighPower_SineSpeaksOfRf_SquareDriveOfASwitchingConverter()
    {
        // 40 V RMS against the 50 Ω the primary sees (2·(50 ∥ 50)) is 32 W, above the 10 W caution level (common practice,
        // no source). A sine at 1.8–30 MHz is RF; the same power as a square drive is a converter's.
        var ring = ToroidCore.Create(Mm(36), Mm(23), Mm(15));
        var sine = Evaluate(ring, Material(), 10, 10, Operating(1.8e6, 30e6, 40));
        var square = Evaluate(ring, Material(), 10, 10, Operating(1.8e6, 30e6, 40) with { Waveform = VoltageWaveform.Square });

        var rf = Assert.Single(sine.Warnings, w => w.Code == WarningCodes.HighPower);
        var switched = Assert.Single(square.Warnings, w => w.Code == WarningCodes.HighPower);
        Assert.Contains("RF burns", rf.Message, StringComparison.Ordinal);
        Assert.DoesNotContain("RF", switched.Message, StringComparison.Ordinal);
        Assert.Contains("switched", switched.Message, StringComparison.Ordinal);
    }

    private static PlanEvaluation Evaluate(CoreShape shape, MagneticMaterial material, int n1, int n2, OperatingConditions op, WindingWire? wire = null, double loadOhm = 50, double sourceOhm = 50)
    {
        wire ??= WindingWire.Solid(Mm(0.5), Mm(0.544));
        var plan = new TransformerPlan(
            "test",
            new PlanCore(shape, 1, material),
            [WindingSpec.Create("primary", n1, wire), WindingSpec.Create("secondary", n2, wire)],
            op with { LoadResistanceOhm = loadOhm, SourceResistanceOhm = sourceOhm },
            WireLengthAllowance.Default);
        return PlanEvaluator.Evaluate(plan);
    }

    private static OperatingConditions Operating(double fMin, double fMax, double volts) => new(fMin, fMax, 50, 50, volts);

    private static MagneticMaterial Material(SteinmetzParameters? steinmetz = null) =>
        MagneticMaterial.Create("test", 125, null, SaturationFluxDensity.Create(0.4, 0.3), steinmetz, null, null, 0.25);

    private static Length Mm(double value) => Length.FromMillimetres(value);
}
