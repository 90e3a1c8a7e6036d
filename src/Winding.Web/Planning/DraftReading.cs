using System.Globalization;
using Winding.Web.Display;

namespace Winding.Web.Planning;

/// <summary>
/// Reads the plan page's draft texts into the plan document's numbers. A text that is not a number is a field error
/// here (the document cannot carry it); every range and consistency check is left to the same reader the API uses.
/// Numbers accept SI prefixes and a decimal comma (<see cref="EngineeringNumber"/>); lengths a unit
/// (<see cref="LengthText"/>, plain numbers in mm).
/// </summary>
public static class DraftReading
{
    /// <summary>A number in <paramref name="unit"/>, or null (empty, or not a number: then an error at <paramref name="path"/>).</summary>
    public static double? Number(Dictionary<string, string> errors, string path, string text, string label, string unit, bool required)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            if (required)
            {
                errors[path] = $"{label}: required{(unit.Length > 0 ? $", in {unit}" : string.Empty)}.";
            }

            return null;
        }

        var value = EngineeringNumber.TryParse(text, unit);
        if (value is null)
        {
            errors[path] = $"{label}: '{text.Trim()}' is not a number{(unit.Length > 0 ? $" in {unit}" : string.Empty)}.";
        }

        return value;
    }

    /// <summary>
    /// A length field's draft text in millimetres: a plain number is millimetres, a number with a unit (mm, in, mil, ")
    /// is converted exactly (<see cref="LengthText"/>). The page's length fields write such texts (<c>LengthField</c>).
    /// </summary>
    public static double? Length(Dictionary<string, string> errors, string path, string text, string label, bool required)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            if (required)
            {
                errors[path] = $"{label}: required, in mm or with a unit (0.5 mm, 0.02 in, 20 mil).";
            }

            return null;
        }

        var reading = LengthText.Read(text, LengthUnit.Millimetre);
        if (reading.Millimetres is null)
        {
            errors[path] = $"{label}: '{text.Trim()}' {reading.Problem}.";
        }

        return reading.Millimetres;
    }

    /// <summary>A whole number, or null (empty, or not whole: then an error at <paramref name="path"/>).</summary>
    public static int? Whole(Dictionary<string, string> errors, string path, string text, string label, bool required)
    {
        var value = Number(errors, path, text, label, string.Empty, required);
        if (value is null)
        {
            return null;
        }

        if (value != Math.Floor(value.Value) || Math.Abs(value.Value) > int.MaxValue)
        {
            errors[path] = $"{label}: '{text.Trim()}' is not a whole number.";
            return null;
        }

        return (int)value.Value;
    }

    /// <summary>
    /// An AL in nH per turn²: a plain number is nH ("120"); a number with a unit in henries is converted ("120 nH",
    /// "0.12 µH", "0.12u H").
    /// </summary>
    public static double? Nanohenries(Dictionary<string, string> errors, string path, string text, string label, bool required)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            if (required)
            {
                errors[path] = $"{label}: required, in nH per turn² (e.g. 120 or 120 nH).";
            }

            return null;
        }

        var trimmed = text.Trim().Replace(',', '.');
        if (double.TryParse(trimmed, NumberStyles.Float, CultureInfo.InvariantCulture, out var plain))
        {
            if (double.IsFinite(plain))
            {
                return plain;
            }
        }
        else if (EngineeringNumber.TryParse(text, "H") is { } henries && trimmed.EndsWith('H'))
        {
            return henries * 1e9;
        }

        errors[path] = $"{label}: '{text.Trim()}' is not an AL in nH per turn² (e.g. 120 or 120 nH).";
        return null;
    }

    /// <summary>The draft text of a stored number: the shortest text that reads back as exactly the same value.</summary>
    public static string Show(double? value) => value?.ToString("R", CultureInfo.InvariantCulture) ?? string.Empty;

    /// <summary>
    /// The draft text of a stored value with a unit, in engineering notation when that reads back to exactly the stored
    /// double ("3.5 MHz" for 3500000 Hz); otherwise the number's shortest round-trip text, so no digit is ever lost.
    /// </summary>
    public static string ShowWithUnit(double? value, string unit)
    {
        if (value is not { } v)
        {
            return string.Empty;
        }

        var readable = Winding.Web.Display.EngineeringFormat.Editable(v, unit).Replace(" u" + unit, " µ" + unit, StringComparison.Ordinal);
        return Winding.Web.Display.EngineeringNumber.TryParse(readable, unit) == v ? readable : Show(v);
    }

    /// <summary>The draft text of a stored whole number.</summary>
    public static string Show(int? value) => value?.ToString(CultureInfo.InvariantCulture) ?? string.Empty;

    /// <summary>An optional word: empty text is "not given".</summary>
    public static string? Word(string text) => string.IsNullOrWhiteSpace(text) ? null : text.Trim();
}
