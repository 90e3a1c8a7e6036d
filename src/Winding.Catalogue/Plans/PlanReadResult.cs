using Winding.Catalogue.Validation;
using Winding.Core.Plans;

namespace Winding.Catalogue.Plans;

/// <summary>The outcome of turning a plan document into an engine plan: the plan, or the field errors.</summary>
/// <param name="Plan">The plan, when the document is valid.</param>
/// <param name="Errors">Every field error found (empty when valid).</param>
public sealed record PlanReadResult(TransformerPlan? Plan, IReadOnlyList<FieldError> Errors)
{
    /// <summary>True when the document was valid.</summary>
    public bool IsValid => Plan is not null && Errors.Count == 0;
}
