namespace Winding.Web.Sheets;

/// <summary>A PDF printer could not print a sheet; the message says why in plain words (shown to the API caller).</summary>
public class SheetPrintException : Exception
{
    /// <summary>Creates the exception.</summary>
    public SheetPrintException()
    {
    }

    /// <summary>Creates the exception with a plain message.</summary>
    public SheetPrintException(string message)
        : base(message)
    {
    }

    /// <summary>Creates the exception with a plain message and its cause.</summary>
    public SheetPrintException(string message, Exception? innerException)
        : base(message, innerException)
    {
    }
}
