using System.Globalization;
using System.Text.Json;
using Winding.Catalogue.Characterisation;
using Winding.Catalogue.Entries;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Store;
using Winding.Catalogue.Validation;
using Winding.Web.Display;
using Winding.Web.Hosting;

namespace Winding.Web.Characterising;

/// <summary>
/// The "measure a salvaged core" page's view model: the caliper reading and the test winding's measurement as typed, the
/// characterisation (through the same <see cref="CharacterisationReader"/> as the API), and saving the result as a new
/// material and core in the user's catalogue with the measurement kept as their provenance.
/// </summary>
public sealed class CharacterisationState
{
    private readonly CatalogueProvider _catalogue;
    private readonly TimeProvider _time;
    private readonly Dictionary<string, string> _errors = new(StringComparer.Ordinal);

    /// <summary>Creates the state with an empty form for a split sleeve.</summary>
    public CharacterisationState(CatalogueProvider catalogue, TimeProvider time)
    {
        ArgumentNullException.ThrowIfNull(catalogue);
        ArgumentNullException.ThrowIfNull(time);
        _catalogue = catalogue;
        _time = time;
    }

    /// <summary><c>toroid</c> or <c>sleeve</c>.</summary>
    public string Shape { get; set; } = CoreShapes.Sleeve;

    /// <summary>Outer diameter as typed (a plain number is mm; a typed unit wins, <see cref="LengthText"/>).</summary>
    public string OuterDiameter { get; set; } = string.Empty;

    /// <summary>Inner diameter or bore as typed, like the outer diameter.</summary>
    public string InnerDiameter { get; set; } = string.Empty;

    /// <summary>Height of a toroid or length of a sleeve as typed, like the outer diameter.</summary>
    public string Length { get; set; } = string.Empty;

    /// <summary>Residual gap of a split sleeve as typed, like the outer diameter; empty for a solid core.</summary>
    public string ResidualGap { get; set; } = string.Empty;

    /// <summary>Turns of the test winding as typed.</summary>
    public string Turns { get; set; } = string.Empty;

    /// <summary>Measurement frequency as typed (Hz, SI prefixes allowed).</summary>
    public string Frequency { get; set; } = "100 kHz";

    /// <summary>Measured inductance as typed (H, SI prefixes allowed).</summary>
    public string Inductance { get; set; } = string.Empty;

    /// <summary>Measured Q as typed (optional).</summary>
    public string Quality { get; set; } = string.Empty;

    /// <summary>The name to save under.</summary>
    public string SaveName { get; set; } = string.Empty;

    /// <summary>Impedances read from an uploaded Touchstone file (empty when none).</summary>
    public IReadOnlyList<ImpedancePointDocument> Impedances { get; private set; } = [];

    /// <summary>What the uploaded file held, or why it was refused.</summary>
    public string? FileMessage { get; private set; }

    /// <summary>Reads a Touchstone version 1 one-port file of the test winding (refused with its line number when malformed).</summary>
    public void LoadTouchstone(string fileName, string text)
    {
        var parsed = Winding.Catalogue.Touchstone.TouchstoneFile.Parse(text);
        if (!parsed.IsValid)
        {
            Impedances = [];
            FileMessage = $"{fileName}: " + (parsed.Error!.LineNumber is { } line ? string.Create(CultureInfo.InvariantCulture, $"line {line}: ") : string.Empty) + parsed.Error.Reason;
            return;
        }

        Impedances = [.. parsed.File!.Points.Where(p => p.FrequencyHz > 0).Select(p => new ImpedancePointDocument { FrequencyHz = p.FrequencyHz, Re = p.ImpedanceOhm.Real, Im = p.ImpedanceOhm.Imaginary })];
        FileMessage = string.Create(CultureInfo.InvariantCulture, $"{fileName}: {Impedances.Count} points from {EngineeringFormat.Format(Impedances[0].FrequencyHz ?? 0, "Hz")} to {EngineeringFormat.Format(Impedances[^1].FrequencyHz ?? 0, "Hz")}.");
    }

    /// <summary>
    /// Reads impedances typed one per line as "frequency  R  X" (SI prefixes allowed, e.g. "1M 0.75 43.55"); blank lines
    /// and lines starting with '!' or '#' are skipped. A bad line is reported with its number.
    /// </summary>
    public void LoadTypedImpedances(string text)
    {
        var points = new List<ImpedancePointDocument>();
        var lines = (text ?? string.Empty).Split('\n');
        for (var i = 0; i < lines.Length; i++)
        {
            var line = lines[i].Trim();
            if (line.Length == 0 || line.StartsWith('!') || line.StartsWith('#'))
            {
                continue;
            }

            var parts = line.Split([' ', '\t', ';'], StringSplitOptions.RemoveEmptyEntries);
            var f = parts.Length == 3 ? EngineeringNumber.TryParse(parts[0], "Hz") : null;
            var r = parts.Length == 3 ? EngineeringNumber.TryParse(parts[1], "Ω") : null;
            var x = parts.Length == 3 ? EngineeringNumber.TryParse(parts[2], "Ω") : null;
            if (f is null || r is null || x is null || !(f > 0))
            {
                Impedances = [];
                FileMessage = string.Create(CultureInfo.InvariantCulture, $"Line {i + 1}: write three numbers, frequency, R and X (e.g. 1M 0.75 43.55).");
                return;
            }

            points.Add(new ImpedancePointDocument { FrequencyHz = f, Re = r, Im = x });
        }

        Impedances = [.. points.OrderBy(p => p.FrequencyHz)];
        FileMessage = string.Create(CultureInfo.InvariantCulture, $"{Impedances.Count} typed points.");
    }

    /// <summary>The latest characterisation.</summary>
    public CharacterisationResult? Result { get; private set; }

    /// <summary>The core id saved last, if any.</summary>
    public string? SavedCoreId { get; private set; }

    /// <summary>A message about the last save.</summary>
    public string? SaveMessage { get; private set; }

    /// <summary>The error at a field path, or null.</summary>
    public string? ErrorFor(string path) => _errors.GetValueOrDefault(path);

    /// <summary>Works the measurement out; field errors otherwise.</summary>
    public void Characterise()
    {
        _errors.Clear();
        Result = null;
        SavedCoreId = null;
        SaveMessage = null;
        var document = new CharacteriseDocument
        {
            Core = new CharacteriseCoreDocument
            {
                Shape = Shape,
                DimensionsMm = Shape == CoreShapes.Toroid
                    ? new DimensionsMmDocument { OuterDiameter = LengthMm("core.dimensionsMm.outerDiameter", OuterDiameter), InnerDiameter = LengthMm("core.dimensionsMm.innerDiameter", InnerDiameter), Height = LengthMm("core.dimensionsMm.height", Length) }
                    : new DimensionsMmDocument { OuterDiameter = LengthMm("core.dimensionsMm.outerDiameter", OuterDiameter), InnerDiameter = LengthMm("core.dimensionsMm.innerDiameter", InnerDiameter), Length = LengthMm("core.dimensionsMm.length", Length), ResidualGap = string.IsNullOrWhiteSpace(ResidualGap) ? null : LengthMm("core.dimensionsMm.residualGap", ResidualGap) },
            },
            Turns = (int?)Number("turns", Turns, string.Empty),
            FrequencyHz = Number("frequencyHz", Frequency, "Hz"),
            InductanceH = Impedances.Count > 0 && string.IsNullOrWhiteSpace(Inductance) ? null : Number("inductanceH", Inductance, "H"),
            QualityFactor = string.IsNullOrWhiteSpace(Quality) ? null : Number("qualityFactor", Quality, string.Empty),
            Impedances = [.. Impedances],
        };
        if (document.InductanceH is null)
        {
            document.FrequencyHz = null;
            _errors.Remove("frequencyHz");
        }
        if (_errors.Count > 0)
        {
            return;
        }

        var (result, errors) = CharacterisationReader.Read(document, _catalogue.Catalogue);
        foreach (var error in errors)
        {
            _errors.TryAdd(error.Field, error.Message);
        }

        Result = result;
        if (result is not null && string.IsNullOrWhiteSpace(SaveName))
        {
            SaveName = DefaultName();
        }
    }

    /// <summary>Saves the characterised core and its measured material to the user's catalogue.</summary>
    public void Save()
    {
        var measuredMu = Result?.FromInductance?.EffectivePermeability ?? (Result?.Fit is { Converged: true } f ? f.Parameters.InitialPermeability : (double?)null);
        if (Result is null || measuredMu is null || string.IsNullOrWhiteSpace(SaveName))
        {
            SaveMessage = "Work the measurement out first, and give it a name.";
            return;
        }

        var nearest = Result.NearestClasses.Count > 0 ? Result.NearestClasses[0] : null;

        // The measured μe of a split sleeve includes its residual gap; the material keeps the intrinsic μi, found by
        // inverting μe = μi/(1 + μi·g/le) (Snelling 1988): μi = μe/(1 − μe·g/le). Where the gap alone would explain
        // the measurement the gap is left out and the measured μe kept.
        var gapMm = Shape == CoreShapes.Sleeve && !string.IsNullOrWhiteSpace(ResidualGap) ? LengthMm("x", ResidualGap) ?? 0 : 0;
        var share = measuredMu.Value * gapMm * 1e-3 / Result.Effective.EffectiveLengthM;
        var keepGap = gapMm > 0 && share < 0.95;
        var intrinsicMu = keepGap ? measuredMu.Value / (1 - share) : measuredMu.Value;

        // A converged relaxation fit of measured impedances becomes the material's μ′(f), μ″(f) table, scaled to the
        // intrinsic μi like the single value above.
        List<PermeabilityPointDocument?>? table = null;
        if (Result.Fit is { Converged: true } fit)
        {
            var scale = intrinsicMu / fit.Parameters.InitialPermeability;
            table = [.. fit.Curve.Points.Select(p => (PermeabilityPointDocument?)new PermeabilityPointDocument { FrequencyHz = p.FrequencyHz, Real = Math.Round(p.MuPrime * scale, 6), Imaginary = Math.Round(p.MuDoublePrime * scale, 6) })];
        }
        var family = nearest is not null && _catalogue.Catalogue.MaterialsById.TryGetValue(nearest.Id, out var near) ? near.Family : "NiZn";
        var slug = Slug(SaveName);
        var when = _time.GetUtcNow().ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);
        var provenance = string.IsNullOrWhiteSpace(Inductance)
            ? string.Create(CultureInfo.InvariantCulture, $"Measured {when}: {Turns.Trim()} turns, impedance sweep; μ from Z = jω·N²·(μ0/C1)·(μ′ − jμ″) (IEC 60401-3 notation).")
            : string.Create(CultureInfo.InvariantCulture, $"Measured {when}: {Turns.Trim()} turns, {Inductance.Trim()} at {Frequency.Trim()}{(string.IsNullOrWhiteSpace(Quality) ? string.Empty : ", Q " + Quality.Trim())}; AL = L/N², μe = AL·C1/μ0 (IEC 62044-2 relations).");
        var material = new MaterialEntryDocument
        {
            Kind = "material",
            Id = slug + "-material",
            Name = string.Create(CultureInfo.InvariantCulture, $"{family}, μi {intrinsicMu:0} ({SaveName.Trim()})"),
            Family = family,
            InitialPermeability = Math.Round(intrinsicMu, 6),
            Permeability = table,
            Source = provenance + (table is null ? string.Empty : string.Create(CultureInfo.InvariantCulture, $" μ′(f), μ″(f): Cole–Cole fit of {Impedances.Count} measured impedances (RMS residual {Result.Fit!.RmsRelativeResidual:P1}).")),
        };
        var materialResult = _catalogue.Store.Create(CatalogueEntryKind.Material, JsonSerializer.Serialize(material, CatalogueJson.Options));
        if (!materialResult.Succeeded)
        {
            SaveMessage = materialResult.Message + " " + string.Join(" ", materialResult.Errors.Select(e => e.Field + ": " + e.Message));
            return;
        }

        var core = new CoreEntryDocument
        {
            Kind = "core",
            Id = slug,
            Name = SaveName.Trim(),
            Shape = Shape,
            DimensionsMm = Shape == CoreShapes.Toroid
                ? new DimensionsMmDocument { OuterDiameter = LengthMm("x", OuterDiameter), InnerDiameter = LengthMm("x", InnerDiameter), Height = LengthMm("x", Length) }
                : new DimensionsMmDocument { OuterDiameter = LengthMm("x", OuterDiameter), InnerDiameter = LengthMm("x", InnerDiameter), Length = LengthMm("x", Length), ResidualGap = keepGap ? gapMm : null },
            MaterialId = material.Id,
            Source = "Caliper reading and test winding. " + provenance,
        };
        var coreResult = _catalogue.Store.Create(CatalogueEntryKind.Core, JsonSerializer.Serialize(core, CatalogueJson.Options));
        _catalogue.Reload();
        if (!coreResult.Succeeded)
        {
            SaveMessage = coreResult.Message + " " + string.Join(" ", coreResult.Errors.Select(e => e.Field + ": " + e.Message));
            return;
        }

        SavedCoreId = core.Id;
        SaveMessage = $"Saved as '{core.Name}' with its material '{material.Name}'.";
    }

    private string DefaultName()
    {
        var word = Shape == CoreShapes.Toroid ? "Toroid" : string.IsNullOrWhiteSpace(ResidualGap) ? "Sleeve" : "Split sleeve";
        return $"{word} {OuterDiameter.Trim()} × {InnerDiameter.Trim()} × {Length.Trim()} mm (bench)";
    }

    private static string Slug(string name)
    {
        var chars = name.ToLowerInvariant().Select(c => char.IsAsciiLetterOrDigit(c) ? c : '-').ToArray();
        var slug = string.Join('-', new string(chars).Split('-', StringSplitOptions.RemoveEmptyEntries));
        slug = slug.Length > 60 ? slug[..60].Trim('-') : slug;
        return EntryId.IsValid(slug) ? slug : "salvaged-core";
    }

    /// <summary>A caliper dimension as typed (a plain number is mm; "0.5 in", "20 mil" carry their unit) in mm.</summary>
    private double? LengthMm(string path, string text)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            _errors[path] = "Required.";
            return null;
        }

        var reading = LengthText.Read(text, LengthUnit.Millimetre);
        if (reading.Millimetres is null)
        {
            _errors[path] = $"'{text.Trim()}' {reading.Problem}.";
        }

        return reading.Millimetres;
    }

    private double? Number(string path, string text, string unit)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            _errors[path] = "Required.";
            return null;
        }

        var value = EngineeringNumber.TryParse(text, unit);
        if (value is null)
        {
            _errors[path] = $"'{text.Trim()}' is not a number{(unit.Length > 0 ? " in " + unit : string.Empty)}.";
        }

        return value;
    }
}
