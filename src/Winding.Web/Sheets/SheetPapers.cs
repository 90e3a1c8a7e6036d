namespace Winding.Web.Sheets;

/// <summary>The paper words used in addresses and the API (<c>a4</c>, <c>letter</c>) and the CSS page size of each.</summary>
public static class SheetPapers
{
    /// <summary>Reads <c>a4</c> or <c>letter</c> (any case); null or empty is A4. False for anything else.</summary>
    public static bool TryParse(string? text, out SheetPaper paper)
    {
        switch (text?.Trim().ToUpperInvariant())
        {
            case null or "" or "A4":
                paper = SheetPaper.A4;
                return true;
            case "LETTER":
                paper = SheetPaper.Letter;
                return true;
            default:
                paper = SheetPaper.A4;
                return false;
        }
    }

    /// <summary>The word for addresses: <c>a4</c> or <c>letter</c>.</summary>
    public static string Word(SheetPaper paper) => paper == SheetPaper.Letter ? "letter" : "a4";

    /// <summary>The CSS <c>@page</c> rule for the paper, with 10 mm margins.</summary>
    public static string PageRule(SheetPaper paper) => "@page { size: " + (paper == SheetPaper.Letter ? "letter" : "A4") + " portrait; margin: 10mm; }";
}
