namespace Winding.Web.Sheets;

/// <summary>Prints a self-contained HTML document (inline styles and SVG, no external resources) to PDF.</summary>
public interface ISheetPdfPrinter
{
    /// <summary>Prints <paramref name="html"/> on <paramref name="paper"/> and returns the PDF file's bytes.</summary>
    Task<byte[]> PrintAsync(string html, SheetPaper paper, CancellationToken ct);
}
