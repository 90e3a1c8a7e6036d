using System.Text.RegularExpressions;

namespace Winding.Catalogue.Entries;

/// <summary>Catalogue ids are slugs: lower-case letters and digits in groups joined by single hyphens, 1–80 characters.</summary>
public static partial class EntryId
{
    /// <summary>True when <paramref name="id"/> is a valid slug.</summary>
    public static bool IsValid(string? id) => id is { Length: > 0 and <= 80 } && SlugPattern().IsMatch(id);

    /// <summary>The rule in plain words, for error messages.</summary>
    public const string Rule = "an id uses lower-case letters, digits and single hyphens between them (at most 80 characters)";

    [GeneratedRegex("^[a-z0-9]+(-[a-z0-9]+)*$", RegexOptions.CultureInvariant)]
    private static partial Regex SlugPattern();
}
