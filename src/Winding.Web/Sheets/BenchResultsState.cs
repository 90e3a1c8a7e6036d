using System.Globalization;
using System.Text.Json;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Plans;
using Winding.Core.Sheets;
using Winding.Web.Display;
using Winding.Web.Hosting;

namespace Winding.Web.Sheets;

/// <summary>
/// The sheet page's "Bench results" panel: the measured value of each bench check as typed (engineering notation, the
/// check's unit), the comparison with the expected value and limits (<see cref="BenchComparison"/>), and the buttons that
/// keep the results — the measured values with the saved plan (its bench record), the suggested values as the plan's
/// measured values, and the measured AL in the core's catalogue entry. Everything that writes needs a saved plan shown
/// at its saved version; a demo or an unsaved form says so instead.
/// </summary>
public sealed class BenchResultsState
{
    private readonly CatalogueProvider _catalogue;
    private readonly PlanStore _plans;
    private readonly TimeProvider _time;
    private readonly SheetLoadResult _sheet;
    private readonly SheetView _view;
    private readonly Dictionary<string, string> _texts = new(StringComparer.Ordinal);
    private readonly Dictionary<string, string> _errors = new(StringComparer.Ordinal);
    private readonly Dictionary<string, double> _values = new(StringComparer.Ordinal);

    /// <summary>Creates the panel's state for a sheet that has a view.</summary>
    /// <param name="catalogue">The catalogue (for the core's entry).</param>
    /// <param name="plans">The saved plans.</param>
    /// <param name="time">The clock for the date of a measurement.</param>
    /// <param name="sheet">The loaded sheet; its view must not be null.</param>
    /// <param name="texts">Values as typed to carry over (after the sheet was built again); null to show the plan's bench record.</param>
    public BenchResultsState(CatalogueProvider catalogue, PlanStore plans, TimeProvider time, SheetLoadResult sheet, IReadOnlyDictionary<string, string>? texts = null)
    {
        ArgumentNullException.ThrowIfNull(catalogue);
        ArgumentNullException.ThrowIfNull(plans);
        ArgumentNullException.ThrowIfNull(time);
        ArgumentNullException.ThrowIfNull(sheet);
        _catalogue = catalogue;
        _plans = plans;
        _time = time;
        _sheet = sheet;
        _view = sheet.View ?? throw new ArgumentException("The sheet has no view.", nameof(sheet));
        var stored = sheet.Document?.Bench?.Values;
        foreach (var check in _view.Sheet.Checks)
        {
            var text = texts is not null
                ? texts.GetValueOrDefault(check.Id)
                : stored?.GetValueOrDefault(check.Id) is { } value ? EngineeringFormat.Editable(value, check.Unit) : null;
            if (!string.IsNullOrWhiteSpace(text))
            {
                Read(check, text);
            }
        }

        Compare();
        if (sheet.Document?.Bench is { } bench && stored is { Count: > 0 })
        {
            var unknown = stored.Keys.Where(k => _view.Sheet.Checks.All(c => c.Id != k)).ToList();
            RecordNote = Invariant($"Kept with the plan: measured{(bench.MeasuredOn is null ? string.Empty : " on " + bench.MeasuredOn)}{(bench.PlanVersion is null ? string.Empty : $" to revision {bench.PlanVersion}")}.")
                + (unknown.Count > 0 ? $" Values for checks this sheet no longer has are kept but not shown: {string.Join(", ", unknown)}." : string.Empty);
        }
    }

    /// <summary>The checks, in the sheet's order, with their formatted expected values and limits.</summary>
    public IReadOnlyList<SheetCheckLine> Checks => _view.Checks;

    /// <summary>The comparison of every check with its measured value (not measured where nothing valid is typed).</summary>
    public BenchComparison Comparison { get; private set; } = default!;

    /// <summary>True when at least one valid measured value is typed.</summary>
    public bool AnyMeasured => _values.Count > 0;

    /// <summary>True when the sheet shows a saved plan at its saved version, so results can be kept.</summary>
    public bool CanSave => _sheet.SavedId is not null;

    /// <summary>Why results cannot be kept (demo, unsaved form), or null.</summary>
    public string? NotSavedReason => CanSave ? null : _sheet.NotSavedReason ?? "Save the plan first.";

    /// <summary>Where the plan is edited and saved.</summary>
    public string PlanHref => _sheet.PlanHref;

    /// <summary>When and to which revision the stored values were measured, or null when the plan keeps none.</summary>
    public string? RecordNote { get; }

    /// <summary>The values as typed, by check id.</summary>
    public IReadOnlyDictionary<string, string> Texts => _texts;

    /// <summary>The value as typed for a check.</summary>
    public string TextFor(string checkId) => _texts.GetValueOrDefault(checkId) ?? string.Empty;

    /// <summary>Why a check's typed value is refused, or null.</summary>
    public string? ErrorFor(string checkId) => _errors.GetValueOrDefault(checkId);

    /// <summary>The comparison of one check.</summary>
    public CheckOutcome OutcomeFor(string checkId) => Comparison.Outcomes.First(o => o.Check.Id == checkId);

    /// <summary>The outcome in words, not by colour alone: "Within limits (+3.1 %)", "OUTSIDE: below the lowest (−32.0 %)".</summary>
    public string OutcomeText(string checkId)
    {
        var outcome = OutcomeFor(checkId);
        var deviation = outcome.Deviation is { } d ? " (" + Percent(d) + " from expected)" : string.Empty;
        return outcome.Verdict switch
        {
            CheckVerdict.Within => "Within limits" + deviation,
            CheckVerdict.Below => "OUTSIDE: below the lowest" + deviation,
            CheckVerdict.Above => "OUTSIDE: above the highest" + deviation,
            _ => ErrorFor(checkId) is null ? "Not measured" : "Not compared",
        };
    }

    /// <summary>The unit a check's value is typed in (H, Ω, Hz, or empty for a ratio).</summary>
    public string UnitFor(string checkId) => _view.Sheet.Checks.First(c => c.Id == checkId).Unit;

    /// <summary>The suggested updates with a value.</summary>
    public IReadOnlyList<SuggestedUpdate> Suggestions => AnyMeasured ? Comparison.Suggestions : [];

    /// <summary>The suggested AL of the wound core, H/turn², or null.</summary>
    public double? SuggestedAl => Suggestions.FirstOrDefault(s => s.Target == UpdateTarget.CoreAl)?.Value;

    /// <summary>
    /// The catalogue core whose AL the measurement gives, or null when the plan's core is typed in or its material is
    /// overridden (then the AL is not the catalogue core's).
    /// </summary>
    public string? CatalogueCoreId => _sheet.Document?.Core is { CatalogueId: { Length: > 0 } id, MaterialId: null, InitialPermeability: null }
        && _catalogue.Catalogue.CoresById.ContainsKey(id) ? id : null;

    /// <summary>True when the plan's catalogue core is built in (so updating its AL saves a user copy).</summary>
    public bool CoreIsBuiltIn => CatalogueCoreId is { } id && _catalogue.Catalogue.CoresById[id].BuiltIn;

    /// <summary>The user copy saved by <see cref="UpdateCoreAl"/>, which the plan may be switched to.</summary>
    public string? CopiedCoreId { get; private set; }

    /// <summary>Takes a measured value as typed; an empty text clears it. A bad text gets a message at its field.</summary>
    public void SetMeasured(string checkId, string? text)
    {
        var check = _view.Sheet.Checks.FirstOrDefault(c => c.Id == checkId) ?? throw new ArgumentException($"No check '{checkId}'.", nameof(checkId));
        Read(check, text);
        Compare();
    }

    private void Read(BenchCheck check, string? text)
    {
        var checkId = check.Id;
        _errors.Remove(checkId);
        _values.Remove(checkId);
        if (string.IsNullOrWhiteSpace(text))
        {
            _texts.Remove(checkId);
        }
        else
        {
            _texts[checkId] = text.Trim();
            var value = EngineeringNumber.TryParse(text, check.Unit);
            var unit = check.Unit.Length > 0 ? " in " + check.Unit : string.Empty;
            if (value is null)
            {
                _errors[checkId] = check.Unit.Length > 0
                    ? $"'{text.Trim()}' is not a number{unit}: write e.g. 4.7u or 4.7 u{check.Unit} (SI prefixes p n u m k M G)."
                    : $"'{text.Trim()}' is not a number: write the ratio as a plain number, e.g. 3.02.";
            }
            else if (!(value > 0) || value > 1e15)
            {
                _errors[checkId] = $"{text.Trim()} cannot be measured here: enter a value above zero{unit}.";
            }
            else
            {
                _values[checkId] = value.Value;
            }
        }
    }

    private void Compare() =>
        Comparison = BenchComparison.Compare(_view.Sheet, [.. _view.Sheet.Checks.Select(c => _values.TryGetValue(c.Id, out var v) ? v : (double?)null)]);

    /// <summary>Saves the measured values with the plan (its bench record) as the plan's next version.</summary>
    public BenchActionResult SaveRecord()
    {
        if (Refusal() is { } refused)
        {
            return refused;
        }

        var document = Copy(_sheet.Document!);
        document.Bench = Record();
        return SavePlan(document, "the measured values");
    }

    /// <summary>
    /// Saves the suggested values (AL of the wound core, leakage, winding 1's self-capacitance) as the plan's measured
    /// values, with the measured values as its bench record, as the plan's next version.
    /// </summary>
    public BenchActionResult KeepAsPlanValues()
    {
        if (Refusal() is { } refused)
        {
            return refused;
        }

        var usable = Suggestions.Where(s => s.Value is not null).ToList();
        if (usable.Count == 0)
        {
            return new BenchActionResult(false, "No measured value gives a plan value yet: measure an inductance, the leakage or the self-resonance.", false);
        }

        var document = Copy(_sheet.Document!);
        var measured = document.Measured ?? new PlanMeasuredDocument();
        var kept = new List<string>();
        foreach (var suggestion in usable)
        {
            var value = suggestion.Value!.Value;
            switch (suggestion.Target)
            {
                case UpdateTarget.CoreAl:
                    measured.AlNh = Round(value * 1e9);
                    kept.Add(Invariant($"AL {measured.AlNh:0.###} nH/turn²"));
                    break;
                case UpdateTarget.LeakageInductance:
                    measured.LeakageInductanceH = Round(value);
                    kept.Add("leakage " + EngineeringFormat.Format(value, "H"));
                    break;
                case UpdateTarget.SelfCapacitance:
                    var index = suggestion.WindingIndex ?? 0;
                    var list = measured.SelfCapacitanceF ?? [];
                    while (list.Count <= index)
                    {
                        list.Add(null);
                    }

                    list[index] = Round(value);
                    measured.SelfCapacitanceF = list;
                    kept.Add(Invariant($"winding {index + 1}'s self-capacitance ") + EngineeringFormat.Format(value, "F"));
                    break;
            }
        }

        document.Measured = measured;
        document.Bench = Record();
        return SavePlan(document, string.Join(", ", kept) + " as the plan's measured values");
    }

    /// <summary>
    /// Saves the measured AL (per core of the stack) in the catalogue: a user copy of a built-in core, or the next version
    /// of a user core, with the measurement as provenance.
    /// </summary>
    public BenchActionResult UpdateCoreAl()
    {
        if (Refusal() is { } refused)
        {
            return refused;
        }

        if (SuggestedAl is not { } al)
        {
            return new BenchActionResult(false, "Measure the inductance of a winding first: AL = L/N² comes from it.", false);
        }

        if (CatalogueCoreId is not { } coreId)
        {
            return new BenchActionResult(false, "The plan's core is not a catalogue core as it stands (typed in, or another material chosen): keep the AL as the plan's measured value instead.", false);
        }

        var stack = _view.Sheet.Core.StackCount;
        var source = Comparison.Outcomes
            .Where(o => o.Check.Quantity == BenchQuantity.Inductance && o.Measured is not null)
            .MaxBy(o => _view.Sheet.Windings[o.Check.WindingIndex!.Value].Turns)!;
        var row = _view.Sheet.Windings[source.Check.WindingIndex!.Value];
        var perCore = al / stack;
        var provenance = Invariant($"Measured AL {perCore * 1e9:0.###} nH/turn² per core on {Today:yyyy-MM-dd}, bench sheet of the plan '{_view.Title}' (revision {_sheet.SavedVersion}): winding {row.Number} ({row.Name}), {row.Turns} turns, ")
            + EngineeringFormat.Format(source.Measured!.Value, "H")
            + (source.Check.FrequencyHz is { } f ? " at " + EngineeringFormat.Format(f, "Hz") : string.Empty)
            + (stack > 1 ? Invariant($" on a stack of {stack} cores (AL of the stack ÷ {stack})") : string.Empty)
            + "; AL = L/N² (IEC 60205 definition).";
        var written = new CoreAlWriter(_catalogue).Write(coreId, perCore, provenance);
        CopiedCoreId = written.Copied ? written.CoreId : null;
        return new BenchActionResult(written.Succeeded, written.Message, written.Succeeded && !written.Copied);
    }

    /// <summary>Switches the plan to the user copy saved by <see cref="UpdateCoreAl"/>, as the plan's next version.</summary>
    public BenchActionResult UseCoreCopy()
    {
        if (Refusal() is { } refused)
        {
            return refused;
        }

        if (CopiedCoreId is not { } copy)
        {
            return new BenchActionResult(false, "Save a copy of the core first.", false);
        }

        var document = Copy(_sheet.Document!);
        document.Core = new PlanCoreDocument { CatalogueId = copy, Stack = document.Core?.Stack };
        document.Bench = Record();
        var saved = SavePlan(document, $"the core '{_catalogue.Catalogue.CoresById.GetValueOrDefault(copy)?.Name ?? copy}' in the plan");
        if (saved.Succeeded)
        {
            CopiedCoreId = null;
        }

        return saved;
    }

    private DateOnly Today => SheetViewBuilder.Today(_time);

    private BenchActionResult? Refusal() =>
        !CanSave ? new BenchActionResult(false, NotSavedReason!, false)
        : _errors.Count > 0 ? new BenchActionResult(false, "Correct the marked values first: " + string.Join(" ", _errors.Values), false)
        : null;

    /// <summary>The bench record of the values typed now; the stored date and revision are kept when the values are the same.</summary>
    private PlanBenchDocument? Record()
    {
        var stored = _sheet.Document?.Bench;
        var values = new Dictionary<string, double?>(StringComparer.Ordinal);
        if (stored?.Values is { } old)
        {
            // Values of checks this sheet does not show are kept.
            foreach (var (id, value) in old.Where(kv => _view.Sheet.Checks.All(c => c.Id != kv.Key)))
            {
                values[id] = value;
            }
        }

        foreach (var check in _view.Sheet.Checks)
        {
            if (_values.TryGetValue(check.Id, out var value))
            {
                values[check.Id] = value;
            }
        }

        if (values.Count == 0)
        {
            return null;
        }

        var same = stored?.Values is { } before && before.Count == values.Count && before.All(kv => values.TryGetValue(kv.Key, out var v) && v == kv.Value);
        return same
            ? stored
            : new PlanBenchDocument { MeasuredOn = Today.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture), PlanVersion = _sheet.SavedVersion, Values = values };
    }

    private BenchActionResult SavePlan(PlanDocument document, string what)
    {
        var read = PlanReader.Read(document, _catalogue.Catalogue);
        if (!read.IsValid)
        {
            return new BenchActionResult(false, "Nothing was saved: " + string.Join(" ", read.Errors.Select(e => $"{e.Field}: {e.Message}")), false);
        }

        var result = _plans.Save(_sheet.SavedId!, document, _sheet.SavedVersion);
        return result.Succeeded
            ? new BenchActionResult(true, $"Saved {what} as revision {result.Version} of the plan.", true)
            : new BenchActionResult(false, result.Message, false);
    }

    private static PlanDocument Copy(PlanDocument document) =>
        JsonSerializer.Deserialize<PlanDocument>(JsonSerializer.Serialize(document, CatalogueJson.Options), CatalogueJson.Options)!;

    private static double Round(double value) => double.Parse(value.ToString("G6", CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    private static string Percent(double fraction) =>
        (fraction >= 0 ? "+" : "−") + Math.Abs(fraction * 100).ToString("0.0", CultureInfo.InvariantCulture) + " %";

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
