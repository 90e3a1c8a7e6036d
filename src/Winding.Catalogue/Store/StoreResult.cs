using Winding.Catalogue.Validation;

namespace Winding.Catalogue.Store;

/// <summary>The result of a write to the user catalogue.</summary>
/// <param name="Outcome">How it ended.</param>
/// <param name="Id">The entry's id (as given).</param>
/// <param name="Version">The entry's version after the operation (the saved or deleted one; the current one on a conflict), or null.</param>
/// <param name="Message">One sentence for the user.</param>
/// <param name="Errors">Field errors of refused content (field paths without <c>$.</c>); empty otherwise.</param>
public sealed record StoreResult(StoreOutcome Outcome, string Id, int? Version, string Message, IReadOnlyList<FieldError> Errors)
{
    /// <summary>True when the operation was done.</summary>
    public bool Succeeded => Outcome == StoreOutcome.Ok;

    internal static StoreResult Fail(StoreOutcome outcome, string id, string message, int? version = null) => new(outcome, id, version, message, []);

    internal static StoreResult Refused(string id, IReadOnlyList<FieldError> errors) =>
        new(StoreOutcome.Invalid, id, null, errors.Count == 1 ? errors[0].Message : $"{errors.Count} fields need attention.", errors);
}
