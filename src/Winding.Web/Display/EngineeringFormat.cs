using System.Globalization;

namespace Winding.Web.Display;

/// <summary>Formats SI values for display with an SI prefix (µH, mΩ, …), invariant culture.</summary>
public static class EngineeringFormat
{
    private static readonly (double Factor, string Prefix)[] Prefixes =
    [
        (1e9, "G"), (1e6, "M"), (1e3, "k"), (1, string.Empty), (1e-3, "m"), (1e-6, "µ"), (1e-9, "n"), (1e-12, "p"),
    ];

    /// <summary>Formats <paramref name="value"/> in <paramref name="unit"/> with 3 significant figures and an SI prefix.</summary>
    public static string Format(double value, string unit)
    {
        if (!double.IsFinite(value))
        {
            return "—";
        }

        if (value == 0)
        {
            return "0 " + unit;
        }

        var magnitude = Math.Abs(value);
        foreach (var (factor, prefix) in Prefixes)
        {
            if (magnitude >= factor * 0.9995)
            {
                return Scaled(value / factor, prefix + unit);
            }
        }

        return Scaled(value / 1e-12, "p" + unit);
    }

    /// <summary>
    /// <paramref name="value"/> as a text to edit: up to 6 significant figures with an SI prefix (ASCII "u" for micro),
    /// so that <see cref="EngineeringNumber.TryParse"/> reads it back to the same value to 6 figures ("123.457 uH"); a
    /// number without a unit gets no prefix.
    /// </summary>
    public static string Editable(double value, string unit)
    {
        if (!double.IsFinite(value) || value == 0 || unit.Length == 0)
        {
            // A plain ratio is written without a prefix.
            return value.ToString("G6", CultureInfo.InvariantCulture) + (unit.Length > 0 ? " " + unit : string.Empty);
        }

        var magnitude = Math.Abs(value);
        var (factor, prefix) = Prefixes.FirstOrDefault(p => magnitude >= p.Factor * 0.9999995, (Factor: 1e-12, Prefix: "p"));
        var scaled = value / factor;
        var digits = Math.Max(0, 5 - (int)Math.Floor(Math.Log10(Math.Abs(scaled))));
        var text = Math.Round(scaled, digits).ToString("0.######", CultureInfo.InvariantCulture);
        var symbol = (prefix == "µ" ? "u" : prefix) + unit;
        return symbol.Length > 0 ? text + " " + symbol : text;
    }

    /// <summary>A plain number with a fixed count of decimals and a unit.</summary>
    public static string Fixed(double value, int decimals, string unit) =>
        value.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) + (unit.Length > 0 ? " " + unit : string.Empty);

    private static string Scaled(double scaled, string unit)
    {
        var digits = Math.Abs(scaled) >= 100 ? 0 : Math.Abs(scaled) >= 10 ? 1 : 2;
        return scaled.ToString("F" + digits.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) + " " + unit;
    }
}
