using Winding.Catalogue.Loading;
using Winding.Catalogue.Store;

namespace Winding.Catalogue.Plans;

/// <summary>The saved plans, most recently saved first, and the files that could not be read.</summary>
/// <param name="Outcome"><see cref="StoreOutcome.Ok"/>, or <see cref="StoreOutcome.StorageFailed"/> when the folder could not be read.</param>
/// <param name="Message">One sentence for the user.</param>
/// <param name="Plans">The readable plans, most recently saved first (ties by id).</param>
/// <param name="Problems">Damaged files: the file name below the plans folder, the JSON path and the reason.</param>
public sealed record PlanListResult(StoreOutcome Outcome, string Message, IReadOnlyList<PlanSummary> Plans, IReadOnlyList<CatalogueProblem> Problems);
