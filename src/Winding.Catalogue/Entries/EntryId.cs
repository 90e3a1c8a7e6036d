using System.Text.RegularExpressions;

namespace Winding.Catalogue.Entries;

/// <summary>
/// Catalogue ids are slugs: lower-case letters and digits in groups joined by single hyphens, 1–80 characters, and not a
/// reserved device name (<c>con</c>, <c>nul</c>, <c>com1</c>…). An id names the user's file (<c>{id}.json</c>), so no
/// valid id can reach outside its folder or name a device on any operating system.
/// </summary>
public static partial class EntryId
{
    /// <summary>Longest accepted id, characters.</summary>
    public const int MaximumLength = 80;

    private static readonly HashSet<string> ReservedNames = new(StringComparer.Ordinal)
    {
        "con", "prn", "aux", "nul",
        "com0", "com1", "com2", "com3", "com4", "com5", "com6", "com7", "com8", "com9",
        "lpt0", "lpt1", "lpt2", "lpt3", "lpt4", "lpt5", "lpt6", "lpt7", "lpt8", "lpt9",
    };

    /// <summary>True when <paramref name="id"/> is a valid slug.</summary>
    public static bool IsValid(string? id) =>
        id is { Length: > 0 and <= MaximumLength } && SlugPattern().IsMatch(id) && !ReservedNames.Contains(id);

    /// <summary>The rule in plain words, for error messages.</summary>
    public const string Rule = "an id uses lower-case letters, digits and single hyphens between them (at most 80 characters, and not a device name such as con or nul)";

    [GeneratedRegex("^[a-z0-9]+(-[a-z0-9]+)*$", RegexOptions.CultureInvariant)]
    private static partial Regex SlugPattern();
}
