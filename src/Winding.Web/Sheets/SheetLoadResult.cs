namespace Winding.Web.Sheets;

/// <summary>A sheet to show, or the reason there is none.</summary>
/// <param name="View">The sheet, or null.</param>
/// <param name="Problem">Why there is no sheet, in plain words (null when there is one).</param>
/// <param name="PlanHref">Where the plan it was made from is edited.</param>
public sealed record SheetLoadResult(SheetView? View, string? Problem, string PlanHref);
