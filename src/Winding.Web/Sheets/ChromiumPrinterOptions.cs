using System.Globalization;

namespace Winding.Web.Sheets;

/// <summary>Where Chromium is and how long one print may take.</summary>
/// <param name="ExecutablePath">The Chromium executable.</param>
/// <param name="Timeout">Longest time one print may run; Chromium is killed after it.</param>
/// <param name="TemporaryDirectory">Folder under which each print gets its own working folder (deleted afterwards).</param>
public sealed record ChromiumPrinterOptions(string ExecutablePath, TimeSpan Timeout, string TemporaryDirectory)
{
    /// <summary>Configuration key of the executable path (first choice).</summary>
    public const string PathKey = "Winding:ChromiumPath";

    /// <summary>Environment variable of the executable path (used when <see cref="PathKey"/> is not set).</summary>
    public const string PathVariable = "WINDING_CHROMIUM";

    /// <summary>Configuration key of the timeout in seconds.</summary>
    public const string TimeoutKey = "Winding:PdfTimeoutSeconds";

    /// <summary>Debian's Chromium.</summary>
    public const string DefaultPath = "/usr/bin/chromium";

    /// <summary>Timeout when none is configured: a print takes 2–4 s on a busy 2-core machine.</summary>
    public static TimeSpan DefaultTimeout { get; } = TimeSpan.FromSeconds(30);

    /// <summary>Reads the options from configuration (environment variables included).</summary>
    /// <exception cref="InvalidOperationException">The timeout is not a number of seconds from 1 to 600.</exception>
    public static ChromiumPrinterOptions FromConfiguration(IConfiguration configuration)
    {
        ArgumentNullException.ThrowIfNull(configuration);
        var path = configuration[PathKey];
        if (string.IsNullOrWhiteSpace(path))
        {
            path = configuration[PathVariable];
        }

        if (string.IsNullOrWhiteSpace(path))
        {
            path = DefaultPath;
        }

        var timeout = DefaultTimeout;
        if (configuration[TimeoutKey] is { Length: > 0 } text)
        {
            if (!double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var seconds) || !(seconds >= 1 && seconds <= 600))
            {
                throw new InvalidOperationException($"{TimeoutKey} must be a number of seconds from 1 to 600; it is '{text}'.");
            }

            timeout = TimeSpan.FromSeconds(seconds);
        }

        return new ChromiumPrinterOptions(path.Trim(), timeout, Path.GetTempPath());
    }
}
