using Winding.Core.Plans;
using Winding.Core.Sheets;

namespace Winding.Web.Sheets;

/// <summary>
/// The bench sheet as the page and the standalone document show it: every value formatted, every word written, so that
/// the razor component only lays it out. User text (the plan's and windings' names) stays plain text here and is escaped
/// by Blazor where it is rendered.
/// </summary>
/// <param name="Sheet">The engine-side sheet it was made from.</param>
/// <param name="Title">The plan's name.</param>
/// <param name="DateText">The date, ISO 8601 (yyyy-mm-dd).</param>
/// <param name="RevisionText">The revision in words.</param>
/// <param name="CoreFacts">The core, one fact a row.</param>
/// <param name="Windings">The windings table, in winding order.</param>
/// <param name="LengthNote">What the lengths to cut include.</param>
/// <param name="Steps">The numbered build steps.</param>
/// <param name="Checks">The bench-check table.</param>
/// <param name="Cautions">Safety cautions (empty when none apply).</param>
/// <param name="Plan">The plan (for the drawings).</param>
/// <param name="Evaluation">The engine's evaluation (for the drawings).</param>
/// <param name="DrawingNote">How to read the cross-section without colour.</param>
public sealed record SheetView(
    BenchSheet Sheet,
    string Title,
    string DateText,
    string RevisionText,
    IReadOnlyList<SheetFact> CoreFacts,
    IReadOnlyList<SheetWindingLine> Windings,
    string LengthNote,
    IReadOnlyList<BuildStep> Steps,
    IReadOnlyList<SheetCheckLine> Checks,
    IReadOnlyList<string> Cautions,
    TransformerPlan Plan,
    PlanEvaluation Evaluation,
    string DrawingNote);
