namespace Winding.Web.Sheets;

/// <summary>
/// The sheet's style sheet, <c>wwwroot/css/sheet.css</c>, embedded in the assembly so that the standalone sheet can
/// inline it wherever the app runs (the page links the same file as a static asset).
/// </summary>
public static class SheetStyles
{
    private const string ResourceName = "Winding.Web.Sheets.sheet.css";

    private static readonly Lazy<string> Loaded = new(() =>
    {
        using var stream = typeof(SheetStyles).Assembly.GetManifestResourceStream(ResourceName)
            ?? throw new InvalidOperationException($"The embedded resource {ResourceName} is missing from the build.");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    });

    /// <summary>The CSS text.</summary>
    public static string Css => Loaded.Value;
}
