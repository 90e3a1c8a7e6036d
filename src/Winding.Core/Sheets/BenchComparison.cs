namespace Winding.Core.Sheets;

/// <summary>
/// Measured versus predicted: each check of a sheet with its measured value, its deviation and whether it lies within
/// the limits, and the updates the measurements suggest:
/// <list type="bullet">
/// <item>AL = L/N² (IEC 60205 definition; physics-sources §12) from the measured inductance of the winding with the most
/// turns (the least disturbed by lead inductance), valid because the check's frequency lies below the μ′ roll-off;</item>
/// <item>the measured leakage inductance as the plan's measured override;</item>
/// <item>from the measured resonance seen from winding 1, the total shunt capacitance C = 1/((2πf)²·L) with L winding 1's
/// measured inductance (or AL·N1² when it was not measured), less the other windings' part referred to winding 1, as
/// winding 1's measured self-capacitance — so the engine then reproduces the measured resonance.</item>
/// </list>
/// </summary>
/// <param name="Outcomes">One per check, in the sheet's order.</param>
/// <param name="Suggestions">Updates suggested by the measured values.</param>
public sealed record BenchComparison(IReadOnlyList<CheckOutcome> Outcomes, IReadOnlyList<SuggestedUpdate> Suggestions)
{
    /// <summary>Measured values outside their limits.</summary>
    public int OutsideCount => Outcomes.Count(o => o.IsOutside);

    /// <summary>Compares <paramref name="sheet"/>'s checks with <paramref name="measured"/> (one entry per check, in the
    /// same order, SI units, null for not measured).</summary>
    /// <exception cref="ArgumentException">Not one measured entry per check.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A measured value that is not finite and positive.</exception>
    public static BenchComparison Compare(BenchSheet sheet, IReadOnlyList<double?> measured)
    {
        ArgumentNullException.ThrowIfNull(sheet);
        ArgumentNullException.ThrowIfNull(measured);
        if (measured.Count != sheet.Checks.Count)
        {
            throw new ArgumentException("Give one measured entry (or null) per check.", nameof(measured));
        }

        var outcomes = new List<CheckOutcome>(measured.Count);
        for (var i = 0; i < measured.Count; i++)
        {
            var check = sheet.Checks[i];
            if (measured[i] is not { } value)
            {
                outcomes.Add(new CheckOutcome(check, null, null, CheckVerdict.NotMeasured, null));
                continue;
            }

            if (!(value > 0 && double.IsFinite(value)))
            {
                throw new ArgumentOutOfRangeException(nameof(measured), value, "A measured value must be finite and positive.");
            }

            var verdict = value < check.Lower ? CheckVerdict.Below : value > check.Upper ? CheckVerdict.Above : CheckVerdict.Within;
            outcomes.Add(new CheckOutcome(check, value, value / check.Expected - 1, verdict, Advice(check.Quantity, verdict)));
        }

        return new BenchComparison(outcomes, Suggest(sheet, outcomes));
    }

    private static List<SuggestedUpdate> Suggest(BenchSheet sheet, List<CheckOutcome> outcomes)
    {
        var suggestions = new List<SuggestedUpdate>();
        var inductances = outcomes.Where(o => o.Check.Quantity == BenchQuantity.Inductance && o.Measured is not null).ToList();
        if (inductances.Count > 0)
        {
            var best = inductances.MaxBy(o => sheet.Windings[o.Check.WindingIndex!.Value].Turns)!;
            var row = sheet.Windings[best.Check.WindingIndex!.Value];
            var al = best.Measured!.Value / ((double)row.Turns * row.Turns);
            var perCore = sheet.Core.StackCount > 1
                ? SheetText.Text($" For one core of the stack of {sheet.Core.StackCount}: {SheetText.Si(al / sheet.Core.StackCount, "H")}/turn².")
                : string.Empty;
            suggestions.Add(new SuggestedUpdate(UpdateTarget.CoreAl, null, al, SheetText.Text(
                $"AL = L/N² = {SheetText.Si(best.Measured.Value, "H")} / {row.Turns}² = {SheetText.Si(al, "H")}/turn², from winding {row.Number}, the measured winding with the most turns. Measured at {SheetText.Hz(best.Check.FrequencyHz ?? 0)}, below the material's μ′ roll-off, so it is the low-frequency AL; it does not hold where μ′ has fallen.{perCore}")));
        }

        if (outcomes.FirstOrDefault(o => o.Check.Quantity == BenchQuantity.LeakageInductance && o.Measured is not null) is { } leakage)
        {
            suggestions.Add(new SuggestedUpdate(UpdateTarget.LeakageInductance, null, leakage.Measured, SheetText.Text(
                $"The measured {SheetText.Si(leakage.Measured!.Value, "H")} at winding 1 with the last winding shorted replaces the estimate.")));
        }

        if (outcomes.FirstOrDefault(o => o.Check.Quantity == BenchQuantity.SelfResonance && o.Measured is not null) is { } resonance)
        {
            var primary = outcomes.FirstOrDefault(o => o.Check.Quantity == BenchQuantity.Inductance && o.Check.WindingIndex == 0);
            var inductanceH = primary?.Measured ?? primary?.Check.Expected;
            if (inductanceH is { } l)
            {
                var omega = 2 * Math.PI * resonance.Measured!.Value;
                var totalF = 1 / (omega * omega * l);
                var othersF = resonance.Check.OtherShuntCapacitanceF ?? 0;
                var ownF = totalF - othersF;
                var which = primary!.Measured is not null ? "winding 1's measured inductance" : "winding 1's expected inductance AL·N1²";
                suggestions.Add(ownF > 0
                    ? new SuggestedUpdate(UpdateTarget.SelfCapacitance, 0, ownF, SheetText.Text(
                        $"C = 1/((2πf)²·L) = {SheetText.Si(totalF, "F")} with f = {SheetText.Hz(resonance.Measured.Value)} and L = {SheetText.Si(l, "H")} ({which}); less the {SheetText.Si(othersF, "F")} the other windings add, referred to winding 1, it leaves {SheetText.Si(ownF, "F")} as winding 1's self-capacitance."))
                    : new SuggestedUpdate(UpdateTarget.SelfCapacitance, 0, null, SheetText.Text(
                        $"The measured resonance gives C = {SheetText.Si(totalF, "F")} in all, less than the {SheetText.Si(othersF, "F")} the other windings' estimates already account for: measure again, or measure the capacitances directly.")));
            }
        }

        return suggestions;
    }

    private static string? Advice(BenchQuantity quantity, CheckVerdict verdict) => (quantity, verdict) switch
    {
        (_, CheckVerdict.Within or CheckVerdict.NotMeasured) => null,
        (BenchQuantity.Inductance, CheckVerdict.Below) => "Low: count the turns; a cracked core, a gap between stacked or split cores, or another material class lowers AL.",
        (BenchQuantity.Inductance, _) => "High: count the turns; another material class raises AL, and a test frequency near the self-resonance reads high.",
        (BenchQuantity.DcResistance, CheckVerdict.Below) => "Low: fewer turns or shorter wire than planned, thicker wire, or turns shorted together.",
        (BenchQuantity.DcResistance, _) => "High: thinner wire than planned, a poor joint or meter contact, or Litz strands not all bared.",
        (BenchQuantity.LeakageInductance, CheckVerdict.Below) => "Low: the windings couple better than estimated; use the measured value in the plan.",
        (BenchQuantity.LeakageInductance, _) => "High: a long or thin shorting link adds inductance; windings spread apart or a loose layer leak more. Use the measured value in the plan.",
        (BenchQuantity.TurnsRatio, _) => "Off: count the turns of both windings; check that no turn is shorted and that the meter reads both voltages on the same range.",
        (BenchQuantity.SelfResonance, CheckVerdict.Below) => "Low: more capacitance than estimated (turns bunched, layers crossed, long leads) or higher inductance.",
        (BenchQuantity.SelfResonance, _) => "High: less capacitance than estimated, or μ′ has fallen at this frequency.",
        _ => null,
    };
}
