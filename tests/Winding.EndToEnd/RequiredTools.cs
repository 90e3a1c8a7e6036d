namespace Winding.EndToEnd;

/// <summary>
/// External tools the browser tests and the export cross-checks need. Without a tool the test is reported as skipped with a message that says what
/// to install; with <c>WINDING_REQUIRE_TOOLS=1</c> (as CI sets it) a missing tool fails the test instead.
/// </summary>
public static class RequiredTools
{
    /// <summary>Environment variable that turns a missing tool into a failure.</summary>
    public const string RequireVariable = "WINDING_REQUIRE_TOOLS";

    /// <summary>Debian's Chromium, driven by Playwright through its executable-path option.</summary>
    public static string Chromium() => Require(
        Environment.GetEnvironmentVariable("WINDING_CHROMIUM") is { Length: > 0 } custom ? custom : "/usr/bin/chromium",
        "Chromium",
        "apt-get install chromium");

    /// <summary>Debian's ngspice, the reference circuit simulator for the equivalent-circuit cross-checks.</summary>
    public static string Ngspice() => Require(
        Environment.GetEnvironmentVariable("WINDING_NGSPICE") is { Length: > 0 } custom ? custom : "/usr/bin/ngspice",
        "ngspice",
        "apt-get install ngspice");

    /// <summary>Poppler's pdftotext (Debian package poppler-utils), the independent reader of the printed PDFs' text.</summary>
    public static string Pdftotext() => Require("/usr/bin/pdftotext", "pdftotext", "apt-get install poppler-utils");

    /// <summary>Poppler's pdfinfo (Debian package poppler-utils), the independent reader of the printed PDFs' page boxes.</summary>
    public static string Pdfinfo() => Require("/usr/bin/pdfinfo", "pdfinfo", "apt-get install poppler-utils");

    private static string Require(string path, string name, string install)
    {
        if (File.Exists(path))
        {
            return path;
        }

        var message = $"{name} was not found at {path}: install it (on Debian/Ubuntu: {install}) to run this test.";
        if (Environment.GetEnvironmentVariable(RequireVariable) == "1")
        {
            Assert.Fail(message + $" ({RequireVariable}=1 makes a missing tool a failure.)");
        }

        throw new SkipException(message);
    }
}
