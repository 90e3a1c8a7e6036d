using System.Globalization;
using System.Text.Json;

namespace Winding.Catalogue.Loading;

/// <summary>Turns a System.Text.Json error into a field path and plain words.</summary>
public static class JsonErrorText
{
    /// <summary>The JSON path of the error (<c>$</c> when unknown).</summary>
    public static string PathOf(JsonException exception)
    {
        ArgumentNullException.ThrowIfNull(exception);
        return string.IsNullOrEmpty(exception.Path) ? "$" : exception.Path;
    }

    /// <summary>The path without the leading <c>$.</c>, as used for field names (empty for the whole document).</summary>
    public static string FieldOf(JsonException exception)
    {
        var path = PathOf(exception);
        return path == "$" ? string.Empty : path.StartsWith("$.", StringComparison.Ordinal) ? path[2..] : path.TrimStart('$');
    }

    /// <summary>A plain description: the parser's first sentence and the line number.</summary>
    public static string ReasonOf(JsonException exception)
    {
        ArgumentNullException.ThrowIfNull(exception);
        var message = exception.Message;
        foreach (var marker in new[] { " Path: ", " LineNumber: " })
        {
            var cut = message.IndexOf(marker, StringComparison.Ordinal);
            if (cut > 0)
            {
                message = message[..cut];
            }
        }

        message = message.Trim();
        if (message.StartsWith("The JSON property", StringComparison.Ordinal) && message.Contains("could not be mapped", StringComparison.Ordinal))
        {
            message = "Unknown field " + message["The JSON property ".Length..].Split(' ')[0] + ": check its spelling.";
        }
        else if (message.StartsWith("The JSON value could not be converted", StringComparison.Ordinal))
        {
            message = "The value has the wrong type (for example text where a number is expected).";
        }

        return exception.LineNumber is { } line
            ? string.Create(CultureInfo.InvariantCulture, $"{message} (line {line + 1})")
            : message;
    }
}
