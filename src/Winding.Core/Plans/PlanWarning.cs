namespace Winding.Core.Plans;

/// <summary>A finding about a plan: a stable code, a severity, the input field it concerns and plain words.</summary>
/// <param name="Code">Stable machine-readable code, e.g. <c>wire-does-not-fit</c> (see <see cref="WarningCodes"/>).</param>
/// <param name="Severity">Info, caution or error.</param>
/// <param name="Field">The plan field concerned, as a request path such as <c>windings[1].turns</c>.</param>
/// <param name="Message">Plain words for the user.</param>
public sealed record PlanWarning(string Code, WarningSeverity Severity, string Field, string Message);
