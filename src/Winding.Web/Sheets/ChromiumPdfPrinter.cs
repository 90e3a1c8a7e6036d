using System.ComponentModel;
using System.Diagnostics;
using System.Globalization;
using System.Text;

namespace Winding.Web.Sheets;

/// <summary>
/// Prints HTML to PDF with headless Chromium (<c>--print-to-pdf</c>): the page is written to a fresh working folder with
/// the paper size set by <see cref="PageSizeStyle"/>, Chromium runs with its own profile folder inside it, no network
/// (every HTTP request goes to a dead proxy, host names do not resolve), no header or footer, and is killed (with its
/// child processes) after the timeout or on cancellation. The working folder is deleted afterwards. At most
/// <see cref="MaximumConcurrentPrints"/> prints run at once (each Chromium takes about 220 MB).
/// </summary>
/// <remarks>
/// Chromium runs with <c>--no-sandbox</c>: its sandbox does not work as root nor, without extra privileges, in a
/// container. The page it loads is one the app wrote itself, with names escaped, and it can reach no network.
/// </remarks>
public sealed partial class ChromiumPdfPrinter : ISheetPdfPrinter, IDisposable
{
    /// <summary>Most prints run at the same time; further ones wait.</summary>
    public const int MaximumConcurrentPrints = 2;

    private const int KeptOutputCharacters = 4000;
    private readonly ChromiumPrinterOptions _options;
    private readonly ILogger<ChromiumPdfPrinter> _logger;
    private readonly SemaphoreSlim _slots = new(MaximumConcurrentPrints, MaximumConcurrentPrints);

    /// <summary>Creates the printer.</summary>
    public ChromiumPdfPrinter(ChromiumPrinterOptions options, ILogger<ChromiumPdfPrinter> logger)
    {
        ArgumentNullException.ThrowIfNull(options);
        ArgumentNullException.ThrowIfNull(logger);
        _options = options;
        _logger = logger;
    }

    /// <summary>The Chromium executable used.</summary>
    public string ExecutablePath => _options.ExecutablePath;

    /// <inheritdoc />
    /// <exception cref="PdfPrinterUnavailableException">Chromium is not at the configured path or cannot be started.</exception>
    /// <exception cref="PdfPrintFailedException">Chromium ran past the timeout, failed, or wrote no PDF.</exception>
    /// <exception cref="OperationCanceledException"><paramref name="ct"/> was cancelled (Chromium is killed).</exception>
    public async Task<byte[]> PrintAsync(string html, SheetPaper paper, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(html);
        if (!File.Exists(_options.ExecutablePath))
        {
            throw new PdfPrinterUnavailableException(_options.ExecutablePath);
        }

        await _slots.WaitAsync(ct);
        var folder = Path.Combine(_options.TemporaryDirectory, "winding-pdf-" + Guid.NewGuid().ToString("N"));
        try
        {
            Directory.CreateDirectory(folder);
            var page = Path.Combine(folder, "sheet.html");
            var output = Path.Combine(folder, "sheet.pdf");
            await File.WriteAllTextAsync(page, PageSizeStyle.Apply(html, paper), new UTF8Encoding(false), ct);
            var (exitCode, lastLine) = await RunAsync(Arguments(folder, page, output), folder, ct);
            var file = new FileInfo(output);
            if (!file.Exists || file.Length == 0)
            {
                var said = lastLine is null ? string.Empty : " Its last output: " + lastLine;
                throw new PdfPrintFailedException(string.Create(CultureInfo.InvariantCulture, $"Chromium exited with code {exitCode} without writing a PDF.{said}"));
            }

            var bytes = await File.ReadAllBytesAsync(output, ct);
            if (!bytes.AsSpan().StartsWith("%PDF-"u8))
            {
                throw new PdfPrintFailedException("Chromium wrote a file that is not a PDF.");
            }

            return bytes;
        }
        finally
        {
            _slots.Release();
            await DeleteFolderAsync(folder);
        }
    }

    /// <inheritdoc />
    public void Dispose() => _slots.Dispose();

    /// <summary>Chromium's arguments for one print (each one argument, never split or quoted by a shell).</summary>
    internal static IReadOnlyList<string> Arguments(string folder, string page, string output) =>
    [
        "--headless",
        "--no-sandbox",
        "--disable-gpu",
        "--disable-dev-shm-usage",
        "--no-first-run",
        "--no-default-browser-check",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
        "--disable-extensions",
        "--mute-audio",
        "--proxy-server=127.0.0.1:9",
        "--proxy-bypass-list=<-loopback>",
        "--host-resolver-rules=MAP * ~NOTFOUND",
        "--user-data-dir=" + Path.Combine(folder, "profile"),
        "--no-pdf-header-footer",
        "--print-to-pdf=" + output,
        new Uri(page).AbsoluteUri,
    ];

    /// <summary>Runs Chromium to its end; returns its exit code and the last line it printed (if any).</summary>
    private async Task<(int ExitCode, string? LastLine)> RunAsync(IReadOnlyList<string> arguments, string folder, CancellationToken ct)
    {
        var start = new ProcessStartInfo(_options.ExecutablePath)
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            RedirectStandardInput = false,
            UseShellExecute = false,
            WorkingDirectory = folder,
        };
        foreach (var argument in arguments)
        {
            start.ArgumentList.Add(argument);
        }

        // Anything Chromium keeps under the home folder (NSS database, caches) lands in the working folder too.
        start.Environment["HOME"] = folder;
        start.Environment["XDG_CONFIG_HOME"] = Path.Combine(folder, "config");
        start.Environment["XDG_CACHE_HOME"] = Path.Combine(folder, "cache");

        using var process = new Process { StartInfo = start };
        var output = new StringBuilder();
        void Keep(object sender, DataReceivedEventArgs e)
        {
            if (e.Data is null)
            {
                return;
            }

            lock (output)
            {
                output.Append(e.Data).Append('\n');
                if (output.Length > KeptOutputCharacters)
                {
                    output.Remove(0, output.Length - KeptOutputCharacters);
                }
            }
        }

        process.OutputDataReceived += Keep;
        process.ErrorDataReceived += Keep;
        try
        {
            process.Start();
        }
        catch (Win32Exception e)
        {
            throw new PdfPrinterUnavailableException(_options.ExecutablePath, $"PDF printing needs Chromium at {_options.ExecutablePath}; it could not be started: {e.Message}", e);
        }

        process.BeginOutputReadLine();
        process.BeginErrorReadLine();
        using var timeout = new CancellationTokenSource(_options.Timeout);
        using var linked = CancellationTokenSource.CreateLinkedTokenSource(ct, timeout.Token);
        try
        {
            await process.WaitForExitAsync(linked.Token);
        }
        catch (OperationCanceledException)
        {
            Kill(process);
            ct.ThrowIfCancellationRequested();
            throw new PdfPrintFailedException(string.Create(CultureInfo.InvariantCulture, $"Chromium did not finish printing within {_options.Timeout.TotalSeconds:0.#} s and was stopped."));
        }

        // The exit may come before the last output lines are read; waiting without a timeout drains them.
        await process.WaitForExitAsync(CancellationToken.None);
        string kept;
        lock (output)
        {
            kept = output.ToString();
        }

        return (process.ExitCode, kept.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries).LastOrDefault());
    }

    private void Kill(Process process)
    {
        try
        {
            process.Kill(entireProcessTree: true);
            process.WaitForExit(TimeSpan.FromSeconds(10));
        }
        catch (InvalidOperationException)
        {
            // It exited between the timeout and the kill.
        }
        catch (Win32Exception e)
        {
            LogKillFailed(e, process.Id);
        }
    }

    private async Task DeleteFolderAsync(string folder)
    {
        // Chromium's helper processes may still be closing files in the profile for a moment after the main one exits.
        for (var attempt = 1; ; attempt++)
        {
            try
            {
                if (Directory.Exists(folder))
                {
                    Directory.Delete(folder, recursive: true);
                }

                return;
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                if (attempt == 5)
                {
                    LogCleanUpFailed(e, folder);
                    return;
                }

                await Task.Delay(100 * attempt, CancellationToken.None);
            }
        }
    }

    [LoggerMessage(Level = LogLevel.Warning, Message = "Could not stop Chromium (process {ProcessId}) after a print was abandoned.")]
    private partial void LogKillFailed(Exception exception, int processId);

    [LoggerMessage(Level = LogLevel.Warning, Message = "Could not delete the PDF working folder {Folder}.")]
    private partial void LogCleanUpFailed(Exception exception, string folder);
}
