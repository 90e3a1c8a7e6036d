namespace Winding.Catalogue.Plans;

/// <summary>
/// The bench record of a plan document: the values measured on the built transformer for the bench sheet's checks, kept
/// with the saved plan so that the sheet shows them again. They do not change the evaluation (the plan's
/// <see cref="PlanMeasuredDocument"/> does that, when the user chooses to keep a value as the plan's measured value).
/// </summary>
public sealed class PlanBenchDocument
{
    /// <summary>The day the values were measured (ISO 8601, yyyy-mm-dd).</summary>
    public string? MeasuredOn { get; set; }

    /// <summary>The saved plan's version (the sheet's revision) the transformer was built and measured to.</summary>
    public int? PlanVersion { get; set; }

    /// <summary>
    /// Measured value per bench check, keyed by the check's id (<c>w0-inductance</c>, <c>w0-resistance</c>,
    /// <c>leakage</c>, <c>w1-ratio</c>, <c>srf</c> …), in SI (H, Ω, Hz, or a plain ratio). Checks not measured are left out.
    /// </summary>
    public Dictionary<string, double?>? Values { get; set; }
}
