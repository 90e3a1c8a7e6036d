namespace Winding.Web.Sheets;

/// <summary>The paper a sheet is printed on.</summary>
public enum SheetPaper
{
    /// <summary>ISO 216 A4, 210 × 297 mm.</summary>
    A4,

    /// <summary>ANSI letter, 8.5 × 11 in.</summary>
    Letter,
}
