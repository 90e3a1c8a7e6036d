namespace Winding.Core.Sheets;

/// <summary>
/// Everything a bench sheet for one plan says, in SI units and plain words, ready to lay out on paper: the title, date
/// and revision, the core, the windings in winding order, the numbered build steps, the bench checks with their limits,
/// and the safety cautions. Built by <see cref="BenchSheetBuilder"/>; pure data, no formatting of numbers for display.
/// </summary>
/// <param name="Title">The plan's name (or "Untitled plan").</param>
/// <param name="Date">The date the sheet is made for (passed in; the builder reads no clock).</param>
/// <param name="Revision">The saved plan's version, 1 and up; 0 for a plan that is not saved.</param>
/// <param name="Core">The core.</param>
/// <param name="Windings">One row per winding, in winding order.</param>
/// <param name="Steps">The build steps, numbered 1 … n.</param>
/// <param name="Checks">The bench checks, in measuring order.</param>
/// <param name="Cautions">Safety cautions (empty when nothing in the plan calls for one).</param>
public sealed record BenchSheet(
    string Title,
    DateOnly Date,
    int Revision,
    SheetCoreSummary Core,
    IReadOnlyList<SheetWindingRow> Windings,
    IReadOnlyList<BuildStep> Steps,
    IReadOnlyList<BenchCheck> Checks,
    IReadOnlyList<SheetCaution> Cautions);
