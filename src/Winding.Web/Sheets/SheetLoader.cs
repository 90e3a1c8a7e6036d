using System.Text.Json;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Plans;
using Winding.Core.Plans;
using Winding.Web.Hosting;
using Winding.Web.Planning;

namespace Winding.Web.Sheets;

/// <summary>
/// Finds the plan a sheet page shows — a saved plan, a demo plan, or the plan now on the plan page (the same circuit's
/// <see cref="PlanningState"/>) — reads it with the catalogue, evaluates it and builds its <see cref="SheetView"/>, dated
/// today by the injected clock.
/// </summary>
public sealed class SheetLoader
{
    private readonly CatalogueProvider _catalogue;
    private readonly PlanStore _plans;
    private readonly PlanningState _planning;
    private readonly TimeProvider _time;

    /// <summary>Creates the loader.</summary>
    public SheetLoader(CatalogueProvider catalogue, PlanStore plans, PlanningState planning, TimeProvider time)
    {
        ArgumentNullException.ThrowIfNull(catalogue);
        ArgumentNullException.ThrowIfNull(plans);
        ArgumentNullException.ThrowIfNull(planning);
        ArgumentNullException.ThrowIfNull(time);
        _catalogue = catalogue;
        _plans = plans;
        _planning = planning;
        _time = time;
    }

    /// <summary>Today's date by the injected clock, local time.</summary>
    public DateOnly Today => SheetViewBuilder.Today(_time);

    /// <summary>The sheet of the saved plan <paramref name="id"/>, at its saved version.</summary>
    public SheetLoadResult Saved(string id)
    {
        var href = "plan/" + Uri.EscapeDataString(id);
        var read = _plans.Read(id);
        if (read.Plan?.Plan is not { } document)
        {
            return new SheetLoadResult(null, read.Message, href);
        }

        document.Name = read.Plan.Name ?? document.Name;
        var version = read.Plan.Version ?? 0;
        return FromDocument(document, version, version > 0 ? $"revision {version}" : "saved, no revision number", href) with
        {
            SavedId = id,
            SavedVersion = version,
            NotSavedReason = null,
        };
    }

    /// <summary>
    /// After the sheet page saved a new version of the plan <paramref name="id"/>: the plan page's form is reloaded when
    /// it shows that plan, so that its next save does not meet a version conflict.
    /// </summary>
    public void PlanSaved(string id)
    {
        if (_planning.SavedId == id)
        {
            _planning.LoadSaved(id);
        }
    }

    /// <summary>The sheet of the demo plan <paramref name="id"/>.</summary>
    public SheetLoadResult Demo(string id)
    {
        var href = "plan?demo=" + Uri.EscapeDataString(id);
        return DemoPlans.Find(id) is { } demo
            ? FromDocument(demo.Document, 0, "demo plan, not saved", href) with
            {
                NotSavedReason = "This is a demo plan: save it as your own plan on the plan page first, then open its bench sheet to keep measured values or update the core.",
            }
            : new SheetLoadResult(null, $"There is no demo plan '{id}'.", "plan");
    }

    /// <summary>
    /// The sheet of the plan now on the plan page. It carries the saved revision when the form still equals the saved
    /// version; otherwise it says the form is not saved.
    /// </summary>
    public SheetLoadResult Current()
    {
        var href = _planning.SavedId is { } id ? "plan/" + Uri.EscapeDataString(id) : "plan";
        if (_planning.Plan is not { } plan || _planning.Result is not { } evaluation)
        {
            return new SheetLoadResult(null, "The plan on the plan page has fields to correct; correct them there first.", href);
        }

        var document = _planning.ToDocument();
        var unchanged = _planning.SavedId is { } savedId && Unchanged(savedId, document);
        var (revision, words) = unchanged
            ? (_planning.SavedVersion, $"revision {_planning.SavedVersion}")
            : (0, _planning.SavedId is null ? "not saved" : $"changed since revision {_planning.SavedVersion}, not saved");
        return new SheetLoadResult(SheetViewBuilder.Build(plan, evaluation, CoreName(document), Today, revision, words), null, href)
        {
            Document = document,
            SavedId = unchanged ? _planning.SavedId : null,
            SavedVersion = unchanged ? _planning.SavedVersion : 0,
            NotSavedReason = unchanged ? null
                : _planning.SavedId is null ? "This plan is not saved: save it on the plan page first to keep measured values or update the core."
                : $"The plan on the plan page has changed since revision {_planning.SavedVersion}: save it there first to keep measured values or update the core.",
        };
    }

    /// <summary>The sheet of a plan document (also used by the API).</summary>
    public SheetLoadResult FromDocument(PlanDocument document, int revision, string revisionText, string planHref)
    {
        ArgumentNullException.ThrowIfNull(document);
        var read = PlanReader.Read(document, _catalogue.Catalogue);
        if (!read.IsValid)
        {
            return new SheetLoadResult(null, "The plan no longer reads: " + string.Join(" ", read.Errors.Select(e => $"{e.Field}: {e.Message}")), planHref);
        }

        var plan = read.Plan!;
        return new SheetLoadResult(SheetViewBuilder.Build(plan, PlanEvaluator.Evaluate(plan), CoreName(document), Today, revision, revisionText), null, planHref)
        {
            Document = document,
            NotSavedReason = "This plan is not saved: save it on the plan page first to keep measured values or update the core.",
        };
    }

    private string? CoreName(PlanDocument document) => SheetViewBuilder.CoreName(document, _catalogue.Catalogue);

    private bool Unchanged(string id, PlanDocument form)
    {
        if (_plans.Read(id).Plan?.Plan is not { } saved)
        {
            return false;
        }

        // The name is not part of what is built; saving also fills in a missing one.
        var formName = form.Name;
        saved.Name = null;
        form.Name = null;
        var same = JsonSerializer.Serialize(saved, CatalogueJson.Options) == JsonSerializer.Serialize(form, CatalogueJson.Options);
        form.Name = formName;
        return same;
    }
}
