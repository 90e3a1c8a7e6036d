using System.Globalization;
using System.Text.RegularExpressions;

namespace Winding.Web.Display;

/// <summary>
/// Lengths as typed into length fields and as written back into them. A length is a number (decimal point or comma,
/// optional exponent) with an optional unit: <c>mm</c>, <c>in</c>, <c>"</c> (also ″ and ”), or <c>mil</c> (also
/// <c>mils</c>), in any letter case. A plain number is in the field's unit. SI prefixes are not read here: "m" alone would
/// be ambiguous (milli of the field's unit, or metres), so "1m" is refused with a message asking for "1 mm" or "1000 mm";
/// other fields keep reading "m" as milli (<see cref="EngineeringNumber"/>).
/// </summary>
/// <remarks>
/// A winding draft keeps the text as typed; a plain number there means millimetres (the stored unit), and a plain number
/// typed in inches is kept as "0.02 in" (<see cref="ForDraft"/>) so that the draft never depends on the switch.
/// </remarks>
public static partial class LengthText
{
    /// <summary>The problem text for a text that is not a length.</summary>
    public const string Expected = "a number, optionally followed by mm, in, mil or \"";

    /// <summary>Reads <paramref name="text"/>; a plain number is in <paramref name="plainUnit"/>.</summary>
    public static LengthReading Read(string? text, LengthUnit plainUnit)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            return new(null, plainUnit, "is empty");
        }

        var match = Pattern().Match(text.Trim());
        if (!match.Success)
        {
            return new(null, plainUnit, "is not a length: write " + Expected);
        }

        var suffix = match.Groups["unit"].Value;
        LengthUnit unit;
        if (suffix.Length == 0)
        {
            unit = plainUnit;
        }
        else if (UnitOf(suffix) is { } typed)
        {
            unit = typed;
        }
        else if (suffix == "m" || suffix == "M")
        {
            return new(null, plainUnit, "is ambiguous: \"m\" alone could be milli or metres; write 1 mm, 1000 mm, 0.04 in or 40 mil");
        }
        else
        {
            return new(null, plainUnit, $"has the unit '{suffix}', which is not a length unit here: write " + Expected);
        }

        var digits = match.Groups["number"].Value.Replace(',', '.');
        if (!double.TryParse(digits, NumberStyles.Float, CultureInfo.InvariantCulture, out var value) || !double.IsFinite(value))
        {
            return new(null, unit, "is too large to be a length");
        }

        var millimetres = unit == LengthUnit.Millimetre ? value
            : decimal.TryParse(digits, NumberStyles.Float, CultureInfo.InvariantCulture, out var exact) && (exact != 0 || value == 0) && Math.Abs(value) < 1e15
                ? LengthConversion.DecimalToMillimetres(exact, unit)
                : LengthConversion.ToMillimetres(value, unit);
        return double.IsFinite(millimetres) ? new(millimetres, unit, null) : new(null, unit, "is too large to be a length");
    }

    /// <summary>
    /// The draft text for what was typed into a field shown in <paramref name="system"/>: a plain number typed in inches
    /// gets " in" added; everything else (plain millimetres, a number with its unit, text that is not a length) is kept
    /// as typed.
    /// </summary>
    public static string ForDraft(string? typed, UnitSystem system)
    {
        var text = typed ?? string.Empty;
        if (system != UnitSystem.Imperial || string.IsNullOrWhiteSpace(text))
        {
            return text;
        }

        var match = Pattern().Match(text.Trim());
        return match.Success && match.Groups["unit"].Value.Length == 0 ? text.Trim() + " in" : text;
    }

    /// <summary>The draft text of a stored length: the shortest text that reads back as exactly the same millimetres.</summary>
    public static string ForDraft(double? millimetres) => millimetres?.ToString("R", CultureInfo.InvariantCulture) ?? string.Empty;

    /// <summary>
    /// A draft text (plain number = millimetres) as a field in <paramref name="system"/> shows it: the number in the
    /// system's field unit, at most <paramref name="significantDigits"/> significant digits, without the unit (the label
    /// carries it). Text that is not a length is shown as it is, so that its error can be read next to it.
    /// </summary>
    public static string Show(string? draft, UnitSystem system, int significantDigits = 6)
    {
        var reading = Read(draft, LengthUnit.Millimetre);
        var fieldUnit = LengthConversion.FieldUnit(system);
        if (reading.Millimetres is not { } millimetres)
        {
            return draft ?? string.Empty;
        }

        // A length already in the field's unit is shown exactly as typed (without its unit).
        var trimmed = draft!.Trim();
        if (reading.Unit == fieldUnit)
        {
            var number = Pattern().Match(trimmed).Groups["number"].Value;
            return number;
        }

        return Number(millimetres, fieldUnit, significantDigits);
    }

    /// <summary>
    /// <paramref name="millimetres"/> in <paramref name="unit"/> as a plain number text (invariant culture, no exponent)
    /// rounded to <paramref name="significantDigits"/> significant digits, trailing zeros dropped.
    /// </summary>
    public static string Number(double millimetres, LengthUnit unit, int significantDigits)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(significantDigits, 1);
        if (LengthConversion.FromMillimetres(millimetres, unit) is not { } exact)
        {
            return LengthConversion.FromMillimetresApproximately(millimetres, unit).ToString("G" + significantDigits.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        }

        return Significant(exact, significantDigits);
    }

    /// <summary>
    /// <paramref name="millimetres"/> in <paramref name="unit"/> with every digit decimal holds: read back in that unit it
    /// gives exactly the same millimetres (the round trip the property tests check).
    /// </summary>
    public static string Exact(double millimetres, LengthUnit unit) =>
        LengthConversion.FromMillimetres(millimetres, unit) is { } exact
            ? exact.ToString("0.#############################", CultureInfo.InvariantCulture)
            : LengthConversion.FromMillimetresApproximately(millimetres, unit).ToString("R", CultureInfo.InvariantCulture);

    private static string Significant(decimal value, int digits)
    {
        if (value == 0)
        {
            return "0";
        }

        var magnitude = (int)Math.Floor(Math.Log10((double)Math.Abs(value)));
        var decimals = Math.Clamp(digits - 1 - magnitude, 0, 28);
        var rounded = Math.Round(value, decimals, MidpointRounding.AwayFromZero);
        return rounded.ToString("0.############################", CultureInfo.InvariantCulture);
    }

    private static LengthUnit? UnitOf(string suffix) => suffix.ToLowerInvariant() switch
    {
        "mm" => LengthUnit.Millimetre,
        "in" or "\"" or "″" or "”" => LengthUnit.Inch,
        "mil" or "mils" => LengthUnit.Mil,
        _ => null,
    };

    [GeneratedRegex(@"^(?<number>[+-]?(\d+([.,]\d*)?|[.,]\d+)([eE][+-]?\d+)?)\s*(?<unit>[A-Za-zµμ""″”']*)$", RegexOptions.CultureInvariant)]
    private static partial Regex Pattern();
}
