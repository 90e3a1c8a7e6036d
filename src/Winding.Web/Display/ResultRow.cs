namespace Winding.Web.Display;

/// <summary>One labelled figure on the results panel.</summary>
/// <param name="Key">Stable key, used as the row's test id.</param>
/// <param name="Label">What the figure is.</param>
/// <param name="Value">The formatted value with its unit.</param>
/// <param name="Definition">A short definition and the source of the formula.</param>
public sealed record ResultRow(string Key, string Label, string Value, string Definition);
