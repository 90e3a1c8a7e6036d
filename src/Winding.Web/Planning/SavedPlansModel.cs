using Winding.Catalogue.Plans;
using Winding.Catalogue.Store;

namespace Winding.Web.Planning;

/// <summary>
/// The start page's list of saved plans and what can be done to them there: duplicate, delete (with a confirmation
/// step), import a plan file. Every outcome is a message; nothing throws into the page.
/// </summary>
public sealed class SavedPlansModel(PlanStore plans)
{
    /// <summary>The largest plan file accepted for import, in bytes.</summary>
    public const long MaximumImportBytes = 2 * 1024 * 1024;

    /// <summary>The saved plans (newest first) and the files that could not be read.</summary>
    public PlanListResult List { get; private set; } = plans.List();

    /// <summary>The plan waiting for the user to confirm its deletion, or null.</summary>
    public PlanSummary? PendingDelete { get; private set; }

    /// <summary>The message of the last action, and whether it succeeded.</summary>
    public (string Text, bool Succeeded)? Message { get; private set; }

    /// <summary>Copies a saved plan as a new variant of it.</summary>
    public void Duplicate(PlanSummary plan)
    {
        ArgumentNullException.ThrowIfNull(plan);
        Report(plans.Duplicate(plan.Id, plan.Name + " (copy)"));
    }

    /// <summary>Asks for confirmation before deleting <paramref name="plan"/>.</summary>
    public void AskDelete(PlanSummary plan) => PendingDelete = plan;

    /// <summary>Drops the pending deletion.</summary>
    public void CancelDelete() => PendingDelete = null;

    /// <summary>Deletes the plan waiting for confirmation (refused when it was saved again meanwhile).</summary>
    public void ConfirmDelete()
    {
        if (PendingDelete is not { } plan)
        {
            return;
        }

        PendingDelete = null;
        Report(plans.Delete(plan.Id, plan.Version));
    }

    /// <summary>Imports a plan file: a saved-plan export or a plan document as the plan page exports it.</summary>
    public void Import(string fileName, string json)
    {
        ArgumentNullException.ThrowIfNull(json);
        Report(plans.Import(json), $"'{fileName}' was not imported. ");
    }

    /// <summary>Says that a file was too large or could not be read.</summary>
    public void ImportFailed(string fileName, string reason) => Message = ($"'{fileName}' was not imported: {reason}", false);

    private void Report(StoreResult result, string failurePrefix = "")
    {
        Message = result.Succeeded || result.Errors.Count == 0
            ? (result.Message, result.Succeeded)
            : (failurePrefix + string.Join("; ", result.Errors.Select(e => (e.Field.Length == 0 ? "the file" : e.Field) + ": " + e.Message)), false);
        List = plans.List();
    }
}
