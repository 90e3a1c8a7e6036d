namespace Winding.Web.Sheets;

/// <summary>One labelled fact.</summary>
/// <param name="Key">Stable key for tests (<c>core</c>, <c>al</c> …).</param>
/// <param name="Label">The label.</param>
/// <param name="Value">The value as shown.</param>
public sealed record SheetFact(string Key, string Label, string Value);
