namespace Winding.Web.Sheets;

/// <summary>
/// Chromium was started but gave no PDF: it ran past the timeout (and was killed), exited with an error, or exited
/// without writing the file. The message says which, with Chromium's last line of output.
/// </summary>
public sealed class PdfPrintFailedException : SheetPrintException
{
    /// <summary>Creates the failure.</summary>
    public PdfPrintFailedException(string message)
        : base(message)
    {
    }

    /// <summary>Creates the failure with its cause.</summary>
    public PdfPrintFailedException(string message, Exception? innerException)
        : base(message, innerException)
    {
    }

    /// <summary>Creates the failure with a general message.</summary>
    public PdfPrintFailedException()
        : base("Chromium did not produce a PDF.")
    {
    }
}
