namespace Winding.Web.Sheets;

/// <summary>
/// PDF printing cannot run on this host: the Chromium executable is missing or cannot be started. The API answers
/// <c>503 Service Unavailable</c> with the message, which names the path that was tried.
/// </summary>
public sealed class PdfPrinterUnavailableException : SheetPrintException
{
    /// <summary>Creates the failure for a Chromium executable that was not found at <paramref name="executablePath"/>.</summary>
    public PdfPrinterUnavailableException(string executablePath)
        : this(executablePath, $"PDF printing needs Chromium at {executablePath}; it was not found.", null)
    {
    }

    /// <summary>Creates the failure with its own message (e.g. the executable exists but cannot be started).</summary>
    public PdfPrinterUnavailableException(string executablePath, string message, Exception? innerException)
        : base(message, innerException) => ExecutablePath = executablePath;

    /// <summary>Creates the failure with a message only.</summary>
    public PdfPrinterUnavailableException()
        : this(string.Empty, "PDF printing is not available.", null)
    {
    }

    /// <summary>Creates the failure with a message and its cause.</summary>
    public PdfPrinterUnavailableException(string message, Exception? innerException)
        : this(string.Empty, message, innerException)
    {
    }

    /// <summary>The Chromium executable that was tried.</summary>
    public string ExecutablePath { get; }
}
