using Winding.Catalogue.Plans;

namespace Winding.Web.Sheets;

/// <summary>A sheet to show, or the reason there is none.</summary>
/// <param name="View">The sheet, or null.</param>
/// <param name="Problem">Why there is no sheet, in plain words (null when there is one).</param>
/// <param name="PlanHref">Where the plan it was made from is edited.</param>
public sealed record SheetLoadResult(SheetView? View, string? Problem, string PlanHref)
{
    /// <summary>The plan document the sheet was made from (null when there is no sheet).</summary>
    public PlanDocument? Document { get; init; }

    /// <summary>The saved plan's id when the sheet shows a saved version unchanged; null for a demo or unsaved plan.</summary>
    public string? SavedId { get; init; }

    /// <summary>The saved version the sheet shows (with <see cref="SavedId"/>), else 0.</summary>
    public int SavedVersion { get; init; }

    /// <summary>Why measured values cannot be kept with this plan (a demo, an unsaved form), or null when they can.</summary>
    public string? NotSavedReason { get; init; }
}
