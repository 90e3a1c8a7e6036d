namespace Winding.Web.Sheets;

/// <summary>
/// Prints a complete bench-sheet HTML document (from <see cref="SheetHtmlRenderer"/>, styles inlined, no external
/// resources) to PDF on the given paper. The API's <c>POST /api/v1/sheet?format=pdf</c> uses the registered
/// implementation; with none registered it answers 503.
/// </summary>
public interface ISheetPdfPrinter
{
    /// <summary>Prints <paramref name="html"/> to PDF bytes.</summary>
    /// <param name="html">The whole HTML document.</param>
    /// <param name="paper">The paper size.</param>
    /// <param name="ct">Cancellation (the request's).</param>
    /// <exception cref="SheetPrintException">The printer could not print; its message is shown to the caller.</exception>
    Task<byte[]> PrintAsync(string html, SheetPaper paper, CancellationToken ct);
}
