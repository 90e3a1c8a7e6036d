using System.Globalization;
using System.Text.Json;
using Winding.Catalogue.Entries;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Store;
using Winding.Web.Display;
using Winding.Web.Hosting;

namespace Winding.Web.Cataloguing;

/// <summary>
/// Edits one catalogue entry on a detail page: the form's fields as typed, the version the form was opened at (a save
/// against a newer version is refused as a conflict, never silently overwritten), clone, delete, history and restore.
/// Built-in entries are read-only: they can only be cloned.
/// </summary>
public sealed class EntryEditor
{
    private readonly CatalogueProvider _provider;
    private readonly Dictionary<string, string> _errors = new(StringComparer.Ordinal);
    private readonly Dictionary<string, string> _dimensions = new(StringComparer.Ordinal);

    /// <summary>Opens the editor on an entry.</summary>
    public EntryEditor(CatalogueProvider provider, CatalogueEntryKind kind, string id)
    {
        ArgumentNullException.ThrowIfNull(provider);
        _provider = provider;
        Kind = kind;
        Id = id;
        Open();
    }

    /// <summary>Core or material.</summary>
    public CatalogueEntryKind Kind { get; }

    /// <summary>The entry's id.</summary>
    public string Id { get; }

    /// <summary>True when the entry exists.</summary>
    public bool Found { get; private set; }

    /// <summary>True for a built-in (read-only) entry.</summary>
    public bool BuiltIn { get; private set; }

    /// <summary>The version the form was opened at.</summary>
    public int Version { get; private set; }

    /// <summary>Name as typed.</summary>
    public string Name { get; set; } = string.Empty;

    /// <summary>Source as typed.</summary>
    public string Source { get; set; } = string.Empty;

    /// <summary>Core: material id.</summary>
    public string MaterialId { get; set; } = string.Empty;

    /// <summary>Material: μi as typed.</summary>
    public string InitialPermeability { get; set; } = string.Empty;

    /// <summary>Material: AL tolerance in percent as typed.</summary>
    public string AlTolerancePercent { get; set; } = string.Empty;

    /// <summary>Material: B_sat at 25 °C in T as typed.</summary>
    public string SaturationAt25C { get; set; } = string.Empty;

    /// <summary>Material: B_sat at 100 °C in T as typed.</summary>
    public string SaturationAt100C { get; set; } = string.Empty;

    /// <summary>Material: Curie temperature in °C as typed.</summary>
    public string CurieTemperature { get; set; } = string.Empty;

    /// <summary>Material: resistivity in Ω·m as typed.</summary>
    public string Resistivity { get; set; } = string.Empty;

    /// <summary>
    /// Core: the shape's dimension fields (name → text as typed: a plain number is mm, a typed unit wins,
    /// <see cref="LengthText"/>), in the order the shape uses them.
    /// </summary>
    public IReadOnlyDictionary<string, string> Dimensions => _dimensions;

    /// <summary>Versions kept for this entry.</summary>
    public IReadOnlyList<EntryVersion> History { get; private set; } = [];

    /// <summary>The message of the last action.</summary>
    public string? Message { get; private set; }

    /// <summary>True when the last action succeeded.</summary>
    public bool Succeeded { get; private set; }

    /// <summary>True when the last save was refused because someone else saved first.</summary>
    public bool Conflict { get; private set; }

    /// <summary>The error at a field (document path), or null.</summary>
    public string? ErrorFor(string field) => _errors.GetValueOrDefault(field);

    /// <summary>Sets one dimension field.</summary>
    public void SetDimension(string name, string text) => _dimensions[name] = text;

    /// <summary>Reloads the form from the stored entry (drops unsaved changes).</summary>
    public void Open()
    {
        _errors.Clear();
        _dimensions.Clear();
        Conflict = false;
        var read = _provider.Store.Read(Kind, Id);
        Found = read.Json is not null;
        if (read.Json is null)
        {
            return;
        }

        BuiltIn = read.BuiltIn;
        Version = read.Version ?? 0;
        if (Kind == CatalogueEntryKind.Core)
        {
            var core = JsonSerializer.Deserialize<CoreEntryDocument>(read.Json, CatalogueJson.Options)!;
            Name = core.Name ?? string.Empty;
            Source = core.Source ?? string.Empty;
            MaterialId = core.MaterialId ?? string.Empty;
            foreach (var (name, value) in DimensionFields(core.Shape, core.DimensionsMm))
            {
                _dimensions[name] = LengthText.ForDraft(value);
            }
        }
        else
        {
            var material = JsonSerializer.Deserialize<MaterialEntryDocument>(read.Json, CatalogueJson.Options)!;
            Name = material.Name ?? string.Empty;
            Source = material.Source ?? string.Empty;
            InitialPermeability = material.InitialPermeability?.ToString("0.####", CultureInfo.InvariantCulture) ?? string.Empty;
            AlTolerancePercent = (material.AlTolerancePercent ?? 25).ToString("0.##", CultureInfo.InvariantCulture);
            SaturationAt25C = Show(material.SaturationFluxDensityT?.At25C);
            SaturationAt100C = Show(material.SaturationFluxDensityT?.At100C);
            CurieTemperature = Show(material.CurieTemperatureC);
            Resistivity = Show(material.ResistivityOhmM);
        }

        History = BuiltIn ? [] : _provider.Store.History(Kind, Id).Versions;
    }

    /// <summary>Saves the form against the version it was opened at.</summary>
    public void Save()
    {
        _errors.Clear();
        Conflict = false;
        var read = _provider.Store.Read(Kind, Id, Version);
        if (read.Json is null)
        {
            Report(false, read.Message);
            return;
        }

        string json;
        if (Kind == CatalogueEntryKind.Core)
        {
            var core = JsonSerializer.Deserialize<CoreEntryDocument>(read.Json, CatalogueJson.Options)!;
            core.Name = Name;
            core.Source = Source;
            core.MaterialId = MaterialId;
            core.DimensionsMm ??= new DimensionsMmDocument();
            foreach (var (name, text) in _dimensions)
            {
                var value = ParseLength($"dimensionsMm.{name}", text);
                typeof(DimensionsMmDocument).GetProperty(char.ToUpperInvariant(name[0]) + name[1..])!.SetValue(core.DimensionsMm, value);
            }

            json = JsonSerializer.Serialize(core, CatalogueJson.Options);
        }
        else
        {
            var material = JsonSerializer.Deserialize<MaterialEntryDocument>(read.Json, CatalogueJson.Options)!;
            material.Name = Name;
            material.Source = Source;
            material.InitialPermeability = Parse("initialPermeability", InitialPermeability);
            material.AlTolerancePercent = Parse("alTolerancePercent", AlTolerancePercent);
            var at25 = Parse("saturationFluxDensityT.at25C", SaturationAt25C);
            var at100 = Parse("saturationFluxDensityT.at100C", SaturationAt100C);
            material.SaturationFluxDensityT = at25 is null && at100 is null ? null : new SaturationFluxDensityDocument { At25C = at25, At100C = at100 };
            material.CurieTemperatureC = Parse("curieTemperatureC", CurieTemperature);
            material.ResistivityOhmM = Parse("resistivityOhmM", Resistivity);
            json = JsonSerializer.Serialize(material, CatalogueJson.Options);
        }

        if (_errors.Count > 0)
        {
            Report(false, "Correct the marked fields.");
            return;
        }

        var result = _provider.Store.Update(Kind, Id, json, Version);
        Conflict = result.Outcome == StoreOutcome.Conflict;
        foreach (var error in result.Errors)
        {
            _errors.TryAdd(error.Field, error.Message);
        }

        if (result.Succeeded)
        {
            _provider.Reload();
            Version = result.Version ?? Version;
            History = _provider.Store.History(Kind, Id).Versions;
        }

        Report(result.Succeeded, result.Succeeded ? $"Saved as version {Version}." : result.Message);
    }

    /// <summary>Clones the entry as <paramref name="newId"/>; returns the new id on success.</summary>
    public string? Clone(string newId, string newName)
    {
        var result = _provider.Store.Clone(Kind, Id, newId, newName);
        if (result.Succeeded)
        {
            _provider.Reload();
        }

        Report(result.Succeeded, result.Succeeded ? $"Cloned as '{newName}'." : result.Message + " " + string.Join(" ", result.Errors.Select(e => e.Message)));
        return result.Succeeded ? result.Id : null;
    }

    /// <summary>Deletes the entry (the version the form was opened at).</summary>
    public bool Delete()
    {
        var result = _provider.Store.Delete(Kind, Id, Version);
        if (result.Succeeded)
        {
            _provider.Reload();
        }

        Conflict = result.Outcome == StoreOutcome.Conflict;
        Report(result.Succeeded, result.Succeeded ? "Deleted. Its last version is kept in the history." : result.Message);
        return result.Succeeded;
    }

    /// <summary>Restores an earlier version as a new version.</summary>
    public void Restore(int version)
    {
        var result = _provider.Store.Restore(Kind, Id, version, Version);
        if (result.Succeeded)
        {
            _provider.Reload();
            Open();
        }

        Conflict = result.Outcome == StoreOutcome.Conflict;
        Report(result.Succeeded, result.Succeeded ? $"Version {version} restored as version {Version}." : result.Message);
    }

    /// <summary>A free id for a copy of this entry.</summary>
    public string SuggestCloneId()
    {
        var catalogue = _provider.Catalogue;
        for (var n = 1; n < 1000; n++)
        {
            var candidate = string.Create(CultureInfo.InvariantCulture, $"{Id}-copy{(n == 1 ? string.Empty : "-" + n)}");
            if (!catalogue.CoresById.ContainsKey(candidate) && !catalogue.MaterialsById.ContainsKey(candidate) && candidate.Length <= 80)
            {
                return candidate;
            }
        }

        return Id + "-copy-" + Guid.NewGuid().ToString("N")[..6];
    }

    private static string Show(double? value) => value?.ToString("G6", CultureInfo.InvariantCulture) ?? string.Empty;

    private double? Parse(string field, string text)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            return null;
        }

        var value = EngineeringNumber.TryParse(text, string.Empty);
        if (value is null)
        {
            _errors[field] = $"'{text.Trim()}' is not a number.";
        }

        return value;
    }

    private double? ParseLength(string field, string text)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            return null;
        }

        var reading = LengthText.Read(text, LengthUnit.Millimetre);
        if (reading.Millimetres is null)
        {
            _errors[field] = $"'{text.Trim()}' {reading.Problem}.";
        }

        return reading.Millimetres;
    }

    private void Report(bool succeeded, string message)
    {
        Succeeded = succeeded;
        Message = message;
    }

    private static IEnumerable<(string Name, double? Value)> DimensionFields(string? shape, DimensionsMmDocument? d)
    {
        d ??= new DimensionsMmDocument();
        return shape switch
        {
            CoreShapes.Toroid => [("outerDiameter", d.OuterDiameter), ("innerDiameter", d.InnerDiameter), ("height", d.Height), ("coatingThickness", d.CoatingThickness)],
            CoreShapes.Sleeve => [("outerDiameter", d.OuterDiameter), ("innerDiameter", d.InnerDiameter), ("length", d.Length), ("residualGap", d.ResidualGap)],
            CoreShapes.TwoHole => [("length", d.Length), ("holeDiameter", d.HoleDiameter), ("holeSpacing", d.HoleSpacing), ("width", d.Width), ("height", d.Height)],
            _ => [("windowBreadth", d.WindowBreadth), ("windowHeight", d.WindowHeight), ("legDiameter", d.LegDiameter), ("legWidth", d.LegWidth), ("legDepth", d.LegDepth), ("bobbinWall", d.BobbinWall)],
        };
    }
}
