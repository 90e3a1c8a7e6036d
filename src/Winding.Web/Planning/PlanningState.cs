using System.Globalization;
using Winding.Catalogue.Entries;
using Winding.Catalogue.Plans;
using Winding.Catalogue.Validation;
using Winding.Core.Plans;
using Winding.Core.Windings;
using Winding.Web.Display;
using Winding.Web.Hosting;

namespace Winding.Web.Planning;

/// <summary>
/// The planning page's view model (one per circuit): the user's inputs as typed, the field errors keyed by the plan
/// document's field paths (<c>windings[1].turns</c>), the evaluation, and wire suggestions. It builds the same
/// <see cref="PlanDocument"/> the API takes and reads it through the same <see cref="PlanReader"/>, so the page and the API
/// agree. Numbers accept SI prefixes and a decimal comma (<see cref="EngineeringNumber"/>).
/// </summary>
public sealed class PlanningState
{
    /// <summary>Most windings the page offers.</summary>
    public const int MaximumWindings = 8;

    private readonly CatalogueProvider _catalogue;
    private readonly Dictionary<string, string> _errors = new(StringComparer.Ordinal);
    private readonly List<WindingDraft> _windings = [];
    private readonly Dictionary<int, WireChoiceReport> _suggestions = [];
    private readonly PlanStore _plans;
    private PlanDocument? _loaded;

    /// <summary>Creates the state with a mid-size ring core and a primary and a secondary.</summary>
    public PlanningState(CatalogueProvider catalogue, PlanStore plans)
    {
        ArgumentNullException.ThrowIfNull(catalogue);
        ArgumentNullException.ThrowIfNull(plans);
        _catalogue = catalogue;
        _plans = plans;
        CoreId = catalogue.Catalogue.CoresById.ContainsKey(DefaultCoreId) ? DefaultCoreId : Cores.Count > 0 ? Cores[0].Id : null;
        _windings.Add(new WindingDraft { Name = "primary", Turns = "4", ConductorDiameter = "0.5" });
        _windings.Add(new WindingDraft { Name = "secondary", Turns = "8", ConductorDiameter = "0.4" });
        Recalculate();
    }

    /// <summary>The core selected when the page opens, if the catalogue has it.</summary>
    public const string DefaultCoreId = "toroid-36x23x15-nizn-125";

    /// <summary>The cores to pick from.</summary>
    public IReadOnlyList<CatalogueCore> Cores => _catalogue.Catalogue.Cores;

    /// <summary>What the user typed to narrow the core list (shape, size, material).</summary>
    public string CoreFilter { get; private set; } = string.Empty;

    /// <summary>The cores matching <see cref="CoreFilter"/>; the chosen core is always among them.</summary>
    public IReadOnlyList<CatalogueCore> FilteredCores
    {
        get
        {
            var found = CoreSearch.Filter(Cores, CoreFilter);
            return SelectedCore is { } selected && !found.Contains(selected) ? [selected, .. found] : found;
        }
    }

    /// <summary>Narrows the core list.</summary>
    public void FilterCores(string? text)
    {
        CoreFilter = text ?? string.Empty;
        Changed?.Invoke();
    }

    /// <summary>The selected catalogue core id.</summary>
    public string? CoreId { get; private set; }

    /// <summary>Whether the core is picked from the catalogue or typed on the page.</summary>
    public CoreSource CoreSource { get; private set; } = CoreSource.Catalogue;

    /// <summary>The core typed on the page (kept while a catalogue core is used, so switching back restores it).</summary>
    public CoreDraft TypedCore { get; private set; } = new();

    /// <summary>Number of identical cores stacked, as typed (empty: 1); applies to either source.</summary>
    public string Stack { get; private set; } = string.Empty;

    /// <summary>The catalogue's materials, for a typed core's material class.</summary>
    public IReadOnlyList<CatalogueMaterial> Materials => _catalogue.Catalogue.Materials;

    /// <summary>
    /// The material's words for the results: the catalogue material's name, the typed μi, or the measured AL it was
    /// taken from; null while there is no result.
    /// </summary>
    public string? CoreMaterialName => Plan is not { } plan ? null
        : CoreSource == CoreSource.Catalogue ? SelectedCore?.Material.Name ?? plan.Core.Material.Name
        : TypedCore.MaterialBasis == CoreMaterialBasis.MaterialClass && TypedCore.MaterialId is { } id && _catalogue.Catalogue.MaterialsById.TryGetValue(id, out var m) ? m.Name
        : TypedCore.MaterialBasis == CoreMaterialBasis.MeasuredAl ? "from the measured AL" + string.Create(CultureInfo.InvariantCulture, $" (μe {plan.Core.Material.InitialPermeability:0.#})")
        : plan.Core.Material.Name;

    /// <summary>The AL tolerance the results quote: ±5 % for a measured AL, else the material's (as the bench sheet).</summary>
    public double AlTolerance => Plan is { } plan ? Winding.Core.Sheets.BenchSheetBuilder.AlTolerance(plan.Core) : 0;

    /// <summary>Uses the catalogue core or the typed core.</summary>
    public void UseCoreSource(CoreSource source)
    {
        CoreSource = source;
        _suggestions.Clear();
        Recalculate();
    }

    /// <summary>Changes the typed core (and makes it the plan's core) and recalculates.</summary>
    public void EditTypedCore(Action<CoreDraft> edit)
    {
        ArgumentNullException.ThrowIfNull(edit);
        edit(TypedCore);
        CoreSource = CoreSource.Typed;
        _suggestions.Clear();
        Recalculate();
    }

    /// <summary>Sets the number of stacked cores as typed and recalculates.</summary>
    public void EditStack(string? text)
    {
        Stack = text ?? string.Empty;
        _suggestions.Clear();
        Recalculate();
    }

    /// <summary>The selected core, if any.</summary>
    public CatalogueCore? SelectedCore => CoreId is not null && _catalogue.Catalogue.CoresById.TryGetValue(CoreId, out var c) ? c : null;

    /// <summary>The windings as typed.</summary>
    public IReadOnlyList<WindingDraft> Windings => _windings;

    /// <summary>The operating conditions as typed.</summary>
    public OperatingDraft Operating { get; } = new();

    /// <summary>The latest evaluation, or null while an input is invalid.</summary>
    public PlanEvaluation? Result { get; private set; }

    /// <summary>The plan the latest evaluation was made for.</summary>
    public TransformerPlan? Plan { get; private set; }

    /// <summary>Raised after every recalculation.</summary>
    public event Action? Changed;

    /// <summary>The error text for a field path, or null.</summary>
    public string? ErrorFor(string path) => _errors.TryGetValue(path, out var text) ? text : null;

    /// <summary>All field errors.</summary>
    public IReadOnlyDictionary<string, string> Errors => _errors;

    /// <summary>Wire suggestions for a winding, if asked for.</summary>
    public WireChoiceReport? SuggestionsFor(int index) => _suggestions.GetValueOrDefault(index);

    /// <summary>Selects a catalogue core.</summary>
    public void SelectCore(string? id)
    {
        CoreId = id;
        CoreSource = CoreSource.Catalogue;
        _suggestions.Clear();
        Recalculate();
    }

    /// <summary>How many times the plan has been read and evaluated (shown on the page so a browser can tell when fresh
    /// results have arrived).</summary>
    public int EvaluationCount { get; private set; }

    /// <summary>Changes one winding and recalculates.</summary>
    public void EditWinding(int index, Action<WindingDraft> edit)
    {
        ArgumentNullException.ThrowIfNull(edit);
        if (index < 0 || index >= _windings.Count)
        {
            return;
        }

        edit(_windings[index]);
        _suggestions.Remove(index);
        Recalculate();
    }

    /// <summary>Changes the operating conditions and recalculates.</summary>
    public void EditOperating(Action<OperatingDraft> edit)
    {
        ArgumentNullException.ThrowIfNull(edit);
        edit(Operating);
        _suggestions.Clear();
        Recalculate();
    }

    /// <summary>Adds a winding after the last one.</summary>
    public void AddWinding()
    {
        if (_windings.Count >= MaximumWindings)
        {
            return;
        }

        _windings.Add(new WindingDraft { Name = $"winding {_windings.Count + 1}", Turns = "4", ConductorDiameter = "0.4" });
        _suggestions.Clear();
        Recalculate();
    }

    /// <summary>Removes a winding (the last one stays).</summary>
    public void RemoveWinding(int index)
    {
        if (_windings.Count <= 1 || index < 0 || index >= _windings.Count)
        {
            return;
        }

        _windings.RemoveAt(index);
        _suggestions.Clear();
        Recalculate();
    }

    /// <summary>
    /// Moves winding <paramref name="index"/> one place up (<paramref name="offset"/> −1) or down (+1); placements that
    /// point at the two swapped windings follow them.
    /// </summary>
    public void MoveWinding(int index, int offset)
    {
        var other = index + offset;
        if (offset is not (-1 or 1) || index < 0 || index >= _windings.Count || other < 0 || other >= _windings.Count)
        {
            return;
        }

        (_windings[index], _windings[other]) = (_windings[other], _windings[index]);
        foreach (var draft in _windings)
        {
            if (draft.Placement is { Winding: { } target } placement)
            {
                placement.Winding = target == index ? other : target == other ? index : target;
            }
        }

        _suggestions.Clear();
        Recalculate();
    }

    /// <summary>
    /// The turns that meet the reactance rule at the bottom of the band while keeping the turns ratio, or null when
    /// there is no result with operating conditions or the plan already meets it.
    /// </summary>
    public IReadOnlyList<int>? TurnsForBand =>
        Result?.Magnetizing is { } branch && Plan is { } plan && plan.Windings[0].Turns < branch.PrimaryTurnsNeeded
            ? TurnsSolver.ScaleKeepingRatio([.. plan.Windings.Select(w => w.Turns)], branch.PrimaryTurnsNeeded)
            : null;

    /// <summary>Sets every winding's turns to <see cref="TurnsForBand"/>.</summary>
    public void UseTurnsForBand()
    {
        if (TurnsForBand is not { } turns)
        {
            return;
        }

        for (var i = 0; i < _windings.Count && i < turns.Count; i++)
        {
            _windings[i].Turns = turns[i].ToString(System.Globalization.CultureInfo.InvariantCulture);
        }

        _suggestions.Clear();
        Recalculate();
    }

    /// <summary>Asks the engine's gauge picker for wires for winding <paramref name="index"/>.</summary>
    public void SuggestWires(int index)
    {
        if (Plan?.Operating is null || Result is null || index < 0 || index >= Result.Windings.Count)
        {
            return;
        }

        var current = Result.Windings[index].Electrical?.RmsCurrentA ?? 0;
        if (current > 0)
        {
            _suggestions[index] = WireGaugePicker.ChooseWithReport(Plan, index, Math.Min(current, WireGaugePicker.MaximumCurrentA), Plan.Operating.MaxFrequencyHz);
        }

        Changed?.Invoke();
    }

    /// <summary>Uses a suggested wire for winding <paramref name="index"/>.</summary>
    public void UseSuggestion(int index, WireChoice choice)
    {
        ArgumentNullException.ThrowIfNull(choice);
        EditWinding(index, w =>
        {
            w.WireForm = WireForm.Table;
            w.StandardId = choice.StandardId;
            w.StrandsInHand = choice.StrandsInHand > 1 ? choice.StrandsInHand.ToString(System.Globalization.CultureInfo.InvariantCulture) : string.Empty;
        });
    }

    /// <summary>The plan's name (from a loaded plan, or empty).</summary>
    public string PlanName { get; set; } = string.Empty;

    /// <summary>The id of the saved plan being edited, or null for an unsaved one.</summary>
    public string? SavedId { get; private set; }

    /// <summary>The version of the saved plan this form was loaded from or last saved as.</summary>
    public int SavedVersion { get; private set; }

    /// <summary>The message of the last save, and whether it succeeded.</summary>
    public (string Text, bool Succeeded)? SaveMessage { get; private set; }

    /// <summary>Loads a saved plan; false when there is none with that id.</summary>
    public bool LoadSaved(string id)
    {
        var read = _plans.Read(id);
        if (read.Plan?.Plan is not { } document)
        {
            SaveMessage = (read.Message, false);
            return false;
        }

        Load(document);
        PlanName = read.Plan.Name ?? PlanName;
        SavedId = read.Plan.Id;
        SavedVersion = read.Plan.Version ?? 0;
        SaveMessage = null;
        return true;
    }

    /// <summary>Saves the plan: a new saved plan the first time, then new versions of it (a stale save is refused).</summary>
    public void Save()
    {
        var name = string.IsNullOrWhiteSpace(PlanName) ? "Untitled plan" : PlanName.Trim();
        var document = ToDocument();
        document.Name = name;
        Winding.Catalogue.Store.StoreResult result;
        if (SavedId is null)
        {
            result = _plans.Create(name, document);
            if (result.Succeeded)
            {
                SavedId = result.Id;
            }
        }
        else
        {
            result = _plans.Save(SavedId, document, SavedVersion);
            if (result.Succeeded && _plans.Read(SavedId).Plan?.Name != name)
            {
                result = _plans.Rename(SavedId, name, result.Version ?? SavedVersion);
            }
        }

        if (result.Succeeded)
        {
            SavedVersion = result.Version ?? SavedVersion;
            PlanName = name;
        }

        SaveMessage = (result.Succeeded ? $"Saved (version {SavedVersion})." : result.Message, result.Succeeded);
        Changed?.Invoke();
    }

    /// <summary>Saved plans to compare with (ids).</summary>
    public IReadOnlyCollection<string> CompareIds { get; private set; } = [];

    /// <summary>The saved plans that can be compared with this one (all but itself).</summary>
    public IReadOnlyList<PlanSummary> ComparablePlans => [.. _plans.List().Plans.Where(p => p.Id != SavedId)];

    /// <summary>The compared plans, evaluated now against the current catalogue (those that no longer read are left out).</summary>
    public IReadOnlyList<(string Name, TransformerPlan Plan, PlanEvaluation Evaluation)> Comparisons { get; private set; } = [];

    /// <summary>Chooses the saved plans to compare with.</summary>
    public void SetCompare(IEnumerable<string> ids)
    {
        ArgumentNullException.ThrowIfNull(ids);
        CompareIds = [.. ids.Distinct(StringComparer.Ordinal)];
        var list = new List<(string, TransformerPlan, PlanEvaluation)>();
        foreach (var id in CompareIds)
        {
            var saved = _plans.Read(id).Plan;
            if (saved?.Plan is null)
            {
                continue;
            }

            var read = PlanReader.Read(saved.Plan, _catalogue.Catalogue);
            if (read.IsValid)
            {
                list.Add((saved.Name ?? id, read.Plan!, PlanEvaluator.Evaluate(read.Plan!)));
            }
        }

        Comparisons = list;
        Changed?.Invoke();
    }

    /// <summary>Saves the current form as a new variant of the saved plan (or as a new plan when unsaved).</summary>
    public void SaveAsVariant()
    {
        var baseName = string.IsNullOrWhiteSpace(PlanName) ? "Untitled plan" : PlanName.Trim();
        if (SavedId is null)
        {
            Save();
            return;
        }

        var duplicate = _plans.Duplicate(SavedId, baseName + " (variant)");
        if (!duplicate.Succeeded)
        {
            SaveMessage = (duplicate.Message, false);
            Changed?.Invoke();
            return;
        }

        SavedId = duplicate.Id;
        SavedVersion = duplicate.Version ?? 1;
        PlanName = baseName + " (variant)";
        Save();
    }

    /// <summary>
    /// Loads a plan document into the form: its core (catalogue or typed), windings with their wire in any form, and
    /// operating conditions. What the form does not edit (placements and wraps beyond their fields, target inductances,
    /// sweep, options, measured values other than a typed core's AL) is kept as is, so exporting an untouched form gives
    /// the document back.
    /// </summary>
    public void Load(PlanDocument document)
    {
        ArgumentNullException.ThrowIfNull(document);
        PlanName = document.Name ?? string.Empty;
        _loaded = document;
        var core = document.Core;
        Stack = DraftReading.Show(core?.Stack);
        if (core is not null && string.IsNullOrEmpty(core.CatalogueId))
        {
            CoreSource = CoreSource.Typed;
            CoreId = null;
            TypedCore = CoreDrafts.Load(core, document.Measured?.AlNh);
        }
        else
        {
            CoreSource = CoreSource.Catalogue;
            CoreId = core?.CatalogueId;
            TypedCore = new CoreDraft();
        }

        _windings.Clear();
        foreach (var w in document.Windings ?? [])
        {
            if (w is null)
            {
                continue;
            }

            var draft = new WindingDraft
            {
                Name = w.Name ?? string.Empty,
                Turns = DraftReading.Show(w.Turns),
                RmsCurrent = DraftReading.Show(w.RmsCurrentA),
                Placement = w.Placement,
                Insulation = w.Insulation,
                TapsText = w.Taps is { Count: > 0 } taps ? string.Join(", ", taps) : string.Empty,
                TargetInductanceH = w.TargetInductanceH,
            };
            WireDrafts.Load(draft, w.Wire);
            _windings.Add(draft);
        }

        if (document.Operating is { } op)
        {
            Operating.Enabled = true;
            Operating.MinFrequency = DraftReading.ShowWithUnit(op.MinFrequencyHz, "Hz");
            Operating.MaxFrequency = DraftReading.ShowWithUnit(op.MaxFrequencyHz, "Hz");
            Operating.SourceResistance = DraftReading.Show(op.SourceResistanceOhm);
            Operating.LoadResistance = DraftReading.Show(op.LoadResistanceOhm);
            Operating.DriveVoltage = DraftReading.Show(op.DriveVoltageRms);
            Operating.Waveform = op.Waveform ?? "sine";
            Operating.DutyCycle = op.DutyCycle is null ? "0.5" : DraftReading.Show(op.DutyCycle);
            Operating.AmbientTemperature = DraftReading.Show(op.AmbientTemperatureC);
        }
        else
        {
            Operating.Enabled = false;
        }

        _suggestions.Clear();
        Recalculate();
    }

    /// <summary>The plan document for the current inputs (what the API would be sent).</summary>
    public PlanDocument ToDocument()
    {
        var errors = new Dictionary<string, string>(StringComparer.Ordinal);
        return BuildDocument(errors);
    }

    private void Recalculate()
    {
        EvaluationCount++;
        _errors.Clear();
        Result = null;
        Plan = null;
        var document = BuildDocument(_errors);
        if (_errors.Count == 0)
        {
            var read = PlanReader.Read(document, _catalogue.Catalogue);
            if (read.IsValid)
            {
                Plan = read.Plan;
                Result = PlanEvaluator.Evaluate(read.Plan!);
            }
            else
            {
                foreach (var error in read.Errors)
                {
                    if (PageField(error) is { } field)
                    {
                        _errors.TryAdd(field, error.Message);
                    }
                }
            }
        }

        Changed?.Invoke();
    }

    /// <summary>
    /// The page field that shows a reader error: the path itself where the page has that field, else the nearest field
    /// (a typed core's other problems show at the core panel; a wire given in several forms at the wire kind).
    /// Null to leave out the reader's "no material" when a typed core's μi follows from its measured AL and the shape is
    /// not valid yet (the shape's own errors say why).
    /// </summary>
    private string? PageField(FieldError error)
    {
        var f = error.Field;
        if (f.StartsWith("core", StringComparison.Ordinal) || f.StartsWith("measured.alNh", StringComparison.Ordinal))
        {
            if (f == "core.stack")
            {
                return f;
            }

            if (CoreSource == CoreSource.Catalogue)
            {
                return f.StartsWith("core", StringComparison.Ordinal) ? "core" : f;
            }

            var fromAl = TypedCore.MaterialBasis == CoreMaterialBasis.MeasuredAl;
            return f switch
            {
                "core.materialId" when fromAl => null,
                "core.initialPermeability" when fromAl => "measured.alNh",
                "core.shape" or "core.family" or "core.alNh" or "core.materialId" or "core.initialPermeability" or "measured.alNh" => f,
                "core.effective" => "core.effective.areaMm2",
                "core.effective.areaMm2" or "core.effective.lengthMm" when TypedCore.TakesEffective => f,
                _ when f.StartsWith("core.dimensionsMm.", StringComparison.Ordinal) && TypedCore.ShownDimensions.Contains(f["core.dimensionsMm.".Length..]) => f,
                _ => "core",
            };
        }

        return f;
    }

    private PlanDocument BuildDocument(Dictionary<string, string> errors)
    {
        var stack = DraftReading.Whole(errors, "core.stack", Stack, "Cores stacked", required: false);
        PlanCoreDocument core;
        double? typedAl = null;
        if (CoreSource == CoreSource.Typed)
        {
            (core, typedAl) = CoreDrafts.Build(TypedCore, stack, errors);
        }
        else
        {
            if (CoreId is null)
            {
                errors["core"] = "Pick a core.";
            }

            var loadedCore = _loaded?.Core;
            core = loadedCore is not null && loadedCore.CatalogueId == CoreId && !string.IsNullOrEmpty(CoreId)
                ? new PlanCoreDocument { CatalogueId = CoreId, MaterialId = loadedCore.MaterialId, InitialPermeability = loadedCore.InitialPermeability, Stack = stack }
                : new PlanCoreDocument { CatalogueId = CoreId, Stack = stack };
        }

        var windings = new List<PlanWindingDocument?>();
        for (var i = 0; i < _windings.Count; i++)
        {
            var draft = _windings[i];
            var prefix = $"windings[{i}]";
            var wire = WireDrafts.Build(draft, $"{prefix}.wire", errors);
            windings.Add(new PlanWindingDocument
            {
                Name = DraftReading.Word(draft.Name) is null ? null : draft.Name,
                Turns = Whole(errors, $"{prefix}.turns", draft.Turns, "Turns", required: true),
                Wire = wire,
                RmsCurrentA = Number(errors, $"{prefix}.rmsCurrentA", draft.RmsCurrent, "RMS current", "A", required: false),
                Placement = draft.Placement,
                Insulation = draft.Insulation,
                Taps = Taps(errors, $"{prefix}.taps", draft.TapsText),
                TargetInductanceH = draft.TargetInductanceH,
            });
        }

        PlanOperatingDocument? operating = null;
        if (Operating.Enabled)
        {
            operating = new PlanOperatingDocument
            {
                MinFrequencyHz = Number(errors, "operating.minFrequencyHz", Operating.MinFrequency, "Lowest frequency", "Hz", required: true),
                MaxFrequencyHz = Number(errors, "operating.maxFrequencyHz", Operating.MaxFrequency, "Highest frequency", "Hz", required: true),
                SourceResistanceOhm = Number(errors, "operating.sourceResistanceOhm", Operating.SourceResistance, "Source resistance", "Ω", required: true),
                LoadResistanceOhm = Number(errors, "operating.loadResistanceOhm", Operating.LoadResistance, "Load resistance", "Ω", required: true),
                DriveVoltageRms = Number(errors, "operating.driveVoltageRms", Operating.DriveVoltage, "Drive voltage", "V", required: true),
                Waveform = Operating.Waveform,
                DutyCycle = Operating.Waveform == "pulse" ? Number(errors, "operating.dutyCycle", Operating.DutyCycle, "Duty cycle", string.Empty, required: true) : null,
                AmbientTemperatureC = Number(errors, "operating.ambientTemperatureC", Operating.AmbientTemperature, "Ambient temperature", "°C", required: false),
                ReactanceFactor = _loaded?.Operating?.ReactanceFactor,
            };
        }

        return new PlanDocument
        {
            Name = string.IsNullOrWhiteSpace(PlanName) ? null : PlanName,
            Core = core,
            Windings = windings,
            Operating = operating,
            Allowance = _loaded?.Allowance,
            Sweep = _loaded?.Sweep,
            Options = _loaded?.Options,
            Measured = Measured(typedAl),
            Bench = _loaded?.Bench,
        };
    }

    /// <summary>
    /// The plan's measured values: as loaded, with the measured AL taken from the typed core while it is used (a
    /// catalogue core keeps the loaded AL only when the loaded plan's core was a catalogue core too).
    /// </summary>
    private PlanMeasuredDocument? Measured(double? typedAl)
    {
        var loaded = _loaded?.Measured;
        var loadedTyped = _loaded?.Core is { } c && string.IsNullOrEmpty(c.CatalogueId);
        if (CoreSource == CoreSource.Catalogue && !loadedTyped)
        {
            return loaded;
        }

        var al = CoreSource == CoreSource.Typed ? typedAl : null;
        if (loaded is null && al is null)
        {
            return null;
        }

        var measured = new PlanMeasuredDocument
        {
            AlNh = al,
            LeakageInductanceH = loaded?.LeakageInductanceH,
            InterwindingCapacitanceF = loaded?.InterwindingCapacitanceF,
            SelfCapacitanceF = loaded?.SelfCapacitanceF,
        };
        return measured.AlNh is null && measured.LeakageInductanceH is null && measured.InterwindingCapacitanceF is null && measured.SelfCapacitanceF is null && loaded?.AlNh is not null
            ? null
            : measured;
    }

    private static double? Number(Dictionary<string, string> errors, string path, string text, string label, string unit, bool required) =>
        DraftReading.Number(errors, path, text, label, unit, required);

    private static List<int>? Taps(Dictionary<string, string> errors, string path, string text)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            return null;
        }

        var taps = new List<int>();
        foreach (var part in text.Split([',', ' ', ';'], StringSplitOptions.RemoveEmptyEntries))
        {
            if (!int.TryParse(part, NumberStyles.Integer, CultureInfo.InvariantCulture, out var tap))
            {
                errors[path] = $"Taps: '{part}' is not a whole number of turns; write them like 5, 10.";
                return null;
            }

            taps.Add(tap);
        }

        return taps;
    }

    private static int? Whole(Dictionary<string, string> errors, string path, string text, string label, bool required) =>
        DraftReading.Whole(errors, path, text, label, required);
}
