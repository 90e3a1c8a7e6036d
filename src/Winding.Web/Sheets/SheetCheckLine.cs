namespace Winding.Web.Sheets;

/// <summary>One row of the bench-check table, formatted.</summary>
/// <param name="Id">The check's stable key.</param>
/// <param name="Number">Its number on the sheet.</param>
/// <param name="What">What is measured, in words.</param>
/// <param name="Condition">How to measure it.</param>
/// <param name="Expected">The expected value with its unit.</param>
/// <param name="Lower">The lower limit with its unit.</param>
/// <param name="Upper">The upper limit with its unit.</param>
/// <param name="Basis">Where the value and limits come from.</param>
/// <param name="Source">The sources.</param>
public sealed record SheetCheckLine(string Id, string Number, string What, string Condition, string Expected, string Lower, string Upper, string Basis, string Source);
