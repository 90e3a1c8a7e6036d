namespace Winding.Web.Sheets;

/// <summary>
/// Sets the printed page size of an HTML document with a CSS <c>@page { size: … !important }</c> rule (CSS Paged Media
/// Level 3, "page size" descriptor: <c>A4</c> is 210 × 297 mm, <c>letter</c> 8.5 × 11 in). Chromium's
/// <c>--print-to-pdf</c> has no paper option and takes the size from CSS; <c>!important</c> makes the rule win over a
/// size the document sets itself, wherever it stands.
/// </summary>
public static class PageSizeStyle
{
    /// <summary>The CSS size keyword of <paramref name="paper"/>.</summary>
    public static string Keyword(SheetPaper paper) => paper switch
    {
        SheetPaper.A4 => "A4",
        SheetPaper.Letter => "letter",
        _ => throw new ArgumentOutOfRangeException(nameof(paper), paper, "Unknown paper."),
    };

    /// <summary>The style element that sets the page size.</summary>
    public static string Element(SheetPaper paper) => $"<style>@page {{ size: {Keyword(paper)} !important; }}</style>";

    /// <summary>
    /// <paramref name="html"/> with the page-size style added: before <c>&lt;/head&gt;</c>, else before <c>&lt;body</c>,
    /// else after a leading <c>&lt;!DOCTYPE …&gt;</c> (never before it, which would switch the page to quirks mode), else
    /// at the start.
    /// </summary>
    public static string Apply(string html, SheetPaper paper)
    {
        ArgumentNullException.ThrowIfNull(html);
        var style = Element(paper);
        var at = html.IndexOf("</head", StringComparison.OrdinalIgnoreCase);
        if (at < 0)
        {
            at = html.IndexOf("<body", StringComparison.OrdinalIgnoreCase);
        }

        if (at < 0)
        {
            var start = html.Length - html.TrimStart().Length;
            at = html.AsSpan(start).StartsWith("<!doctype", StringComparison.OrdinalIgnoreCase) && html.IndexOf('>', start) is var end and >= 0 ? end + 1 : 0;
        }

        return string.Concat(html.AsSpan(0, at), style, html.AsSpan(at));
    }
}
