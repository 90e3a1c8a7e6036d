using Winding.Catalogue.Store;
using Winding.Catalogue.Validation;

namespace Winding.Catalogue.Plans;

/// <summary>One saved plan as read from the data folder.</summary>
/// <param name="Outcome"><see cref="StoreOutcome.Ok"/>, or why nothing was read (<see cref="StoreOutcome.Invalid"/> also for a damaged file).</param>
/// <param name="Message">One sentence for the user.</param>
/// <param name="Plan">The saved plan, or null.</param>
/// <param name="Errors">What is wrong with a damaged file (field paths without <c>$.</c>); empty otherwise.</param>
public sealed record SavedPlanResult(StoreOutcome Outcome, string Message, SavedPlan? Plan, IReadOnlyList<FieldError> Errors)
{
    /// <summary>True when the plan was read.</summary>
    public bool Succeeded => Outcome == StoreOutcome.Ok;
}
