namespace Winding.Web.Sheets;

/// <summary>The paper a bench sheet is laid out for.</summary>
public enum SheetPaper
{
    /// <summary>ISO A4, 210 × 297 mm.</summary>
    A4,

    /// <summary>US Letter, 8.5 × 11 in (215.9 × 279.4 mm).</summary>
    Letter,
}
