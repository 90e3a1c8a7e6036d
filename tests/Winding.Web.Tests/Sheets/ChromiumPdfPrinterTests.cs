using System.Diagnostics;
using System.Globalization;
using System.Net;
using System.Text.RegularExpressions;
using Microsoft.Extensions.Logging.Abstractions;
using Winding.EndToEnd;
using Winding.Web.Sheets;

namespace Winding.Web.Tests.Sheets;

/// <summary>
/// The Chromium printer against Debian's Chromium, with the PDFs read back by Poppler's pdftotext and pdfinfo (an
/// independent PDF reader). Without Chromium or poppler-utils the tests that need them are skipped, or fail when
/// <c>WINDING_REQUIRE_TOOLS=1</c>. The failure paths run a stand-in shell script instead of Chromium.
/// </summary>
public sealed partial class ChromiumPdfPrinterTests : IDisposable
{
    private readonly string _temp = Directory.CreateTempSubdirectory("winding-pdf-tests-").FullName;

    public void Dispose() => Directory.Delete(_temp, recursive: true);

    [SkippableFact]
    public async Task PrintAsync_TableAndEscapedName_TextReadsBackWithPdftotext()
    {
        var pdftotext = RequiredTools.Pdftotext();
        using var printer = Printer(RequiredTools.Chromium());
        var name = "club <script>alert(1)</script> & 4:1 unun";
        var html = $$"""
            <!DOCTYPE html>
            <html lang="en"><head><meta charset="utf-8"><title>sheet</title>
            <style>body { font-family: "DejaVu Sans", sans-serif; } td, th { border: 1px solid #000; padding: 2px 8px; }</style></head>
            <body><h1>{{WebUtility.HtmlEncode(name)}}</h1>
            <table><tr><th>winding</th><th>turns</th><th>wire</th></tr>
            <tr><td>primary</td><td>4</td><td>0.8 mm</td></tr><tr><td>secondary</td><td>12</td><td>0.5 mm</td></tr></table>
            <svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 40 20" width="80mm"><circle cx="10" cy="10" r="8" fill="none" stroke="#000" /><text x="22" y="12" font-size="4">S1</text></svg>
            </body></html>
            """;

        var pdf = await printer.PrintAsync(html, SheetPaper.A4, CancellationToken.None);

        var text = Run(pdftotext, "-layout", Save(pdf), "-");
        // The name arrives as the characters typed, not as markup (the heading may wrap: compare with spaces collapsed).
        Assert.Contains(name, Regex.Replace(text, @"\s+", " "), StringComparison.Ordinal);
        // Each table row stays on one line, cells in order.
        Assert.Matches(RowPattern("winding", "turns", "wire"), text);
        Assert.Matches(RowPattern("primary", "4", "0.8 mm"), text);
        Assert.Matches(RowPattern("secondary", "12", "0.5 mm"), text);
        // Text inside the inline SVG is text in the PDF too.
        Assert.Contains("S1", text, StringComparison.Ordinal);
    }

    [SkippableTheory]
    // ISO 216: A4 is 210 × 297 mm = 595.28 × 841.89 pt; ANSI letter is 8.5 × 11 in = 612 × 792 pt (1 pt = 1/72 in).
    // Chromium lays pages out in whole CSS pixels, so A4 comes out as 594.96 × 841.92 pt: a 1 pt tolerance.
    [InlineData(SheetPaper.A4, 595.28, 841.89)]
    [InlineData(SheetPaper.Letter, 612.0, 792.0)]
    public async Task PrintAsync_Paper_SetsTheMediaBox(SheetPaper paper, double widthPt, double heightPt)
    {
        var pdfinfo = RequiredTools.Pdfinfo();
        using var printer = Printer(RequiredTools.Chromium());
        // The document asks for the other size itself: the requested paper wins.
        var other = paper == SheetPaper.A4 ? "letter" : "A4";
        var html = $"<!DOCTYPE html><html><head><style>@page {{ size: {other}; }}</style></head><body><p>paper</p></body></html>";

        var pdf = await printer.PrintAsync(html, paper, CancellationToken.None);

        var (width, height) = MediaBox(Run(pdfinfo, "-box", Save(pdf)));
        Assert.Equal(widthPt, width, 1.0);
        Assert.Equal(heightPt, height, 1.0);
    }

    [SkippableFact]
    public async Task PrintAsync_AfterPrinting_LeavesNoWorkingFolder()
    {
        using var printer = Printer(RequiredTools.Chromium());

        var pdf = await printer.PrintAsync("<p>clean up</p>", SheetPaper.Letter, CancellationToken.None);

        Assert.True(pdf.AsSpan().StartsWith("%PDF-"u8));
        Assert.Empty(Directory.EnumerateFileSystemEntries(Work()));
    }

    [SkippableFact]
    public async Task PrintAsync_PageThatNeverFinishes_ChromiumIsKilledAndNothingIsLeft()
    {
        var chromium = RequiredTools.Chromium();
        Skip.IfNot(OperatingSystem.IsLinux(), "The check reads /proc.");
        using var printer = new ChromiumPdfPrinter(new ChromiumPrinterOptions(chromium, TimeSpan.FromSeconds(3), Work()), NullLogger<ChromiumPdfPrinter>.Instance);

        // A script that never ends keeps the page from ever being printed.
        var failure = await Assert.ThrowsAsync<PdfPrintFailedException>(() => printer.PrintAsync("<p>x</p><script>for (;;) {}</script>", SheetPaper.A4, CancellationToken.None));

        Assert.Contains("within 3 s", failure.Message, StringComparison.Ordinal);
        Assert.Empty(Directory.EnumerateFileSystemEntries(Work()));
        // No Chromium process that ran in the working folder is left (its crash handler leaves on its own once the browser is gone).
        using var limit = new CancellationTokenSource(TimeSpan.FromSeconds(20));
        while (ProcessesMentioning(Work()).Count > 0)
        {
            await Task.Delay(100, limit.Token);
        }
    }

    [Fact]
    public async Task PrintAsync_MissingExecutable_ThrowsUnavailableNamingThePath()
    {
        var path = Path.Combine(_temp, "no-such-chromium");
        using var printer = Printer(path);

        var failure = await Assert.ThrowsAsync<PdfPrinterUnavailableException>(() => printer.PrintAsync("<p>x</p>", SheetPaper.A4, CancellationToken.None));

        Assert.Equal($"PDF printing needs Chromium at {path}; it was not found.", failure.Message);
        Assert.Equal(path, failure.ExecutablePath);
    }

    [SkippableFact]
    public async Task PrintAsync_ChromiumThatHangs_IsKilledAfterTheTimeoutAndCleanedUp()
    {
        var (script, pids) = HangingScript();
        using var printer = new ChromiumPdfPrinter(new ChromiumPrinterOptions(script, TimeSpan.FromSeconds(1), Work()), NullLogger<ChromiumPdfPrinter>.Instance);

        var failure = await Assert.ThrowsAsync<PdfPrintFailedException>(() => printer.PrintAsync("<p>x</p>", SheetPaper.A4, CancellationToken.None));

        Assert.Contains("within 1 s", failure.Message, StringComparison.Ordinal);
        AssertStopped(pids);
        Assert.Empty(Directory.EnumerateFileSystemEntries(Work()));
    }

    [SkippableFact]
    public async Task PrintAsync_Cancelled_KillsChromiumAndThrowsCancelled()
    {
        var (script, pids) = HangingScript();
        using var printer = new ChromiumPdfPrinter(new ChromiumPrinterOptions(script, TimeSpan.FromMinutes(5), Work()), NullLogger<ChromiumPdfPrinter>.Instance);
        using var cancel = new CancellationTokenSource();
        var print = printer.PrintAsync("<p>x</p>", SheetPaper.A4, cancel.Token);
        await WaitForFile(pids);

        await cancel.CancelAsync();

        await Assert.ThrowsAnyAsync<OperationCanceledException>(() => print);
        AssertStopped(pids);
        Assert.Empty(Directory.EnumerateFileSystemEntries(Work()));
    }

    [SkippableFact]
    public async Task PrintAsync_ExitWithoutPdf_ThrowsPrintFailed()
    {
        Skip.IfNot(OperatingSystem.IsLinux() || OperatingSystem.IsMacOS(), "The stand-in is a shell script.");
        var script = Script("quiet-chromium", "#!/bin/sh\necho 'nothing printed'\nexit 0\n");
        using var printer = Printer(script);

        var failure = await Assert.ThrowsAsync<PdfPrintFailedException>(() => printer.PrintAsync("<p>x</p>", SheetPaper.A4, CancellationToken.None));

        Assert.Equal("Chromium exited with code 0 without writing a PDF. Its last output: nothing printed", failure.Message);
    }

    private ChromiumPdfPrinter Printer(string executable) =>
        new(new ChromiumPrinterOptions(executable, ChromiumPrinterOptions.DefaultTimeout, Work()), NullLogger<ChromiumPdfPrinter>.Instance);

    /// <summary>The printer's temporary folder (kept apart from the scripts so that it can be checked for leftovers).</summary>
    private string Work() => Directory.CreateDirectory(Path.Combine(_temp, "work")).FullName;

    private string Save(byte[] pdf)
    {
        var path = Path.Combine(_temp, Guid.NewGuid().ToString("N") + ".pdf");
        File.WriteAllBytes(path, pdf);
        return path;
    }

    /// <summary>A stand-in for Chromium that starts a child and waits for ever, writing both process ids to a file.</summary>
    private (string Script, string Pids) HangingScript()
    {
        Skip.IfNot(OperatingSystem.IsLinux(), "The stand-in is a shell script and the check reads /proc.");
        var pids = Path.Combine(_temp, "pids.txt");
        var script = Script("hanging-chromium", $"#!/bin/sh\nsleep 300 &\necho \"$$ $!\" > '{pids}.tmp'\nmv '{pids}.tmp' '{pids}'\nwait\n");
        return (script, pids);
    }

    private string Script(string name, string text)
    {
        var path = Path.Combine(_temp, name);
        File.WriteAllText(path, text);
        if (OperatingSystem.IsWindows())
        {
            throw new SkipException("The stand-in for Chromium is a shell script.");
        }

        File.SetUnixFileMode(path, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute);
        return path;
    }

    private static async Task WaitForFile(string path)
    {
        using var limit = new CancellationTokenSource(TimeSpan.FromSeconds(30));
        while (!File.Exists(path))
        {
            await Task.Delay(20, limit.Token);
        }
    }

    /// <summary>Both the stand-in and its child are gone (or only a zombie waiting for its parent to reap it).</summary>
    private static void AssertStopped(string pids)
    {
        Assert.True(File.Exists(pids), "The stand-in never started.");
        foreach (var pid in File.ReadAllText(pids).Split(' ', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
        {
            var stat = $"/proc/{pid}/stat";
            if (File.Exists(stat))
            {
                string? state = null;
                try
                {
                    // "pid (comm) state …": the state follows the closing parenthesis.
                    var text = File.ReadAllText(stat);
                    state = text[(text.LastIndexOf(')') + 2)..].Split(' ')[0];
                }
                catch (IOException)
                {
                    // It went away while being read.
                }

                Assert.True(state is null or "Z" or "X", $"Process {pid} is still running (state {state}).");
            }
        }
    }

    /// <summary>Ids of running processes whose command line mentions <paramref name="text"/>.</summary>
    private static List<int> ProcessesMentioning(string text)
    {
        var found = new List<int>();
        foreach (var folder in Directory.EnumerateDirectories("/proc"))
        {
            if (!int.TryParse(Path.GetFileName(folder), out var pid))
            {
                continue;
            }

            try
            {
                if (File.ReadAllText(Path.Combine(folder, "cmdline")).Contains(text, StringComparison.Ordinal))
                {
                    found.Add(pid);
                }
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                // The process ended while being read, or is not ours to read.
            }
        }

        return found;
    }

    private static Regex RowPattern(params string[] cells) => new(string.Join(@"\s+", cells.Select(Regex.Escape)));

    private static (double Width, double Height) MediaBox(string pdfinfo)
    {
        var match = MediaBoxLine().Match(pdfinfo);
        Assert.True(match.Success, pdfinfo);
        double Value(int i) => double.Parse(match.Groups[i].Value, CultureInfo.InvariantCulture);
        return (Value(3) - Value(1), Value(4) - Value(2));
    }

    [GeneratedRegex(@"MediaBox:\s+(-?[\d.]+)\s+(-?[\d.]+)\s+(-?[\d.]+)\s+(-?[\d.]+)")]
    private static partial Regex MediaBoxLine();

    private static string Run(string tool, params string[] arguments)
    {
        var start = new ProcessStartInfo(tool) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var argument in arguments)
        {
            start.ArgumentList.Add(argument);
        }

        using var process = Process.Start(start)!;
        var error = process.StandardError.ReadToEndAsync();
        var output = process.StandardOutput.ReadToEnd();
        process.WaitForExit();
        Assert.True(process.ExitCode == 0, $"{tool} failed: {error.Result}");
        return output;
    }
}
