using Winding.Catalogue.Entries;
using Winding.Catalogue.Validation;
using Winding.Core.Windings;

namespace Winding.Catalogue.Loading;

/// <summary>
/// Loads the catalogue: the built-in folder and, optionally, the user's catalogue folder. Every <c>*.json</c> file below
/// a folder (JSON Schema files <c>*.schema.json</c> excluded; in the user folder also the <c>history</c> subfolder) holds
/// one entry, a core (<c>"kind": "core"</c>) or a material (<c>"kind": "material"</c>). A bad file is reported by file
/// name (relative to its folder, user files prefixed <c>user/</c>), JSON path and reason, and everything else still
/// loads. User entries may not reuse a built-in id; user cores may use built-in or user materials, built-in cores only
/// built-in ones.
/// </summary>
public static class CatalogueLoader
{
    /// <summary>Permeability range accepted for a material, 1 to 100 000.</summary>
    public const double MaximumPermeability = 100_000;

    /// <summary>Lower bound (exclusive) of a core's measured AL, nH per turn² (as the plan's <c>measured.alNh</c>).</summary>
    public const double MinimumMeasuredAlNh = 0.01;

    /// <summary>Upper bound of a core's measured AL, nH per turn² (as the plan's <c>measured.alNh</c>).</summary>
    public const double MaximumMeasuredAlNh = 1e7;

    /// <summary>Prefix of user file names in problems.</summary>
    public const string UserPrefix = "user/";

    /// <summary>The subfolder of the user catalogue that holds earlier versions; never loaded as entries.</summary>
    public const string HistoryFolder = "history";

    /// <summary>The user catalogue's folder of material files (<c>{id}.json</c>).</summary>
    public const string UserMaterialsFolder = "materials";

    /// <summary>The user catalogue's folder of core files (<c>{id}.json</c>).</summary>
    public const string UserCoresFolder = "cores";

    /// <summary>Loads the built-in catalogue in <paramref name="directory"/> only.</summary>
    public static CoreCatalogue Load(string directory) => Load(directory, null);

    /// <summary>
    /// Loads the built-in catalogue in <paramref name="builtInDirectory"/> and the user entries in
    /// <paramref name="userDirectory"/> (<c>materials/{id}.json</c> and <c>cores/{id}.json</c>; a missing user folder
    /// simply holds no entries).
    /// </summary>
    public static CoreCatalogue Load(string builtInDirectory, string? userDirectory)
    {
        ArgumentNullException.ThrowIfNull(builtInDirectory);
        var problems = new List<CatalogueProblem>();
        var builtIn = ReadFolder(builtInDirectory, user: false, problems);
        var user = userDirectory is null ? [] : ReadFolder(userDirectory, user: true, problems);
        return Build(builtIn, user, problems);
    }

    /// <summary>Reads and parses every entry file of a folder; unreadable files become problems.</summary>
    internal static List<LoadedFile> ReadFolder(string directory, bool user, List<CatalogueProblem> problems)
    {
        var entries = new List<LoadedFile>();
        if (!Directory.Exists(directory))
        {
            if (!user)
            {
                problems.Add(new CatalogueProblem(directory, "$", "The catalogue folder does not exist."));
            }

            return entries;
        }

        var prefix = user ? UserPrefix : string.Empty;
        var files = Directory.EnumerateFiles(directory, "*.json", SearchOption.AllDirectories)
            .Where(f => !f.EndsWith(".schema.json", StringComparison.OrdinalIgnoreCase))
            .Select(f => (Full: f, Relative: Path.GetRelativePath(directory, f).Replace('\\', '/')))
            .Where(f => !user || !f.Relative.StartsWith(HistoryFolder + "/", StringComparison.Ordinal))
            .OrderBy(f => f.Relative, StringComparer.Ordinal);

        foreach (var (full, relative) in files)
        {
            var name = prefix + relative;
            string text;
            try
            {
                text = File.ReadAllText(full);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                problems.Add(new CatalogueProblem(name, "$", "The file could not be read: " + e.Message));
                continue;
            }

            var parsed = EntryParser.Parse(text);
            if (!parsed.Succeeded)
            {
                problems.Add(new CatalogueProblem(name, parsed.ErrorPath!, parsed.ErrorReason!));
                continue;
            }

            if (user && !UserFileNameMatches(relative, parsed, problems, name))
            {
                continue;
            }

            entries.Add(new LoadedFile(name, user, parsed));
        }

        return entries;
    }

    /// <summary>Validates parsed files into a catalogue: built-in materials, built-in cores, user materials, user cores.</summary>
    internal static CoreCatalogue Build(IReadOnlyList<LoadedFile> builtIn, IReadOnlyList<LoadedFile> user, IEnumerable<CatalogueProblem> earlierProblems)
    {
        var problems = new List<CatalogueProblem>(earlierProblems);
        var materials = new Dictionary<string, CatalogueMaterial>(StringComparer.Ordinal);
        var cores = new List<CatalogueCore>();
        var seenIds = new Dictionary<string, LoadedFile>(StringComparer.Ordinal);
        foreach (var group in new[] { builtIn, user })
        {
            foreach (var file in group.Where(f => f.Entry.Material is not null))
            {
                var validator = new FieldValidator();
                var material = ToMaterial(validator, file.Entry.Material!, !file.User, VersionOf(file, validator));
                if (Accept(file, material?.Id, validator, seenIds, problems))
                {
                    materials.Add(material!.Id, material);
                }
            }
        }

        foreach (var group in new[] { builtIn, user })
        {
            foreach (var file in group.Where(f => f.Entry.Core is not null))
            {
                var validator = new FieldValidator();
                var core = ToCore(validator, file.Entry.Core!, materials, !file.User, VersionOf(file, validator));
                if (Accept(file, core?.Id, validator, seenIds, problems))
                {
                    cores.Add(core!);
                }
            }
        }

        return new CoreCatalogue(cores, materials.Values, problems);
    }

    /// <summary>Validates a material document; null (with errors in <paramref name="validator"/>) when refused.</summary>
    internal static CatalogueMaterial? ToMaterial(FieldValidator validator, MaterialEntryDocument document, bool builtIn, int version)
    {
        CheckCommon(validator, document.Id, document.Name);
        var material = MaterialRules.Validate(validator, document);
        return !validator.IsValid || material is null
            ? null
            : new CatalogueMaterial(document.Id!, document.Name!, document.Family!, material, document.Source!, builtIn, version);
    }

    /// <summary>Validates a core document against the materials it may use; null (with errors) when refused.</summary>
    internal static CatalogueCore? ToCore(
        FieldValidator validator, CoreEntryDocument document, IReadOnlyDictionary<string, CatalogueMaterial> materials, bool builtIn, int version)
    {
        CheckCommon(validator, document.Id, document.Name);
        var shape = CoreShapeRules.Validate(validator, string.Empty, document.Shape, document.Family, document.DimensionsMm, document.Effective, document.AlNh);
        CatalogueMaterial? material = null;
        if (string.IsNullOrEmpty(document.MaterialId))
        {
            validator.Add("materialId", "Required: the id of the material this core is made of.");
        }
        else if (!materials.TryGetValue(document.MaterialId, out material))
        {
            validator.Add("materialId", $"No material with the id '{document.MaterialId}' is in the catalogue.");
        }

        var measuredAl = document.MeasuredAlNh is null ? null : validator.Range("measuredAlNh", document.MeasuredAlNh, MinimumMeasuredAlNh, MaximumMeasuredAlNh, "nH", minimumExclusive: true);
        return !validator.IsValid || shape is null || material is null
            ? null
            : new CatalogueCore(document.Id!, document.Name!, shape, material, document.Source ?? string.Empty, builtIn, version)
            {
                MeasuredAl = measuredAl is { } al ? InductanceFactor.FromHenriesPerTurnSquared(al * 1e-9) : null,
            };
    }

    private static int VersionOf(LoadedFile file, FieldValidator validator)
    {
        if (!file.User)
        {
            return 0;
        }

        // A hand-written user file without a version counts as version 1.
        var version = file.Entry.Version ?? 1;
        if (version < 1)
        {
            validator.Add("version", $"{version} is out of range: a saved version is a whole number from 1.");
        }

        return version;
    }

    private static bool Accept(LoadedFile file, string? id, FieldValidator validator, Dictionary<string, LoadedFile> seenIds, List<CatalogueProblem> problems)
    {
        if (!validator.IsValid || id is null)
        {
            foreach (var error in validator.Errors)
            {
                problems.Add(new CatalogueProblem(file.Name, "$." + error.Field, error.Message));
            }

            return false;
        }

        if (seenIds.TryGetValue(id, out var other))
        {
            problems.Add(new CatalogueProblem(file.Name, "$.id", file.User && !other.User
                ? $"The id '{id}' is already used by the built-in entry {other.Name}: a user entry needs an id of its own (clone the built-in entry under a new id)."
                : $"The id '{id}' is already used by {other.Name}."));
            return false;
        }

        seenIds.Add(id, file);
        return true;
    }

    private static bool UserFileNameMatches(string relative, EntryParseResult entry, List<CatalogueProblem> problems, string name)
    {
        var folder = entry.Material is not null ? UserMaterialsFolder : UserCoresFolder;
        if (EntryId.IsValid(entry.Id) && relative == $"{folder}/{entry.Id}.json")
        {
            return true;
        }

        problems.Add(new CatalogueProblem(name, "$.id", EntryId.IsValid(entry.Id)
            ? $"A user {entry.Kind} file must be named after its id: expected {UserPrefix}{folder}/{entry.Id}.json."
            : $"'{entry.Id}' is not a valid id: {EntryId.Rule}."));
        return false;
    }

    private static void CheckCommon(FieldValidator validator, string? id, string? name)
    {
        if (!EntryId.IsValid(id))
        {
            validator.Add("id", $"'{id}' is not a valid id: {EntryId.Rule}.");
        }

        if (string.IsNullOrWhiteSpace(name) || name.Length > 120)
        {
            validator.Add("name", "Required: a name of 1 to 120 characters.");
        }
    }
}
