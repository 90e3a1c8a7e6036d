using System.Globalization;
using System.Text.RegularExpressions;

namespace Winding.Web.Display;

/// <summary>
/// Parses numbers as people type them: invariant digits with a decimal point or comma, an optional exponent, an optional
/// SI prefix (p, n, u, µ, m, k, M, G) and an optional unit that must match the field's unit ("4.7u", "4.7 µH",
/// "100k", "1.8 MHz", "1,8 MHz").
/// </summary>
public static partial class EngineeringNumber
{
    private static readonly Dictionary<string, double> Prefixes = new(StringComparer.Ordinal)
    {
        ["p"] = 1e-12, ["n"] = 1e-9, ["u"] = 1e-6, ["µ"] = 1e-6, ["μ"] = 1e-6, ["m"] = 1e-3,
        ["k"] = 1e3, ["M"] = 1e6, ["G"] = 1e9,
    };

    /// <summary>Parses <paramref name="text"/>; <paramref name="unit"/> is the field's unit symbol (e.g. "Hz"), or empty.</summary>
    /// <returns>The value in the unit, or null when the text is not a number in that unit.</returns>
    public static double? TryParse(string? text, string unit)
    {
        ArgumentNullException.ThrowIfNull(unit);
        if (string.IsNullOrWhiteSpace(text))
        {
            return null;
        }

        var match = Pattern().Match(text.Trim());
        if (!match.Success)
        {
            return null;
        }

        var digits = match.Groups["number"].Value.Replace(',', '.');
        if (!double.TryParse(digits, NumberStyles.Float, CultureInfo.InvariantCulture, out var value) || !double.IsFinite(value))
        {
            return null;
        }

        var suffix = match.Groups["suffix"].Value.Trim();
        if (suffix.Length == 0)
        {
            return value;
        }

        if (unit.Length > 0 && suffix.EndsWith(unit, StringComparison.Ordinal))
        {
            suffix = suffix[..^unit.Length];
        }
        else if (unit.Length > 0 && string.Equals(suffix, unit, StringComparison.OrdinalIgnoreCase))
        {
            suffix = string.Empty;
        }

        if (suffix.Length == 0)
        {
            return value;
        }

        // "m" before a unit of metres would be ambiguous; fields in millimetres take plain numbers.
        return Prefixes.TryGetValue(suffix, out var factor) && double.IsFinite(value * factor) ? value * factor : null;
    }

    [GeneratedRegex(@"^(?<number>[+-]?(\d+([.,]\d*)?|[.,]\d+)([eE][+-]?\d+)?)\s*(?<suffix>[^\d\s]*\s*[A-Za-zΩ°µμ%]*)$", RegexOptions.CultureInvariant)]
    private static partial Regex Pattern();
}
