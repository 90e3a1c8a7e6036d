using System.Globalization;
using System.Numerics;
using Winding.Core.Conductors;
using Winding.Core.Magnetics;
using Winding.Core.Response;

namespace Winding.Core.Plans;

/// <summary>
/// Builds the plan's <see cref="EquivalentCircuit"/> referred to the primary (first winding to last winding) and sweeps
/// it: magnetising branch Z_m(f) = jω·N1²·(μ0/C1)·(μ′(f) − jμ″(f)) from the material's table (IEC 60401-3 notation),
/// series resistance R1(f) + R2(f)·(N1/N2)² from each winding's Rac/Rdc at f (Dowell), leakage L_lk, C_in = the
/// primary's self-capacitance, C_out = (N2/N1)²·C_s2 + (1 − N2/N1)²·C_iw — the interwinding capacitance lumped at the
/// output by its stored energy ½·C_iw·(V1 − V2)², for windings wound in the same sense with their cold ends common
/// (Snelling 1988, from memory). With <see cref="TransformerPlan.FrequencyIndependentCore"/> the core is μi with its loss
/// as a fixed shunt resistance R_p (from μ″ at the band's geometric centre) and the resistances are fixed at that
/// centre, so the circuit is a plain linear RLC circuit. Windings between the first and the last are left out of the
/// circuit. The tolerance band re-finds the 3 dB edges at AL·(1 ± t) and capacitances × (1 ± 0.3).
/// </summary>
public static class ResponseAnalysis
{
    /// <summary>Capacitance tolerance used for the band's spread (±30 %).</summary>
    public const double CapacitanceTolerance = 0.3;

    /// <summary>Return loss below which a caution is raised, dB (10 dB ≈ SWR 1.9; common practice, no source).</summary>
    public const double ReturnLossLimitDb = 10;

    /// <summary>Grid points used to bracket the band edges of the tolerance corners.</summary>
    private const int TolerancePoints = 61;

    /// <summary>Builds and sweeps the circuit; adds the band, resonance and return-loss warnings.</summary>
    public static ResponseEvaluation Analyse(TransformerPlan plan, ParasiticsEvaluation parasitics, IReadOnlyList<WindingEvaluation> windings, List<PlanWarning> warnings)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(parasitics);
        ArgumentNullException.ThrowIfNull(windings);
        ArgumentNullException.ThrowIfNull(warnings);
        var op = plan.Operating ?? throw new ArgumentException("The plan has no operating conditions.", nameof(plan));
        var centreHz = Math.Sqrt(op.MinFrequencyHz * op.MaxFrequencyHz);
        var circuit = Build(plan, parasitics, windings, centreHz);
        var startHz = plan.Sweep.StartHz ?? op.MinFrequencyHz / 10;
        var stopHz = plan.Sweep.StopHz ?? op.MaxFrequencyHz * 10;
        var frequencies = FrequencySweep.LogSpaced(startHz, stopHz, plan.Sweep.Points);
        var sweep = FrequencySweep.Run(circuit, frequencies);
        var band = BandEdges.Find(circuit, sweep);
        var tolerance = Tolerance(circuit, startHz, stopHz, plan.Core.Material.AlTolerance);
        var elements = Elements(circuit, centreHz);
        AddWarnings(plan, op, parasitics, sweep, band, warnings);
        return new ResponseEvaluation(circuit, elements, centreHz, sweep, band, tolerance);
    }

    /// <summary>The equivalent circuit of <paramref name="plan"/> (see the class remarks).</summary>
    public static EquivalentCircuit Build(TransformerPlan plan, ParasiticsEvaluation parasitics, IReadOnlyList<WindingEvaluation> windings, double centreHz)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(parasitics);
        ArgumentNullException.ThrowIfNull(windings);
        var op = plan.Operating ?? throw new ArgumentException("The plan has no operating conditions.", nameof(plan));
        var last = plan.Windings.Count - 1;
        var n1 = plan.Windings[0].Turns;
        var ratio = (double)plan.Windings[last].Turns / n1;
        var referredLoadOhm = last > 0 ? op.LoadResistanceOhm / (ratio * ratio) : op.LoadResistanceOhm;
        var effective = plan.Core.WoundGeometry.EffectiveParameters();
        var airInductanceH = PhysicalConstants.VacuumPermeabilityHPerM * n1 * (double)n1 / effective.CoreFactorC1PerM;
        var core = plan.Core;
        var ambientC = op.AmbientTemperatureC;

        double Rdc(int i) => windings[i].DcResistanceOhm * plan.Windings[i].Wire.Metal.ResistivityOhmM(ambientC) / plan.Windings[i].Wire.Metal.Resistivity20OhmM;
        double Rac(int i, double f) => Rdc(i) * WindingAcResistance.Evaluate(plan.Windings[i].Wire, Math.Max(1, windings[i].Fit.Layers), Math.Min(f, WindingAcResistance.MaximumFrequencyHz), ambientC).RacPerRdc;
        double Series(double f) => Rac(0, f) + (last > 0 ? Rac(last, f) / (ratio * ratio) : 0);

        Func<double, Complex> magnetizing;
        Func<double, double> series;
        if (plan.FrequencyIndependentCore)
        {
            var lmH = core.InductanceFactor.InductanceH(n1);
            var (muPrime, muDoublePrime, _) = core.PermeabilityAt(centreHz);
            double? coreOhm = muDoublePrime > 0 ? WindingImpedance.Calculate(n1, effective, centreHz, muPrime, muDoublePrime).ParallelResistanceOhm : null;
            magnetizing = f =>
            {
                var jwl = new Complex(0, 2 * Math.PI * f * lmH);
                return coreOhm is { } r ? jwl * r / (jwl + r) : jwl;
            };
            var fixedSeriesOhm = Series(centreHz);
            series = _ => fixedSeriesOhm;
        }
        else
        {
            series = TabulatedSeries(Series, op);
            var permeability = core.PermeabilityFunction();
            magnetizing = f =>
            {
                var (muPrime, muDoublePrime, _) = permeability(f);
                return new Complex(0, 2 * Math.PI * f * airInductanceH) * new Complex(muPrime, -muDoublePrime);
            };
        }

        var outputF = last > 0
            ? parasitics.SelfCapacitancesF[last] * ratio * ratio + parasitics.InterwindingCapacitanceF * (1 - ratio) * (1 - ratio)
            : 0;
        return new EquivalentCircuit(op.SourceResistanceOhm, referredLoadOhm, parasitics.SelfCapacitancesF[0], outputF, parasitics.LeakageInductanceH, magnetizing, series);
    }

    /// <summary>Points per decade of the series-resistance table.</summary>
    public const int SeriesTablePointsPerDecade = 24;

    /// <summary>
    /// The series resistance tabulated on a log grid (<see cref="SeriesTablePointsPerDecade"/> points per decade from
    /// 10⁻³·f_min to 10³·f_max) and interpolated with MathNet's Akima spline on log R against log f; outside the table
    /// the exact value is computed. Rac/Rdc is smooth in log–log, so the table differs from the direct Dowell value by
    /// well under 0.1 % (<c>ResponseAnalysisTests</c>), and a sweep costs a few dozen Dowell evaluations instead of
    /// thousands.
    /// </summary>
    public static Func<double, double> TabulatedSeries(Func<double, double> exact, OperatingConditions op)
    {
        ArgumentNullException.ThrowIfNull(exact);
        ArgumentNullException.ThrowIfNull(op);
        var lo = Math.Log10(op.MinFrequencyHz) - 3;
        var hi = Math.Min(Math.Log10(op.MaxFrequencyHz) + 3, Math.Log10(WindingAcResistance.MaximumFrequencyHz));
        var count = (int)Math.Ceiling((hi - lo) * SeriesTablePointsPerDecade) + 1;
        var logF = MathNet.Numerics.Generate.LinearSpaced(count, lo, hi);
        var values = logF.Select(x => exact(Math.Pow(10, x))).ToArray();
        if (values.Any(v => !(v > 0)))
        {
            return exact;
        }

        var spline = MathNet.Numerics.Interpolation.CubicSpline.InterpolateAkimaSorted(logF, [.. values.Select(Math.Log10)]);
        return f =>
        {
            var x = Math.Log10(f);
            return x < lo || x > hi ? exact(f) : Math.Pow(10, spline.Interpolate(x));
        };
    }

    /// <summary>Element values referred to the primary, the frequency-dependent ones at <paramref name="frequencyHz"/>.</summary>
    public static IReadOnlyDictionary<string, double> Elements(EquivalentCircuit circuit, double frequencyHz)
    {
        ArgumentNullException.ThrowIfNull(circuit);
        var zm = circuit.MagnetizingImpedanceOhm(frequencyHz);
        var ym = Complex.Reciprocal(zm);
        var omega = 2 * Math.PI * frequencyHz;
        var elements = new Dictionary<string, double>(StringComparer.Ordinal)
        {
            ["RS"] = circuit.SourceResistanceOhm,
            ["LM"] = -1 / (omega * ym.Imaginary),
            ["RCORE"] = ym.Real > 0 ? 1 / ym.Real : double.PositiveInfinity,
            ["C1"] = circuit.InputCapacitanceF,
            ["RSERIES"] = circuit.SeriesResistanceOhm(frequencyHz),
            ["LLK"] = circuit.LeakageInductanceH,
            ["C2"] = circuit.OutputCapacitanceF,
            ["RL"] = circuit.LoadResistanceOhm,
        };
        if (double.IsPositiveInfinity(elements["RCORE"]))
        {
            elements.Remove("RCORE");
        }

        return elements;
    }

    private static BandTolerance Tolerance(EquivalentCircuit circuit, double startHz, double stopHz, double alTolerance)
    {
        var grid = FrequencySweep.LogSpaced(startHz, stopHz, TolerancePoints);
        var lowers = new List<double>();
        var uppers = new List<double>();
        foreach (var alFactor in new[] { 1 - alTolerance, 1 + alTolerance })
        {
            foreach (var cFactor in new[] { 1 - CapacitanceTolerance, 1 + CapacitanceTolerance })
            {
                var corner = circuit.Scaled(alFactor, cFactor);
                var band = BandEdges.Find(corner, FrequencySweep.Run(corner, grid));
                if (band.LowerCutoffHz is { } lower)
                {
                    lowers.Add(lower);
                }

                if (band.UpperCutoffHz is { } upper)
                {
                    uppers.Add(upper);
                }
            }
        }

        return new BandTolerance(
            lowers.Count > 0 ? lowers.Min() : null,
            lowers.Count > 0 ? lowers.Max() : null,
            uppers.Count > 0 ? uppers.Min() : null,
            uppers.Count > 0 ? uppers.Max() : null);
    }

    private static void AddWarnings(TransformerPlan plan, OperatingConditions op, ParasiticsEvaluation parasitics, IReadOnlyList<CircuitPoint> sweep, BandEdges band, List<PlanWarning> warnings)
    {
        if (band.LowerCutoffHz is { } lower3 && lower3 > op.MinFrequencyHz)
        {
            warnings.Add(new PlanWarning(WarningCodes.BandEdgeInsideBand, WarningSeverity.Error, "operating.minFrequencyHz",
                FrequencyText.Text($"The response is 3 dB down at {FrequencyText.Hz(lower3)}, above the band's bottom ({FrequencyText.Hz(op.MinFrequencyHz)}): more primary turns or a higher-permeability core.")));
        }
        else if (band.Lower1DbHz is { } lower1 && lower1 > op.MinFrequencyHz)
        {
            warnings.Add(new PlanWarning(WarningCodes.BandEdgeInsideBand, WarningSeverity.Caution, "operating.minFrequencyHz",
                FrequencyText.Text($"The response is 1 dB down at {FrequencyText.Hz(lower1)}, above the band's bottom ({FrequencyText.Hz(op.MinFrequencyHz)}).")));
        }

        if (band.UpperCutoffHz is { } upper3 && upper3 < op.MaxFrequencyHz)
        {
            warnings.Add(new PlanWarning(WarningCodes.BandEdgeInsideBand, WarningSeverity.Error, "operating.maxFrequencyHz",
                FrequencyText.Text($"The response is 3 dB down at {FrequencyText.Hz(upper3)}, below the band's top ({FrequencyText.Hz(op.MaxFrequencyHz)}): fewer turns, windings closer together (less leakage) or less capacitance.")));
        }
        else if (band.Upper1DbHz is { } upper1 && upper1 < op.MaxFrequencyHz)
        {
            warnings.Add(new PlanWarning(WarningCodes.BandEdgeInsideBand, WarningSeverity.Caution, "operating.maxFrequencyHz",
                FrequencyText.Text($"The response is 1 dB down at {FrequencyText.Hz(upper1)}, below the band's top ({FrequencyText.Hz(op.MaxFrequencyHz)}).")));
        }

        for (var i = 0; i < parasitics.SelfResonancesHz.Count; i++)
        {
            if (parasitics.SelfResonancesHz[i] is { } srf && srf >= op.MinFrequencyHz && srf <= op.MaxFrequencyHz)
            {
                warnings.Add(new PlanWarning(WarningCodes.SelfResonanceInBand, WarningSeverity.Caution, $"windings[{i}].turns",
                    FrequencyText.Text($"Winding '{plan.Windings[i].Name}' resonates with its own capacitance at about {FrequencyText.Hz(srf)}, inside the band. Fewer turns or a single layer raise it.")));
            }
        }

        if (parasitics.TransformerSelfResonanceHz is { } transformer && transformer >= op.MinFrequencyHz && transformer <= op.MaxFrequencyHz)
        {
            warnings.Add(new PlanWarning(WarningCodes.SelfResonanceInBand, WarningSeverity.Caution, "windings[0].turns",
                FrequencyText.Text($"The transformer seen from the primary resonates at about {FrequencyText.Hz(transformer)}, inside the band.")));
        }

        var worst = sweep.Where(p => p.FrequencyHz >= op.MinFrequencyHz && p.FrequencyHz <= op.MaxFrequencyHz).DefaultIfEmpty().MinBy(p => p.ReturnLossDb);
        if (worst.FrequencyHz > 0 && worst.ReturnLossDb < ReturnLossLimitDb)
        {
            warnings.Add(new PlanWarning(WarningCodes.PoorReturnLoss, WarningSeverity.Caution, "operating",
                FrequencyText.Text($"Return loss at the primary falls to {worst.ReturnLossDb:0.#} dB at {FrequencyText.Hz(worst.FrequencyHz)}, worse than {ReturnLossLimitDb:0} dB (SWR about 1.9): the primary does not present its source's impedance there.")));
        }
    }

}
