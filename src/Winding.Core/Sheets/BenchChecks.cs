using Winding.Core.Plans;
using Winding.Core.Response;

namespace Winding.Core.Sheets;

/// <summary>
/// The bench checks of a plan, each with its expected value (the engine's result for the plan) and limits:
/// <list type="bullet">
/// <item>Inductance of each winding, L = AL·N², within the AL tolerance, at a test frequency below the μ′ roll-off
/// (<see cref="TestFrequency"/>).</item>
/// <item>DC resistance of each winding's length to cut at 20 °C: the conductor diameter tolerance
/// (<see cref="ConductorTolerance"/>) through R ∝ 1/d², and the metal's temperature coefficient over a room
/// <see cref="RoomTemperatureSpanK"/> either side of 20 °C (IEC 60028 for copper).</item>
/// <item>Leakage inductance at the first winding with the last shorted, within the accuracy the estimate states
/// (<see cref="ParasiticsEvaluation.LeakageAccuracy"/>).</item>
/// <item>Turns ratio as the open-circuit voltage ratio at the band's geometric centre, from the equivalent circuit:
/// V2/V1 = n·|1/(1 + (R + jωL_lk)·jωC_out)| (the leakage and output capacitance lift the ratio towards their resonance),
/// over the leakage accuracy and capacitance ±30 %, then ±<see cref="RatioReadingTolerance"/> for the reading.</item>
/// <item>Self-resonance seen from the first winding, 1/(2π·√(L·C)), over capacitance ±30 % (±10 % when measured) and
/// the AL tolerance (f ∝ 1/√(L·C)); its upper limit is raised by 1/√(μ′ share) where μ′ has rolled off there.</item>
/// </list>
/// </summary>
public static class BenchChecks
{
    /// <summary>Reading two voltages on one instrument: ±2 % (common practice, no source).</summary>
    public const double RatioReadingTolerance = 0.02;

    /// <summary>The room the resistance is measured in may be this far from 20 °C, K.</summary>
    public const double RoomTemperatureSpanK = 5;

    /// <summary>Capacitance tolerance taken when the capacitances were measured: ±10 % (common practice, no source).</summary>
    public const double MeasuredCapacitanceTolerance = 0.1;

    /// <summary>A load resistance standing for an open winding in the equivalent circuit, Ω.</summary>
    private const double OpenOhm = 1e15;

    /// <summary>The checks of <paramref name="plan"/>, in measuring order.</summary>
    /// <param name="plan">The plan.</param>
    /// <param name="evaluation">Its evaluation.</param>
    /// <param name="alTolerance">The AL tolerance the sheet uses (<see cref="BenchSheetBuilder.AlTolerance"/>).</param>
    public static IReadOnlyList<BenchCheck> For(TransformerPlan plan, PlanEvaluation evaluation, double alTolerance)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(evaluation);
        var checks = new List<BenchCheck>();
        for (var i = 0; i < plan.Windings.Count; i++)
        {
            checks.Add(Inductance(plan, evaluation, i, alTolerance));
        }

        for (var i = 0; i < plan.Windings.Count; i++)
        {
            checks.Add(DcResistance(plan, evaluation, i));
        }

        if (plan.Windings.Count > 1)
        {
            checks.Add(Leakage(plan, evaluation));
            var inductanceHz = checks[0].FrequencyHz!.Value;
            for (var i = 1; i < plan.Windings.Count; i++)
            {
                checks.Add(Ratio(plan, evaluation, i, inductanceHz));
            }
        }

        if (evaluation.Parasitics.TransformerSelfResonanceHz is { } srf)
        {
            checks.Add(SelfResonance(plan, evaluation, srf, alTolerance));
        }

        return checks;
    }

    private static BenchCheck Inductance(TransformerPlan plan, PlanEvaluation evaluation, int i, double tolerance)
    {
        var w = evaluation.Windings[i];
        var p = evaluation.Parasitics;
        double? resonanceHz = (p.SelfResonancesHz[i], p.TransformerSelfResonanceHz) switch
        {
            ({ } a, { } b) => Math.Min(a, b),
            ({ } a, null) => a,
            (null, { } b) => b,
            _ => null,
        };
        var (f, share, clean) = TestFrequency.ForInductance(plan.Core, resonanceHz);
        var condition = SheetText.Text($"LCR meter, series inductance, at {SheetText.Hz(f)} and a low test level; every other winding open.");
        if (!clean)
        {
            condition += resonanceHz is { } f0 && f > f0 / TestFrequency.ResonanceMargin
                ? SheetText.Text($" The winding resonates at about {SheetText.Hz(f0)}, less than ten times this frequency, so the reading comes out high.")
                : SheetText.Text($" At this frequency μ′ is already {share * 100:0} % of its low-frequency value: expect the reading that much off.");
        }

        var al = evaluation.Core.InductanceFactor.HenriesPerTurnSquared;
        var muWords = Math.Abs(share - 1) < 0.0005
            ? "μ′ is at its low-frequency value"
            : SheetText.Text($"μ′ is within {Math.Abs(share - 1) * 100:0.#} % of its low-frequency value");
        var basis = SheetText.Text(
            $"L = AL·N² = {SheetText.Si(al, "H")}/turn² × {w.Turns}², with AL ±{tolerance * 100:0.#} %. At {SheetText.Hz(f)} {muWords}{(clean ? " and the frequency is at most a tenth of the self-resonance, so the meter reads the low-frequency inductance" : string.Empty)}.");
        var source = plan.Core.MeasuredAl is not null
            ? "AL·N² with the plan's measured AL, taken as ±5 % (common practice, no source); test frequency: our choice below the μ′ roll-off."
            : "AL·N² with AL from the IEC 60205 effective parameters; tolerance: the material's AL tolerance in the catalogue (±20 … 30 % is usual for ungapped ferrite, physics-sources §2.3, common practice); test frequency: our choice below the μ′ roll-off.";
        return new BenchCheck(
            SheetText.Text($"w{i}-inductance"), BenchQuantity.Inductance, i, f, condition,
            w.InductanceH, w.InductanceH * (1 - tolerance), w.InductanceH * (1 + tolerance), "H", basis, source);
    }

    private static BenchCheck DcResistance(TransformerPlan plan, PlanEvaluation evaluation, int i)
    {
        var w = evaluation.Windings[i];
        var wire = plan.Windings[i].Wire;
        var (toleranceM, toleranceSource) = ConductorTolerance.For(wire);
        var d = wire.StrandDiameter.Metres;
        var thick = Math.Pow(d / (d + toleranceM), 2);
        var thin = Math.Pow(d / Math.Max(d - toleranceM, d * 1e-3), 2);
        var alpha = wire.Metal.TemperatureCoefficient20PerK;
        var warm = alpha * RoomTemperatureSpanK;
        var r = w.DcResistanceOhm;
        var condition = "Ohmmeter, four-wire (or subtract the reading with the meter's leads shorted together), end to end over the whole piece as cut, before the leads are trimmed; room at 15 … 25 °C.";
        if (wire.Kind == Wire.WireKind.Litz)
        {
            condition += " Litz: bare and join every strand at both ends first.";
        }

        if (wire.ElementsInHand > 1)
        {
            condition += SheetText.Text($" Join the {wire.ElementsInHand} wires in hand at each end.");
        }

        var basis = SheetText.Text(
            $"ρ·ℓ/A of the length to cut ({SheetText.WholeMm(w.WireLengthM)}) at 20 °C. A conductor of {SheetText.Mm(d)} ± {SheetText.Mm(toleranceM)} puts R between {SheetText.SignedPercent(thick - 1)} and {SheetText.SignedPercent(thin - 1)} (R ∝ 1/d²); {wire.Metal.Name} changes by {alpha * 100:0.###} % per kelvin, ±{warm * 100:0.#} % over a room {RoomTemperatureSpanK:0} K either side of 20 °C. At another temperature T expect R·(1 + {alpha:0.#####}·(T − 20 °C)).");
        var metalSource = wire.Metal == Wire.ConductorMaterial.Copper
            ? "resistivity and temperature coefficient: IEC 60028 (annealed copper, 1/58 Ω·mm²/m, 0.00393 /K)"
            : wire.Metal == Wire.ConductorMaterial.Aluminium
                ? "resistivity and temperature coefficient: IEC 60889 (aluminium, 61 % IACS; from memory)"
                : "resistivity and temperature coefficient of the stated metal";
        return new BenchCheck(
            SheetText.Text($"w{i}-resistance"), BenchQuantity.DcResistance, i, null, condition,
            r, r * thick * (1 - warm), r * thin * (1 + warm), "Ω", basis, metalSource + "; diameter tolerance: " + toleranceSource + ".");
    }

    private static BenchCheck Leakage(TransformerPlan plan, PlanEvaluation evaluation)
    {
        var p = evaluation.Parasitics;
        var last = plan.Windings.Count - 1;
        var n = (double)plan.Windings[last].Turns / plan.Windings[0].Turns;
        var shortedOhm = evaluation.Windings[0].DcResistanceOhm + evaluation.Windings[last].DcResistanceOhm / (n * n);
        var (f, clean) = TestFrequency.ForLeakage(p.LeakageInductanceH, shortedOhm, p.SelfCapacitancesF[0]);
        var q = 2 * Math.PI * f * p.LeakageInductanceH / Math.Max(shortedOhm, 1e-12);
        var meter = f >= 1e6 ? "RF impedance meter (antenna analyser or VNA)" : "LCR meter";
        var condition = SheetText.Text($"{meter}, series inductance, at winding 1 with winding {last + 1} shorted by a short thick link across its leads; other windings open; at {SheetText.Hz(f)}.");
        if (!clean)
        {
            condition += SheetText.Text($" Here the leakage reactance is only {q:0.#} times the windings' resistance: read the series inductance, not the impedance.");
        }

        var accuracy = p.LeakageAccuracy;
        var basis = SheetText.Text(
            $"The engine's estimate referred to winding 1: {p.LeakageMethod}. Its stated accuracy, {AccuracyWords(accuracy)}, sets the limits. At {SheetText.Hz(f)} the leakage reactance is {q:0.#} times the resistance of the two windings.");
        return new BenchCheck(
            "leakage", BenchQuantity.LeakageInductance, null, f, condition,
            p.LeakageInductanceH, p.LeakageInductanceH * accuracy.LowerFactor, p.LeakageInductanceH * accuracy.UpperFactor, "H", basis,
            "The engine's leakage estimate and the accuracy it states (1-D MMF formula after McLyman 2004, from memory; two-wire line after Ramo, from memory; physics-sources §6); short-circuit method: physics-sources §12.");
    }

    private static BenchCheck Ratio(TransformerPlan plan, PlanEvaluation evaluation, int i, double fallbackHz)
    {
        var last = plan.Windings.Count - 1;
        var n1 = plan.Windings[0].Turns;
        var ni = plan.Windings[i].Turns;
        var n = (double)ni / n1;
        var oneTurn = 100.0 / Math.Max(n1, ni);
        var condition = "Sine from a generator into winding 1 {0}, winding {1} open (no load); read both voltages on one instrument — two scope channels or one AC voltmeter — with the F leads joined to its ground. Ratio = V{1}/V1.";
        var oneTurnWords = SheetText.Text($" One turn more or fewer on either winding moves the ratio by at least {oneTurn:0.#} %.");
        if (i == last && evaluation.Response is { } response)
        {
            var f = response.ElementsFrequencyHz;
            var open = response.Circuit with { SourceResistanceOhm = 0, LoadResistanceOhm = OpenOhm };
            var expected = OpenRatio(open, f, n);
            var accuracy = evaluation.Parasitics.LeakageAccuracy;
            var corners = new List<double> { expected };
            foreach (var leakage in new[] { accuracy.LowerFactor, accuracy.UpperFactor })
            {
                foreach (var capacitance in new[] { 1 - ResponseAnalysis.CapacitanceTolerance, 1 + ResponseAnalysis.CapacitanceTolerance })
                {
                    var corner = open.Scaled(1, capacitance) with { LeakageInductanceH = open.LeakageInductanceH * leakage };
                    corners.Add(OpenRatio(corner, f, n));
                }
            }

            var lower = corners.Min() * (1 - RatioReadingTolerance);
            var upper = corners.Max() * (1 + RatioReadingTolerance);
            var basis = SheetText.Text(
                $"From the engine's equivalent circuit with winding {i + 1} open: V{i + 1}/V1 = (N{i + 1}/N1)·|1/(1 + (R + jωL_lk)·jωC_out)|. The leakage inductance and series resistance form a divider with the output capacitance, so the open-circuit ratio is not exactly N{i + 1}/N1 = {n:G4}: at {SheetText.Hz(f)} it is {SheetText.SignedPercent(expected / n - 1)} off it. Limits: leakage {AccuracyWords(accuracy)} and capacitance ±{ResponseAnalysis.CapacitanceTolerance * 100:0} %, then ±{RatioReadingTolerance * 100:0} % for reading two voltages.") + oneTurnWords
                + (upper / lower - 1 > oneTurn / 100 ? " These limits are wider than that, so count the turns as well." : string.Empty);
            return new BenchCheck(
                SheetText.Text($"w{i}-ratio"), BenchQuantity.TurnsRatio, i, f,
                SheetText.Text($"{string.Format(System.Globalization.CultureInfo.InvariantCulture, condition, SheetText.Text($"at {SheetText.Hz(f)} (the band's geometric centre)"), i + 1)}"),
                expected, lower, upper, string.Empty, basis,
                "Equivalent circuit: McLyman 2004, Snelling 1988 (from memory; physics-sources §9); reading tolerance: common practice, no source.");
        }

        var bandHz = plan.Operating is { } op ? Math.Sqrt(op.MinFrequencyHz * op.MaxFrequencyHz) : fallbackHz;
        var where = plan.Operating is not null
            ? SheetText.Text($"at {SheetText.Hz(bandHz)} (the band's geometric centre)")
            : SheetText.Text($"at {SheetText.Hz(bandHz)} (where the inductance is measured)");
        var why = plan.Operating is not null
            ? "The equivalent circuit covers the first and the last winding only, so this ratio is the turns ratio"
            : "The plan has no band, so no equivalent circuit was built and the ratio is the turns ratio";
        return new BenchCheck(
            SheetText.Text($"w{i}-ratio"), BenchQuantity.TurnsRatio, i, bandHz,
            string.Format(System.Globalization.CultureInfo.InvariantCulture, condition, where, i + 1),
            n, n * (1 - RatioReadingTolerance), n * (1 + RatioReadingTolerance), string.Empty,
            SheetText.Text($"{why} N{i + 1}/N1 = {ni}/{n1}; ±{RatioReadingTolerance * 100:0} % for reading two voltages.") + oneTurnWords,
            "Ideal transformer (turns ratio); reading tolerance: common practice, no source.");
    }

    private static double OpenRatio(EquivalentCircuit circuit, double frequencyHz, double turnsRatio) =>
        turnsRatio * circuit.At(frequencyHz).OutputVoltage.Magnitude;

    private static BenchCheck SelfResonance(TransformerPlan plan, PlanEvaluation evaluation, double srfHz, double alTolerance)
    {
        var p = evaluation.Parasitics;
        var last = plan.Windings.Count - 1;
        var n = (double)plan.Windings[last].Turns / plan.Windings[0].Turns;
        var othersF = last > 0 ? p.SelfCapacitancesF[last] * n * n + p.InterwindingCapacitanceF * (1 - n) * (1 - n) : 0;
        var totalF = p.SelfCapacitancesF[0] + othersF;
        var measured = p.Measured.Contains("selfCapacitance[0]")
            && (last == 0 || (p.Measured.Contains($"selfCapacitance[{last}]") && p.Measured.Contains("interwindingCapacitance")));
        var cTolerance = measured ? MeasuredCapacitanceTolerance : ResponseAnalysis.CapacitanceTolerance;
        var lower = srfHz / Math.Sqrt((1 + alTolerance) * (1 + cTolerance));
        var upper = srfHz / Math.Sqrt((1 - alTolerance) * (1 - cTolerance));
        var share = TestFrequency.PermeabilityShare(plan.Core, srfHz);
        var rollOff = string.Empty;
        if (share < 1 - TestFrequency.RollOffShare && share > 0)
        {
            upper /= Math.Sqrt(share);
            rollOff = SheetText.Text($" At this frequency μ′ is {share * 100:0} % of its low-frequency value, so L is smaller there and the resonance higher: the upper limit allows for it.");
        }

        var lPrimary = evaluation.Windings[0].InductanceH;
        var basis = SheetText.Text(
            $"f = 1/(2π·√(L·C)) with L = AL·N1² = {SheetText.Si(lPrimary, "H")} and C = {SheetText.Si(totalF, "F")}: winding 1's self-capacitance{(last > 0 ? " plus the last winding's and the interwinding capacitance referred to winding 1" : string.Empty)} (the engine's estimate: {p.SelfCapacitanceMethods[0]}). C ±{cTolerance * 100:0} % and AL ±{alTolerance * 100:0.#} % give the limits (f ∝ 1/√(L·C)).{rollOff}");
        return new BenchCheck(
            "srf", BenchQuantity.SelfResonance, null, null,
            "Seen from winding 1 with every other winding open: the frequency where its impedance peaks. Feed a generator through about 10 kΩ and watch the voltage across winding 1 on a scope (or use a dip meter); keep the leads short.",
            srfHz, lower, upper, "Hz", basis,
            measured
                ? "Measured capacitances in the plan, taken as ±10 % (common practice, no source); LC resonance."
                : "Capacitance estimates: Massarini–Kazimierczuk 1997 and the energy method (from memory; physics-sources §7), ±30 % as the engine states; LC resonance.")
        {
            OtherShuntCapacitanceF = othersF,
        };
    }

    /// <summary>An accuracy in words: "±30 %" or "a factor of 3 either way".</summary>
    internal static string AccuracyWords(EstimateAccuracy accuracy)
    {
        var plusMinus = 1 - accuracy.LowerFactor;
        return Math.Abs(accuracy.UpperFactor - 1 - plusMinus) < 1e-9
            ? SheetText.Text($"±{plusMinus * 100:0} %")
            : SheetText.Text($"a factor of {accuracy.UpperFactor:0.#} either way");
    }
}
