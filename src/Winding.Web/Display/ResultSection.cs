namespace Winding.Web.Display;

/// <summary>A titled group of result rows.</summary>
/// <param name="Key">Stable key, used as a test id.</param>
/// <param name="Title">Heading.</param>
/// <param name="Rows">The rows.</param>
public sealed record ResultSection(string Key, string Title, IReadOnlyList<ResultRow> Rows);
