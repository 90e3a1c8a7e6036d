using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Unicode;
using Winding.Catalogue.Entries;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Store;
using Winding.Catalogue.Validation;

namespace Winding.Catalogue.Plans;

/// <summary>
/// The user's saved plans in the data folder: one file per plan, <c>{data}/plans/{id}.json</c>, holding a
/// <see cref="SavedPlan"/>. A plan's id is a slug made from its name when it is created and never changes (a rename
/// changes only the name).
/// <para>
/// Every change is checked against the expected version (optimistic concurrency) and written atomically (temporary file,
/// flushed to disk, renamed over the target). Writers are serialised by one lock per instance, so use one instance per
/// data folder (a singleton). User input never throws: every operation returns a result; exceptions are for programming
/// errors (null arguments). The plan content is kept as given (a draft may be incomplete); it is checked when evaluated.
/// </para>
/// </summary>
public sealed class PlanStore
{
    /// <summary>The folder below the data folder that holds the plans.</summary>
    public const string PlansFolder = "plans";

    /// <summary>Longest plan name, characters (as <see cref="PlanReader"/> allows for a plan's name).</summary>
    public const int MaximumNameLength = 200;

    private static readonly JsonSerializerOptions WriteOptions = new(CatalogueJson.Options)
    {
        Encoder = JavaScriptEncoder.Create(UnicodeRanges.All),
    };

    private readonly TimeProvider _time;
    private readonly Lock _gate = new();

    /// <summary>Creates a store for the data folder <paramref name="dataDirectory"/>.</summary>
    /// <param name="dataDirectory">The user data folder (<c>WINDING_DATA_DIR</c>); the plans folder is created on the first write.</param>
    /// <param name="timeProvider">The clock for creation and save times.</param>
    public PlanStore(string dataDirectory, TimeProvider timeProvider)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(dataDirectory);
        ArgumentNullException.ThrowIfNull(timeProvider);
        PlansDirectory = Path.Combine(Path.GetFullPath(dataDirectory), PlansFolder);
        _time = timeProvider;
    }

    /// <summary>The plans folder, <c>{data}/plans</c>.</summary>
    public string PlansDirectory { get; }

    /// <summary>
    /// The saved plans, most recently saved first, and a problem for each file that cannot be read (the rest still
    /// list). Deletes temporary files left by an interrupted write.
    /// </summary>
    public PlanListResult List()
    {
        lock (_gate)
        {
            try
            {
                AtomicFile.DeleteLeftovers(PlansDirectory);
                var plans = new List<PlanSummary>();
                var problems = new List<CatalogueProblem>();
                IEnumerable<string> files = Directory.Exists(PlansDirectory)
                    ? Directory.EnumerateFiles(PlansDirectory, "*.json").Where(f => !Path.GetFileName(f).StartsWith('.')).Order(StringComparer.Ordinal)
                    : [];
                foreach (var file in files)
                {
                    var fileName = Path.GetFileName(file);
                    var id = Path.GetFileNameWithoutExtension(file);
                    if (!EntryId.IsValid(id))
                    {
                        problems.Add(new CatalogueProblem(fileName, "$", $"The file name is not a plan id ({EntryId.Rule}), so the file is not read."));
                        continue;
                    }

                    var parsed = Parse(File.ReadAllText(file), id);
                    if (parsed.Plan is { } plan)
                    {
                        plans.Add(new PlanSummary(id, plan.Name!, plan.SavedAt!.Value, plan.Version!.Value, plan.VariantOf));
                    }
                    else
                    {
                        problems.AddRange(parsed.Errors.Select(e => new CatalogueProblem(fileName, JsonPathOf(e.Field), e.Message)));
                    }
                }

                var ordered = plans.OrderByDescending(p => p.SavedAt).ThenBy(p => p.Id, StringComparer.Ordinal).ToList();
                var message = problems.Count == 0
                    ? $"{ordered.Count} plan(s)."
                    : $"{ordered.Count} plan(s); {problems.Select(p => p.FileName).Distinct(StringComparer.Ordinal).Count()} file(s) could not be read.";
                return new PlanListResult(StoreOutcome.Ok, message, ordered, problems);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                return new PlanListResult(StoreOutcome.StorageFailed, StorageMessage(e), [], []);
            }
        }
    }

    /// <summary>Reads the saved plan <paramref name="id"/>.</summary>
    public SavedPlanResult Read(string id)
    {
        if (!EntryId.IsValid(id))
        {
            return new SavedPlanResult(StoreOutcome.Invalid, InvalidIdMessage(id), null, [new FieldError("id", InvalidIdMessage(id))]);
        }

        lock (_gate)
        {
            try
            {
                var current = Current(id);
                return current switch
                {
                    null => new SavedPlanResult(StoreOutcome.NotFound, NotFoundMessage(id), null, []),
                    { Plan: null } => new SavedPlanResult(StoreOutcome.Invalid, DamagedMessage(id, current.Errors), null, current.Errors),
                    _ => new SavedPlanResult(StoreOutcome.Ok, $"Version {current.Version}.", current.Plan, []),
                };
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                return new SavedPlanResult(StoreOutcome.StorageFailed, StorageMessage(e), null, []);
            }
        }
    }

    /// <summary>Saves <paramref name="plan"/> as a new plan named <paramref name="name"/>; its id is a free slug made from the name (version 1).</summary>
    public StoreResult Create(string name, PlanDocument plan)
    {
        ArgumentNullException.ThrowIfNull(name);
        ArgumentNullException.ThrowIfNull(plan);
        if (CheckName(name) is { } refused)
        {
            return StoreResult.Refused(string.Empty, [refused]);
        }

        return Guarded(() =>
        {
            lock (_gate)
            {
                return CreateLocked(name.Trim(), plan, variantOf: null, "Saved the new plan");
            }
        });
    }

    /// <summary>
    /// Saves new content for the plan <paramref name="id"/> as its next version. Refused, with nothing written, when
    /// <paramref name="expectedVersion"/> is not the current version (someone saved in between).
    /// </summary>
    public StoreResult Save(string id, PlanDocument plan, int expectedVersion)
    {
        ArgumentNullException.ThrowIfNull(plan);
        return Guarded(id, () =>
        {
            lock (_gate)
            {
                var refusal = CheckExisting(id, expectedVersion, out var current);
                if (refusal is not null)
                {
                    return refusal;
                }

                var now = _time.GetUtcNow();
                var saved = new SavedPlan
                {
                    Id = id,
                    Name = current!.Plan?.Name ?? id,
                    CreatedAt = current.Plan?.CreatedAt ?? now,
                    SavedAt = now,
                    Version = current.Version + 1,
                    VariantOf = current.Plan?.VariantOf,
                    Plan = plan,
                };
                Write(saved);
                return new StoreResult(StoreOutcome.Ok, id, saved.Version, $"Saved the plan '{saved.Name}' as version {saved.Version}.", []);
            }
        });
    }

    /// <summary>Renames the plan <paramref name="id"/> (its id stays); the rename is saved as the next version.</summary>
    public StoreResult Rename(string id, string newName, int expectedVersion)
    {
        ArgumentNullException.ThrowIfNull(newName);
        if (CheckName(newName) is { } refused)
        {
            return StoreResult.Refused(id ?? string.Empty, [refused]);
        }

        return Guarded(id, () =>
        {
            lock (_gate)
            {
                var refusal = CheckExisting(id, expectedVersion, out var current);
                if (refusal is not null)
                {
                    return refusal;
                }

                if (current!.Plan is not { } saved)
                {
                    return StoreResult.Refused(id, current.Errors);
                }

                saved.Name = newName.Trim();
                saved.SavedAt = _time.GetUtcNow();
                saved.Version = current.Version + 1;
                Write(saved);
                return new StoreResult(StoreOutcome.Ok, id, saved.Version, $"Renamed the plan to '{saved.Name}' (version {saved.Version}).", []);
            }
        });
    }

    /// <summary>Copies the plan <paramref name="id"/> as a new plan named <paramref name="newName"/> (version 1) that records it as <see cref="SavedPlan.VariantOf"/>.</summary>
    public StoreResult Duplicate(string id, string newName)
    {
        ArgumentNullException.ThrowIfNull(newName);
        if (CheckName(newName) is { } refused)
        {
            return StoreResult.Refused(id ?? string.Empty, [refused]);
        }

        return Guarded(id, () =>
        {
            lock (_gate)
            {
                var current = Current(id);
                if (current is null)
                {
                    return StoreResult.Fail(StoreOutcome.NotFound, id, NotFoundMessage(id));
                }

                return current.Plan is { Plan: { } plan }
                    ? CreateLocked(newName.Trim(), plan, variantOf: id, $"Saved a variant of '{current.Plan.Name}'")
                    : StoreResult.Refused(id, current.Errors);
            }
        });
    }

    /// <summary>Deletes the plan <paramref name="id"/>; refused when <paramref name="expectedVersion"/> is not its current version.</summary>
    public StoreResult Delete(string id, int expectedVersion)
    {
        return Guarded(id, () =>
        {
            lock (_gate)
            {
                var refusal = CheckExisting(id, expectedVersion, out var current);
                if (refusal is not null)
                {
                    return refusal;
                }

                File.Delete(PlanPath(id));
                return new StoreResult(StoreOutcome.Ok, id, current!.Version, $"Deleted the plan '{current.Plan?.Name ?? id}'.", []);
            }
        });
    }

    /// <summary>The saved-plan JSON of <paramref name="id"/>, to download; <see cref="Import"/> reads it back.</summary>
    public EntryReadResult Export(string id)
    {
        var read = Read(id);
        return read.Plan is { } plan
            ? new EntryReadResult(StoreOutcome.Ok, read.Message, Serialise(plan), plan.Version, BuiltIn: false)
            : new EntryReadResult(read.Outcome, read.Message, null, null, BuiltIn: false);
    }

    /// <summary>
    /// Saves an exported plan (saved-plan JSON, or the bare plan document the plan page exports) as a new plan: the shape is checked (unknown fields refused, each error
    /// with its field path); it gets a fresh id made from its name, version 1 and the current time. Its id, times,
    /// version and <see cref="SavedPlan.VariantOf"/> are not taken over (they belong to the store it came from).
    /// </summary>
    public StoreResult Import(string json)
    {
        ArgumentNullException.ThrowIfNull(json);
        SavedPlan? imported;
        try
        {
            imported = IsBarePlan(json)
                ? Wrap(JsonSerializer.Deserialize<PlanDocument>(json, CatalogueJson.Options))
                : JsonSerializer.Deserialize<SavedPlan>(json, CatalogueJson.Options);
        }
        catch (JsonException e)
        {
            return StoreResult.Refused(string.Empty, [new FieldError(JsonErrorText.FieldOf(e), JsonErrorText.ReasonOf(e))]);
        }

        var errors = new List<FieldError>();
        if (imported is null)
        {
            errors.Add(new FieldError(string.Empty, "Not a saved plan: expected a JSON object with name and plan."));
        }
        else
        {
            if (CheckName(imported.Name) is { } name)
            {
                errors.Add(name);
            }

            if (imported.Plan is null)
            {
                errors.Add(new FieldError("plan", "Required: the plan itself (core, windings…)."));
            }
        }

        if (errors.Count > 0)
        {
            return StoreResult.Refused(string.Empty, errors);
        }

        return Guarded(() =>
        {
            lock (_gate)
            {
                return CreateLocked(imported!.Name!.Trim(), imported.Plan!, variantOf: null, "Imported the plan");
            }
        });
    }

    /// <summary>True when the JSON is a bare plan document (what the plan page exports): an object with core, windings or operating and no plan.</summary>
    private static bool IsBarePlan(string json)
    {
        try
        {
            using var parsed = JsonDocument.Parse(json);
            var root = parsed.RootElement;
            return root.ValueKind == JsonValueKind.Object
                && !root.TryGetProperty("plan", out _)
                && (root.TryGetProperty("core", out _) || root.TryGetProperty("windings", out _) || root.TryGetProperty("operating", out _));
        }
        catch (JsonException)
        {
            return false;
        }
    }

    /// <summary>A bare plan document as a saved plan named after it ("Imported plan" when it has no name).</summary>
    private static SavedPlan? Wrap(PlanDocument? plan) =>
        plan is null ? null : new SavedPlan { Name = string.IsNullOrWhiteSpace(plan.Name) ? "Imported plan" : plan.Name, Plan = plan };

    private StoreResult CreateLocked(string name, PlanDocument plan, string? variantOf, string verb)
    {
        var id = PlanSlug.Unique(name, candidate => File.Exists(PlanPath(candidate)));
        var now = _time.GetUtcNow();
        Write(new SavedPlan
        {
            Id = id,
            Name = name,
            CreatedAt = now,
            SavedAt = now,
            Version = 1,
            VariantOf = variantOf,
            Plan = plan,
        });
        return new StoreResult(StoreOutcome.Ok, id, 1, $"{verb} '{name}' as '{id}'.", []);
    }

    /// <summary>Checks that the plan exists and is at <paramref name="expectedVersion"/>.</summary>
    private StoreResult? CheckExisting(string id, int expectedVersion, out CurrentFile? current)
    {
        current = Current(id);
        if (current is null)
        {
            return StoreResult.Fail(StoreOutcome.NotFound, id, NotFoundMessage(id));
        }

        return current.Version != expectedVersion
            ? StoreResult.Fail(StoreOutcome.Conflict, id,
                $"The plan '{id}' has changed since you opened it: version {current.Version} is current (you opened version {expectedVersion}). Reload it and make your change again.",
                current.Version)
            : null;
    }

    private void Write(SavedPlan plan) => AtomicFile.Write(PlanPath(plan.Id!), Serialise(plan));

    /// <summary>The plan's file, or null when there is none; a damaged file counts with the version it states, else 0.</summary>
    private CurrentFile? Current(string id)
    {
        var path = PlanPath(id);
        if (!File.Exists(path))
        {
            return null;
        }

        var text = File.ReadAllText(path);
        var parsed = Parse(text, id);
        return parsed.Plan is { } plan
            ? new CurrentFile(plan, plan.Version!.Value, [])
            : new CurrentFile(null, VersionInDamagedText(text), parsed.Errors);
    }

    /// <summary>Reads a plan file and checks what the store relies on: its id matches the file, a name, times, a version and the plan.</summary>
    private static (SavedPlan? Plan, IReadOnlyList<FieldError> Errors) Parse(string text, string id)
    {
        SavedPlan? plan;
        try
        {
            plan = JsonSerializer.Deserialize<SavedPlan>(text, CatalogueJson.Options);
        }
        catch (JsonException e)
        {
            return (null, [new FieldError(JsonErrorText.FieldOf(e), JsonErrorText.ReasonOf(e))]);
        }

        if (plan is null)
        {
            return (null, [new FieldError(string.Empty, "Not a saved plan: expected a JSON object.")]);
        }

        var errors = new List<FieldError>();
        if (plan.Id != id)
        {
            errors.Add(new FieldError("id", $"The id must be the file's name ('{id}')."));
        }

        if (CheckName(plan.Name) is { } name)
        {
            errors.Add(name);
        }

        if (plan.Version is not >= 1)
        {
            errors.Add(new FieldError("version", "Required: a whole number, 1 or more."));
        }

        if (plan.SavedAt is null)
        {
            errors.Add(new FieldError("savedAt", "Required: when the plan was saved."));
        }

        if (plan.CreatedAt is null)
        {
            errors.Add(new FieldError("createdAt", "Required: when the plan was created."));
        }

        if (plan.VariantOf is not null && !EntryId.IsValid(plan.VariantOf))
        {
            errors.Add(new FieldError("variantOf", $"Not a plan id: {EntryId.Rule}."));
        }

        if (plan.Plan is null)
        {
            errors.Add(new FieldError("plan", "Required: the plan itself (core, windings…)."));
        }

        return errors.Count == 0 ? (plan, []) : (null, errors);
    }

    private static FieldError? CheckName(string? name) =>
        string.IsNullOrWhiteSpace(name) ? new FieldError("name", "Required: give the plan a name.")
        : name.Trim().Length > MaximumNameLength ? new FieldError("name", $"The name may have at most {MaximumNameLength} characters.")
        : null;

    private static int VersionInDamagedText(string text)
    {
        try
        {
            using var json = JsonDocument.Parse(text);
            return json.RootElement.ValueKind == JsonValueKind.Object && json.RootElement.TryGetProperty("version", out var v) && v.TryGetInt32(out var n) ? n : 0;
        }
        catch (JsonException)
        {
            return 0;
        }
    }

    private static StoreResult Guarded(Func<StoreResult> operation)
    {
        try
        {
            return operation();
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return StoreResult.Fail(StoreOutcome.StorageFailed, string.Empty, StorageMessage(e));
        }
    }

    private static StoreResult Guarded(string? id, Func<StoreResult> operation)
    {
        if (!EntryId.IsValid(id))
        {
            return StoreResult.Refused(id ?? string.Empty, [new FieldError("id", InvalidIdMessage(id))]);
        }

        try
        {
            return operation();
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return StoreResult.Fail(StoreOutcome.StorageFailed, id!, StorageMessage(e));
        }
    }

    private string PlanPath(string id) => Path.Combine(PlansDirectory, id + ".json");

    private static string Serialise(SavedPlan plan) => JsonSerializer.Serialize(plan, WriteOptions) + "\n";

    private static string JsonPathOf(string field) => field.Length == 0 ? "$" : field.StartsWith('[') ? "$" + field : "$." + field;

    private static string InvalidIdMessage(string? id) => $"'{id}' is not a valid plan id: {EntryId.Rule}.";

    private static string NotFoundMessage(string id) => $"There is no plan '{id}'.";

    private static string DamagedMessage(string id, IReadOnlyList<FieldError> errors) =>
        $"The file of the plan '{id}' cannot be read: {(errors.Count == 1 ? errors[0].Message : $"{errors.Count} fields need attention.")}";

    private static string StorageMessage(Exception e) => "The data folder could not be read or written: " + e.Message;

    /// <summary>A plan's current file: the plan (null when damaged), its version and what is wrong with it.</summary>
    private sealed record CurrentFile(SavedPlan? Plan, int Version, IReadOnlyList<FieldError> Errors);
}
