namespace Winding.Web.Sheets;

/// <summary>What a button of the bench-results panel did.</summary>
/// <param name="Succeeded">True when it was done.</param>
/// <param name="Message">One or two sentences for the user.</param>
/// <param name="Reload">True when the plan or its core changed, so the sheet must be built again.</param>
public sealed record BenchActionResult(bool Succeeded, string Message, bool Reload);
