using System.Globalization;
using Winding.Catalogue.Entries;
using Winding.Catalogue.Plans;
using Winding.Catalogue.Validation;
using Winding.Core.Plans;
using Winding.Web.Hosting;

namespace Winding.Web.Planning;

/// <summary>
/// The planning page's view model (one per circuit): the user's inputs as typed, the field errors, and the evaluation.
/// It builds the same <see cref="PlanDocument"/> the API takes and reads it through the same <see cref="PlanReader"/>,
/// so the page and the API agree. Inputs are parsed with the invariant culture (a decimal comma is accepted too).
/// </summary>
public sealed class PlanningState
{
    private readonly CatalogueProvider _catalogue;
    private readonly Dictionary<PlanField, string> _errors = [];

    /// <summary>Creates the state with the first catalogue core selected and a small starting winding.</summary>
    public PlanningState(CatalogueProvider catalogue)
    {
        ArgumentNullException.ThrowIfNull(catalogue);
        _catalogue = catalogue;
        CoreId = Cores.Count > 0 ? Cores[0].Id : null;
        Recalculate();
    }

    /// <summary>The cores to pick from.</summary>
    public IReadOnlyList<CatalogueCore> Cores => _catalogue.Catalogue.Cores;

    /// <summary>The selected catalogue core id.</summary>
    public string? CoreId { get; private set; }

    /// <summary>The selected core, if any.</summary>
    public CatalogueCore? SelectedCore => CoreId is not null && _catalogue.Catalogue.CoresById.TryGetValue(CoreId, out var c) ? c : null;

    /// <summary>Turns as typed.</summary>
    public string TurnsText { get; private set; } = "10";

    /// <summary>Conductor diameter in mm as typed.</summary>
    public string ConductorDiameterText { get; private set; } = "0.5";

    /// <summary>Overall diameter in mm as typed (empty: assume the enamel build).</summary>
    public string OverallDiameterText { get; private set; } = string.Empty;

    /// <summary>The latest evaluation, or null while an input is invalid.</summary>
    public PlanEvaluation? Result { get; private set; }

    /// <summary>Raised after every recalculation.</summary>
    public event Action? Changed;

    /// <summary>The error text for a field, or null.</summary>
    public string? ErrorFor(PlanField field) => _errors.TryGetValue(field, out var text) ? text : null;

    /// <summary>True when any field has an error.</summary>
    public bool HasErrors => _errors.Count > 0;

    /// <summary>Selects a catalogue core.</summary>
    public void SelectCore(string? id)
    {
        CoreId = id;
        Recalculate();
    }

    /// <summary>Sets the number of turns as typed.</summary>
    public void SetTurns(string? text)
    {
        TurnsText = text ?? string.Empty;
        Recalculate();
    }

    /// <summary>Sets the conductor diameter (mm) as typed.</summary>
    public void SetConductorDiameter(string? text)
    {
        ConductorDiameterText = text ?? string.Empty;
        Recalculate();
    }

    /// <summary>Sets the overall diameter (mm) as typed; empty means "assume the enamel build".</summary>
    public void SetOverallDiameter(string? text)
    {
        OverallDiameterText = text ?? string.Empty;
        Recalculate();
    }

    private void Recalculate()
    {
        _errors.Clear();
        Result = null;
        if (CoreId is null)
        {
            _errors[PlanField.Core] = "Pick a core.";
        }

        var turns = ParseWhole(PlanField.Turns, TurnsText, "Turns");
        var conductor = ParseNumber(PlanField.ConductorDiameter, ConductorDiameterText, "Conductor diameter", required: true);
        var overall = ParseNumber(PlanField.OverallDiameter, OverallDiameterText, "Overall diameter", required: false);
        if (_errors.Count == 0)
        {
            var document = new PlanDocument
            {
                Core = new PlanCoreDocument { CatalogueId = CoreId },
                Windings =
                [
                    new PlanWindingDocument
                    {
                        Name = "winding",
                        Turns = turns,
                        Wire = new PlanWireDocument { ConductorDiameterMm = conductor, OverallDiameterMm = overall },
                    },
                ],
            };
            var read = PlanReader.Read(document, _catalogue.Catalogue);
            if (read.IsValid)
            {
                Result = PlanEvaluator.Evaluate(read.Plan!);
            }
            else
            {
                foreach (var error in read.Errors)
                {
                    _errors.TryAdd(FieldOf(error), error.Message);
                }
            }
        }

        Changed?.Invoke();
    }

    /// <summary>Maps a plan-document field path to the page field that shows it.</summary>
    public static PlanField FieldOf(FieldError error)
    {
        ArgumentNullException.ThrowIfNull(error);
        return FieldOf(error.Field);
    }

    /// <summary>Maps a plan-document field path (as in errors and warnings) to the page field that shows it.</summary>
    public static PlanField FieldOf(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        return path switch
        {
            _ when path.EndsWith(".turns", StringComparison.Ordinal) => PlanField.Turns,
            _ when path.EndsWith(".conductorDiameterMm", StringComparison.Ordinal) => PlanField.ConductorDiameter,
            _ when path.EndsWith(".overallDiameterMm", StringComparison.Ordinal) => PlanField.OverallDiameter,
            _ => PlanField.Core,
        };
    }

    private int? ParseWhole(PlanField field, string text, string label)
    {
        var trimmed = text.Trim();
        if (trimmed.Length == 0)
        {
            _errors[field] = $"{label}: required, a whole number from 1 to {PlanReader.MaximumTurns.ToString("N0", CultureInfo.InvariantCulture)}.";
            return null;
        }

        if (!int.TryParse(trimmed, NumberStyles.Integer, CultureInfo.InvariantCulture, out var value))
        {
            _errors[field] = $"{label}: '{trimmed}' is not a whole number.";
            return null;
        }

        return value;
    }

    private double? ParseNumber(PlanField field, string text, string label, bool required)
    {
        var trimmed = text.Trim();
        if (trimmed.Length == 0)
        {
            if (required)
            {
                _errors[field] = $"{label}: required, a number in millimetres.";
            }

            return null;
        }

        var normalised = trimmed.Replace(',', '.');
        if (!double.TryParse(normalised, NumberStyles.Float, CultureInfo.InvariantCulture, out var value) || !double.IsFinite(value))
        {
            _errors[field] = $"{label}: '{trimmed}' is not a number.";
            return null;
        }

        return value;
    }
}
