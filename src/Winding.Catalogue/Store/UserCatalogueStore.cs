using System.Globalization;
using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Unicode;
using Winding.Catalogue.Entries;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Validation;

namespace Winding.Catalogue.Store;

/// <summary>
/// The user's own catalogue entries in the data folder, with versions, history, import and export. Files:
/// <c>{data}/catalogue/materials/{id}.json</c> and <c>{data}/catalogue/cores/{id}.json</c> (the entry JSON plus
/// <c>version</c> and <c>savedAt</c>), earlier versions at <c>{data}/catalogue/history/{materials|cores}/{id}/{version}.json</c>.
/// <para>
/// Every write is validated by the loader's rules, checked against the expected version (optimistic concurrency), and
/// written atomically (temporary file, flushed to disk, renamed over the target); the previous content goes to the history
/// first. Writers are serialised by one lock per instance, so use one instance per data folder (a singleton). User input
/// never throws: every operation returns a result; exceptions are for programming errors (null arguments).
/// </para>
/// </summary>
public sealed class UserCatalogueStore
{
    /// <summary>The folder below the data folder that holds the user catalogue.</summary>
    public const string CatalogueFolder = "catalogue";

    private static readonly JsonSerializerOptions WriteOptions = new(CatalogueJson.Options)
    {
        Encoder = JavaScriptEncoder.Create(UnicodeRanges.All),
    };

    private readonly string _builtInDirectory;
    private readonly TimeProvider _time;
    private readonly Lock _gate = new();
    private List<LoadedFile>? _builtIn;
    private List<CatalogueProblem> _builtInProblems = [];

    /// <summary>Creates a store for the data folder <paramref name="dataDirectory"/>.</summary>
    /// <param name="dataDirectory">The user data folder (<c>WINDING_DATA_DIR</c>); created on the first write.</param>
    /// <param name="builtInDirectory">The built-in catalogue folder (read-only; read once, on first use).</param>
    /// <param name="timeProvider">The clock for save times.</param>
    public UserCatalogueStore(string dataDirectory, string builtInDirectory, TimeProvider timeProvider)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(dataDirectory);
        ArgumentException.ThrowIfNullOrWhiteSpace(builtInDirectory);
        ArgumentNullException.ThrowIfNull(timeProvider);
        CatalogueDirectory = Path.Combine(Path.GetFullPath(dataDirectory), CatalogueFolder);
        _builtInDirectory = builtInDirectory;
        _time = timeProvider;
    }

    /// <summary>The user catalogue folder, <c>{data}/catalogue</c>.</summary>
    public string CatalogueDirectory { get; }

    /// <summary>
    /// Loads the built-in and user catalogue (as <see cref="CatalogueLoader.Load(string, string?)"/>) and deletes
    /// temporary files left by an interrupted write.
    /// </summary>
    public CoreCatalogue Load()
    {
        lock (_gate)
        {
            AtomicFile.DeleteLeftovers(CatalogueDirectory);
            return Snapshot(out _);
        }
    }

    /// <summary>Reads the JSON of an entry: a user entry's current (or an earlier) version, or a built-in entry.</summary>
    /// <param name="kind">Material or core.</param>
    /// <param name="id">The entry's id.</param>
    /// <param name="version">An earlier version to read, or null for the current one.</param>
    public EntryReadResult Read(CatalogueEntryKind kind, string id, int? version = null)
    {
        if (!EntryId.IsValid(id))
        {
            return new EntryReadResult(StoreOutcome.Invalid, InvalidIdMessage(id), null, null, false);
        }

        lock (_gate)
        {
            try
            {
                if (BuiltInFile(kind, id) is { } builtIn)
                {
                    return new EntryReadResult(StoreOutcome.Ok, "Built-in entry.", Serialise(kind, builtIn.Entry), 0, true);
                }

                var current = Current(kind, id);
                if (version is null || version == current?.Version)
                {
                    return current is null
                        ? new EntryReadResult(StoreOutcome.NotFound, NotFoundMessage(kind, id), null, null, false)
                        : new EntryReadResult(StoreOutcome.Ok, $"Version {current.Version}.", current.Text, current.Version, false);
                }

                var path = HistoryPath(kind, id, version.Value);
                return File.Exists(path)
                    ? new EntryReadResult(StoreOutcome.Ok, $"Version {version} (history).", File.ReadAllText(path), version, false)
                    : new EntryReadResult(StoreOutcome.NotFound, $"The {kind.Word()} '{id}' has no version {version}.", null, null, false);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                return new EntryReadResult(StoreOutcome.StorageFailed, StorageMessage(e), null, null, false);
            }
        }
    }

    /// <summary>Creates a user entry from its JSON; it gets version 1 (or the next after a deleted entry's history).</summary>
    public StoreResult Create(CatalogueEntryKind kind, string json)
    {
        ArgumentNullException.ThrowIfNull(json);
        var parsed = EntryParser.Parse(json);
        var id = parsed.Id ?? string.Empty;
        if (!parsed.Succeeded)
        {
            return StoreResult.Refused(id, [new FieldError(EntryParser.FieldOf(parsed.ErrorPath!), parsed.ErrorReason!)]);
        }

        return Guarded(id, () =>
        {
            lock (_gate)
            {
                return CreateLocked(kind, parsed);
            }
        });
    }

    /// <summary>
    /// Saves a new version of a user entry. Refused when <paramref name="expectedVersion"/> is not the current version
    /// (someone saved in between), when the entry is built in, or when the content is invalid; the id cannot change.
    /// </summary>
    public StoreResult Update(CatalogueEntryKind kind, string id, string json, int expectedVersion)
    {
        ArgumentNullException.ThrowIfNull(json);
        return Guarded(id, () =>
        {
            lock (_gate)
            {
                var refusal = CheckExisting(kind, id, expectedVersion, out var current);
                return refusal ?? Save(kind, id, EntryParser.Parse(json), current);
            }
        });
    }

    /// <summary>Deletes a user entry (its last version stays in the history). A material used by user cores is kept.</summary>
    public StoreResult Delete(CatalogueEntryKind kind, string id, int expectedVersion)
    {
        return Guarded(id, () =>
        {
            lock (_gate)
            {
                var refusal = CheckExisting(kind, id, expectedVersion, out var current);
                if (refusal is not null)
                {
                    return refusal;
                }

                if (kind == CatalogueEntryKind.Material)
                {
                    var users = UserFiles(new List<CatalogueProblem>())
                        .Where(f => f.Entry.Core?.MaterialId == id)
                        .Select(f => f.Entry.Id)
                        .ToList();
                    if (users.Count > 0)
                    {
                        return StoreResult.Fail(StoreOutcome.InUse, id,
                            $"The material '{id}' is used by the cores {string.Join(", ", users)}: change or delete them first.", current!.Version);
                    }
                }

                AtomicFile.Write(HistoryPath(kind, id, current!.Version), current.Text);
                File.Delete(EntryPath(kind, id));
                return new StoreResult(StoreOutcome.Ok, id, current.Version, $"Deleted the {kind.Word()} '{id}'; version {current.Version} is kept in its history.", []);
            }
        });
    }

    /// <summary>The saved versions of a user entry with their save times, newest first (also after it was deleted).</summary>
    public HistoryResult History(CatalogueEntryKind kind, string id)
    {
        if (!EntryId.IsValid(id))
        {
            return new HistoryResult(StoreOutcome.Invalid, InvalidIdMessage(id), []);
        }

        lock (_gate)
        {
            try
            {
                if (BuiltInFile(kind, id) is not null)
                {
                    return new HistoryResult(StoreOutcome.Ok, "Built-in entries have no history.", []);
                }

                var versions = new List<EntryVersion>();
                var current = Current(kind, id);
                if (current is not null)
                {
                    versions.Add(new EntryVersion(current.Version, SavedAtOf(current.Text), true));
                }

                foreach (var version in HistoryVersions(kind, id).Where(v => v != current?.Version))
                {
                    versions.Add(new EntryVersion(version, SavedAtOf(File.ReadAllText(HistoryPath(kind, id, version))), false));
                }

                return versions.Count == 0
                    ? new HistoryResult(StoreOutcome.NotFound, NotFoundMessage(kind, id), [])
                    : new HistoryResult(StoreOutcome.Ok, $"{versions.Count} version(s).", [.. versions.OrderByDescending(v => v.Version)]);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                return new HistoryResult(StoreOutcome.StorageFailed, StorageMessage(e), []);
            }
        }
    }

    /// <summary>
    /// Saves the content of an earlier <paramref name="version"/> as a new version. <paramref name="expectedVersion"/> is
    /// the current version, or 0 to bring back a deleted entry.
    /// </summary>
    public StoreResult Restore(CatalogueEntryKind kind, string id, int version, int expectedVersion)
    {
        return Guarded(id, () =>
        {
            lock (_gate)
            {
                var current = Current(kind, id);
                if (current is null && expectedVersion == 0 && BuiltInFile(kind, id) is null && HistoryVersions(kind, id).Count > 0)
                {
                    // A deleted entry: bring it back, unless its id was taken meanwhile.
                    if (IdClash(kind, id) is { } clash)
                    {
                        return StoreResult.Fail(StoreOutcome.AlreadyExists, id, clash);
                    }
                }
                else if (CheckExisting(kind, id, expectedVersion, out current) is { } refusal)
                {
                    return refusal;
                }

                var path = HistoryPath(kind, id, version);
                var text = version == current?.Version ? current.Text : File.Exists(path) ? File.ReadAllText(path) : null;
                if (text is null)
                {
                    return StoreResult.Fail(StoreOutcome.NotFound, id, $"The {kind.Word()} '{id}' has no version {version}.");
                }

                return Save(kind, id, EntryParser.Parse(text), current);
            }
        });
    }

    /// <summary>Copies a built-in or user entry under a new id and name, as a new user entry (version 1).</summary>
    public StoreResult Clone(CatalogueEntryKind kind, string sourceId, string newId, string newName)
    {
        ArgumentNullException.ThrowIfNull(newName);
        if (!EntryId.IsValid(sourceId))
        {
            return StoreResult.Fail(StoreOutcome.Invalid, sourceId ?? string.Empty, InvalidIdMessage(sourceId));
        }

        return Guarded(newId, () =>
        {
            lock (_gate)
            {
                var source = BuiltInFile(kind, sourceId)?.Entry;
                if (source is null && Current(kind, sourceId) is { } user)
                {
                    source = EntryParser.Parse(user.Text);
                }

                if (source is null || !source.Succeeded)
                {
                    return StoreResult.Fail(StoreOutcome.NotFound, newId, source is null ? NotFoundMessage(kind, sourceId) : $"The {kind.Word()} '{sourceId}' cannot be read: {source.ErrorReason}");
                }

                var copy = EntryParser.Parse(Serialise(kind, source));
                SetCommon(copy, newId, newName);
                return CreateLocked(kind, copy);
            }
        });
    }

    /// <summary>All user entries that can be read, as one JSON bundle (materials first, each with its version).</summary>
    public string ExportBundle()
    {
        lock (_gate)
        {
            var files = UserFiles(new List<CatalogueProblem>());
            var bundle = new CatalogueBundle
            {
                Format = CatalogueBundle.FormatName,
                FormatVersion = 1,
                ExportedAt = _time.GetUtcNow(),
                Materials = [.. files.Where(f => f.Entry.Material is not null).Select(f => JsonSerializer.SerializeToElement(f.Entry.Material, WriteOptions))],
                Cores = [.. files.Where(f => f.Entry.Core is not null).Select(f => JsonSerializer.SerializeToElement(f.Entry.Core, WriteOptions))],
            };
            return JsonSerializer.Serialize(bundle, WriteOptions) + "\n";
        }
    }

    /// <summary>
    /// Imports a bundle: each entry is added (new id), changed (new content for a user entry, saved as its next version)
    /// or refused (invalid, a built-in id, a clash); on a dry run nothing is written and the report says what would happen.
    /// Versions inside the bundle are ignored.
    /// </summary>
    public ImportReport ImportBundle(string json, bool dryRun)
    {
        ArgumentNullException.ThrowIfNull(json);
        CatalogueBundle? bundle;
        try
        {
            bundle = JsonSerializer.Deserialize<CatalogueBundle>(json, CatalogueJson.Options);
        }
        catch (JsonException e)
        {
            return BundleRefused(dryRun, EntryParser.FieldOf(JsonErrorText.PathOf(e)), JsonErrorText.ReasonOf(e));
        }

        if (bundle?.Format != CatalogueBundle.FormatName || bundle.FormatVersion != 1)
        {
            return BundleRefused(dryRun, "format", $"Not a catalogue bundle: expected \"format\": \"{CatalogueBundle.FormatName}\" and \"formatVersion\": 1.");
        }

        lock (_gate)
        {
            try
            {
                return Import(bundle, dryRun);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                return BundleRefused(dryRun, string.Empty, StorageMessage(e), StoreOutcome.StorageFailed);
            }
        }
    }

    private ImportReport Import(CatalogueBundle bundle, bool dryRun)
    {
        var catalogue = Snapshot(out _);
        var materials = catalogue.MaterialsById.ToDictionary(p => p.Key, p => p.Value, StringComparer.Ordinal);
        var seen = new HashSet<string>(StringComparer.Ordinal);
        var items = new List<ImportItem>();
        var writes = new List<(CatalogueEntryKind Kind, string Id, EntryParseResult Entry, CurrentFile? Current)>();
        var lists = new[] { (CatalogueEntryKind.Material, bundle.Materials), (CatalogueEntryKind.Core, bundle.Cores) };
        foreach (var (kind, list) in lists)
        {
            foreach (var (element, index) in (list ?? []).Select((e, i) => (e, i)))
            {
                var parsed = EntryParser.Parse(element.GetRawText());
                var id = parsed.Id ?? string.Empty;
                var errors = new List<FieldError>();
                CurrentFile? current = null;
                if (!parsed.Succeeded)
                {
                    errors.Add(new FieldError(EntryParser.FieldOf(parsed.ErrorPath!), parsed.ErrorReason!));
                }
                else if (parsed.Kind != kind.Word())
                {
                    errors.Add(new FieldError("kind", $"Listed under {kind.Folder()}, so the kind must be \"{kind.Word()}\"."));
                }
                else if (!seen.Add(id))
                {
                    errors.Add(new FieldError("id", $"The id '{id}' appears more than once in the bundle."));
                }
                else if (EntryId.IsValid(id) && IdClash(kind, id) is { } clash)
                {
                    errors.Add(new FieldError("id", clash));
                }
                else
                {
                    current = EntryId.IsValid(id) ? Current(kind, id) : null;
                    var validator = new FieldValidator();
                    if (kind == CatalogueEntryKind.Material && CatalogueLoader.ToMaterial(validator, parsed.Material!, builtIn: false, 1) is { } material)
                    {
                        materials[id] = material;
                    }
                    else if (kind == CatalogueEntryKind.Core)
                    {
                        CatalogueLoader.ToCore(validator, parsed.Core!, materials, builtIn: false, 1);
                    }

                    errors.AddRange(validator.Errors);
                }

                if (errors.Count > 0)
                {
                    items.Add(new ImportItem(kind, id, ImportAction.Refuse, null, null, errors));
                    continue;
                }

                if (current is not null && SameContent(kind, parsed, EntryParser.Parse(current.Text)))
                {
                    items.Add(new ImportItem(kind, id, ImportAction.Unchanged, current.Version, current.Version, []));
                    continue;
                }

                var next = NextVersion(kind, id, current);
                items.Add(new ImportItem(kind, id, current is null ? ImportAction.Add : ImportAction.Change, current?.Version, next, []));
                writes.Add((kind, id, parsed, current));
            }
        }

        if (!dryRun)
        {
            foreach (var (kind, id, entry, current) in writes)
            {
                Write(kind, id, entry, current);
            }
        }

        return new ImportReport(dryRun, StoreOutcome.Ok, [], items);
    }

    private StoreResult CreateLocked(CatalogueEntryKind kind, EntryParseResult parsed)
    {
        var id = parsed.Id ?? string.Empty;
        if (parsed.Succeeded && EntryId.IsValid(id))
        {
            if (IdClash(kind, id) is { } clash)
            {
                return StoreResult.Fail(StoreOutcome.AlreadyExists, id, clash);
            }

            if (Current(kind, id) is { } existing)
            {
                return StoreResult.Fail(StoreOutcome.AlreadyExists, id,
                    $"You already have a {kind.Word()} '{id}' (version {existing.Version}): open it to change it, or choose another id.", existing.Version);
            }
        }

        return Save(kind, id, parsed, current: null);
    }

    /// <summary>Why <paramref name="id"/> cannot be used by a user entry of <paramref name="kind"/> (built in, or a user entry of the other kind), or null.</summary>
    private string? IdClash(CatalogueEntryKind kind, string id)
    {
        if (BuiltInFile(CatalogueEntryKind.Material, id) is not null || BuiltInFile(CatalogueEntryKind.Core, id) is not null)
        {
            return $"The id '{id}' belongs to a built-in entry: choose another id (or clone the built-in entry under a new id).";
        }

        var other = kind == CatalogueEntryKind.Material ? CatalogueEntryKind.Core : CatalogueEntryKind.Material;
        return File.Exists(EntryPath(other, id)) ? $"The id '{id}' is already used by your {other.Word()} '{id}': choose another id." : null;
    }

    /// <summary>Checks that a user entry exists, is not built in and is at <paramref name="expectedVersion"/>.</summary>
    private StoreResult? CheckExisting(CatalogueEntryKind kind, string id, int expectedVersion, out CurrentFile? current)
    {
        current = null;
        if (BuiltInFile(kind, id) is not null)
        {
            return StoreResult.Fail(StoreOutcome.ReadOnly, id, $"The {kind.Word()} '{id}' is built in, and built-in entries are read-only: clone it to make your own copy.", 0);
        }

        current = Current(kind, id);
        if (current is null)
        {
            return StoreResult.Fail(StoreOutcome.NotFound, id, NotFoundMessage(kind, id));
        }

        return current.Version != expectedVersion
            ? StoreResult.Fail(StoreOutcome.Conflict, id,
                $"The {kind.Word()} '{id}' has changed since you opened it: version {current.Version} is current (you opened version {expectedVersion}). Reload it and make your change again.",
                current.Version)
            : null;
    }

    /// <summary>Validates an entry for <paramref name="kind"/> and <paramref name="id"/> and saves it as the next version.</summary>
    private StoreResult Save(CatalogueEntryKind kind, string id, EntryParseResult parsed, CurrentFile? current)
    {
        var errors = new List<FieldError>();
        if (!parsed.Succeeded)
        {
            errors.Add(new FieldError(EntryParser.FieldOf(parsed.ErrorPath!), parsed.ErrorReason!));
            return StoreResult.Refused(id, errors);
        }

        if (parsed.Kind != kind.Word())
        {
            return StoreResult.Refused(id, [new FieldError("kind", $"This is a {kind.Word()}: the kind must be \"{kind.Word()}\".")]);
        }

        if (parsed.Id is null)
        {
            SetCommon(parsed, id, null);
        }
        else if (parsed.Id != id)
        {
            return StoreResult.Refused(id, [new FieldError("id", $"The id cannot change (it is '{id}'): clone the entry to give it a new id.")]);
        }

        var validator = new FieldValidator();
        if (parsed.Material is not null)
        {
            CatalogueLoader.ToMaterial(validator, parsed.Material, builtIn: false, 1);
        }
        else
        {
            CatalogueLoader.ToCore(validator, parsed.Core!, Snapshot(out _).MaterialsById, builtIn: false, 1);
        }

        if (!validator.IsValid)
        {
            return StoreResult.Refused(id, validator.Errors);
        }

        var version = Write(kind, id, parsed, current);
        return new StoreResult(StoreOutcome.Ok, id, version, $"Saved the {kind.Word()} '{id}' as version {version}.", []);
    }

    /// <summary>Writes a validated entry as the next version, keeping the current one in the history first.</summary>
    private int Write(CatalogueEntryKind kind, string id, EntryParseResult entry, CurrentFile? current)
    {
        var version = NextVersion(kind, id, current);
        if (current is not null)
        {
            AtomicFile.Write(HistoryPath(kind, id, current.Version), current.Text);
        }

        SetVersion(entry, version, _time.GetUtcNow());
        AtomicFile.Write(EntryPath(kind, id), Serialise(kind, entry));
        return version;
    }

    /// <summary>One more than the highest version saved so far (current or in the history), so no history file is overwritten.</summary>
    private int NextVersion(CatalogueEntryKind kind, string id, CurrentFile? current)
    {
        var history = HistoryVersions(kind, id);
        return Math.Max(current?.Version ?? 0, history.Count == 0 ? 0 : history.Max()) + 1;
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

    private CoreCatalogue Snapshot(out List<LoadedFile> userFiles)
    {
        var problems = new List<CatalogueProblem>();
        userFiles = UserFiles(problems);
        return CatalogueLoader.Build(BuiltIn(), userFiles, [.. _builtInProblems, .. problems]);
    }

    private List<LoadedFile> UserFiles(List<CatalogueProblem> problems) => CatalogueLoader.ReadFolder(CatalogueDirectory, user: true, problems);

    private List<LoadedFile> BuiltIn()
    {
        if (_builtIn is null)
        {
            var problems = new List<CatalogueProblem>();
            _builtIn = CatalogueLoader.ReadFolder(_builtInDirectory, user: false, problems);
            _builtInProblems = problems;
        }

        return _builtIn;
    }

    private LoadedFile? BuiltInFile(CatalogueEntryKind kind, string id) =>
        BuiltIn().FirstOrDefault(f => f.Entry.Id == id && f.Entry.Kind == kind.Word());

    /// <summary>The current user file of an entry, or null; a damaged file counts with the version it states, else 0.</summary>
    private CurrentFile? Current(CatalogueEntryKind kind, string id)
    {
        var path = EntryPath(kind, id);
        if (!File.Exists(path))
        {
            return null;
        }

        var text = File.ReadAllText(path);
        var parsed = EntryParser.Parse(text);
        return new CurrentFile(text, parsed.Succeeded ? parsed.Version ?? 1 : VersionInDamagedText(text));
    }

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

    private List<int> HistoryVersions(CatalogueEntryKind kind, string id)
    {
        var folder = Path.Combine(CatalogueDirectory, CatalogueLoader.HistoryFolder, kind.Folder(), id);
        if (!Directory.Exists(folder))
        {
            return [];
        }

        return [.. Directory.EnumerateFiles(folder, "*.json")
            .Select(f => int.TryParse(Path.GetFileNameWithoutExtension(f), NumberStyles.None, CultureInfo.InvariantCulture, out var v) ? v : -1)
            .Where(v => v >= 0)
            .Order()];
    }

    private string EntryPath(CatalogueEntryKind kind, string id) => Path.Combine(CatalogueDirectory, kind.Folder(), id + ".json");

    private string HistoryPath(CatalogueEntryKind kind, string id, int version) =>
        Path.Combine(CatalogueDirectory, CatalogueLoader.HistoryFolder, kind.Folder(), id, version.ToString(CultureInfo.InvariantCulture) + ".json");

    private static DateTimeOffset? SavedAtOf(string text)
    {
        var parsed = EntryParser.Parse(text);
        return parsed.Material?.SavedAt ?? parsed.Core?.SavedAt;
    }

    private static bool SameContent(CatalogueEntryKind kind, EntryParseResult a, EntryParseResult b)
    {
        if (!b.Succeeded)
        {
            return false;
        }

        var left = EntryParser.Parse(Serialise(kind, a));
        var right = EntryParser.Parse(Serialise(kind, b));
        SetVersion(left, null, null);
        SetVersion(right, null, null);
        return Serialise(kind, left) == Serialise(kind, right);
    }

    private static void SetVersion(EntryParseResult entry, int? version, DateTimeOffset? savedAt)
    {
        if (entry.Material is { } material)
        {
            material.Version = version;
            material.SavedAt = savedAt;
        }
        else
        {
            entry.Core!.Version = version;
            entry.Core.SavedAt = savedAt;
        }
    }

    private static void SetCommon(EntryParseResult entry, string id, string? name)
    {
        if (entry.Material is { } material)
        {
            material.Id = id;
            material.Name = name ?? material.Name;
            material.Version = null;
            material.SavedAt = null;
        }
        else if (entry.Core is { } core)
        {
            core.Id = id;
            core.Name = name ?? core.Name;
            core.Version = null;
            core.SavedAt = null;
        }
    }

    private static string Serialise(CatalogueEntryKind kind, EntryParseResult entry) =>
        (kind == CatalogueEntryKind.Material
            ? JsonSerializer.Serialize(entry.Material, WriteOptions)
            : JsonSerializer.Serialize(entry.Core, WriteOptions)) + "\n";

    private static ImportReport BundleRefused(bool dryRun, string field, string message, StoreOutcome outcome = StoreOutcome.Invalid) =>
        new(dryRun, outcome, [new FieldError(field, message)], []);

    private static string InvalidIdMessage(string? id) => $"'{id}' is not a valid id: {EntryId.Rule}.";

    private static string NotFoundMessage(CatalogueEntryKind kind, string id) => $"There is no {kind.Word()} '{id}'.";

    private static string StorageMessage(Exception e) => "The data folder could not be read or written: " + e.Message;

    /// <summary>A user entry's current file: its text and version.</summary>
    private sealed record CurrentFile(string Text, int Version);
}
