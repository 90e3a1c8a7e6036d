namespace Winding.Web.Exports;

/// <summary>File names for downloads, made from a plan's name.</summary>
public static class ExportFileName
{
    /// <summary>Longest name part kept, characters.</summary>
    public const int MaximumLength = 80;

    /// <summary>
    /// The plan's name reduced to letters, digits, spaces and hyphens, each run of spaces turned into one hyphen, at most
    /// <see cref="MaximumLength"/> characters, "plan" when nothing is left, with <paramref name="extension"/>. Nothing that
    /// could leave the download folder (slashes, dots) or break a header (quotes, control characters) survives.
    /// </summary>
    public static string For(string? planName, string extension)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(extension);
        var kept = string.Join('-', string.Concat((planName ?? string.Empty).Where(c => char.IsLetterOrDigit(c) || c is ' ' or '-')).Split(' ', StringSplitOptions.RemoveEmptyEntries));
        if (kept.Length > MaximumLength)
        {
            kept = kept[..MaximumLength].TrimEnd('-');
        }

        return (kept.Length == 0 ? "plan" : kept) + "." + extension;
    }
}
