using System.Globalization;
using System.Text;
using Winding.Catalogue.Entries;

namespace Winding.Catalogue.Plans;

/// <summary>
/// Makes a plan id from a plan's name: accents dropped, lower case, every run of other characters turned into one
/// hyphen, at most <see cref="MaximumBaseLength"/> characters (room for a <c>-2</c>, <c>-3</c>… suffix), <c>plan</c>
/// when nothing is left, and a <c>-plan</c> suffix for a reserved device name. The result is always a valid
/// <see cref="EntryId"/>.
/// </summary>
internal static class PlanSlug
{
    /// <summary>Longest slug made from a name, characters.</summary>
    public const int MaximumBaseLength = 60;

    /// <summary>The slug for <paramref name="name"/>.</summary>
    public static string From(string name)
    {
        var text = new StringBuilder();
        foreach (var c in name.Normalize(NormalizationForm.FormD))
        {
            if (CharUnicodeInfo.GetUnicodeCategory(c) == UnicodeCategory.NonSpacingMark)
            {
                continue;
            }

            var lower = char.ToLowerInvariant(c);
            if (lower is (>= 'a' and <= 'z') or (>= '0' and <= '9'))
            {
                text.Append(lower);
            }
            else if (text.Length > 0 && text[^1] != '-')
            {
                text.Append('-');
            }
        }

        var slug = text.ToString();
        if (slug.Length > MaximumBaseLength)
        {
            slug = slug[..MaximumBaseLength];
        }

        slug = slug.Trim('-');
        if (slug.Length == 0)
        {
            return "plan";
        }

        return EntryId.IsValid(slug) ? slug : slug + "-plan";
    }

    /// <summary>The slug for <paramref name="name"/>, with <c>-2</c>, <c>-3</c>… added until <paramref name="taken"/> says it is free.</summary>
    public static string Unique(string name, Func<string, bool> taken)
    {
        var slug = From(name);
        var candidate = slug;
        for (var n = 2; taken(candidate); n++)
        {
            candidate = string.Create(CultureInfo.InvariantCulture, $"{slug}-{n}");
        }

        return candidate;
    }
}
