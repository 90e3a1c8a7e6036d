using System.Globalization;

namespace Winding.Core.Sheets;

/// <summary>Numbers inside the sheet's sentences (invariant culture, SI prefixes, three significant figures).</summary>
internal static class SheetText
{
    private static readonly (double Factor, string Prefix)[] Prefixes =
    [
        (1e9, "G"), (1e6, "M"), (1e3, "k"), (1, string.Empty), (1e-3, "m"), (1e-6, "µ"), (1e-9, "n"), (1e-12, "p"),
    ];

    /// <summary>A value with an SI prefix, e.g. "4.70 µH".</summary>
    public static string Si(double value, string unit)
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
        var (factor, prefix) = Prefixes.FirstOrDefault(p => magnitude >= p.Factor * 0.9995, (Factor: 1e-15, Prefix: "f"));
        var scaled = value / factor;
        var digits = Math.Abs(scaled) >= 100 ? 0 : Math.Abs(scaled) >= 10 ? 1 : 2;
        return scaled.ToString("F" + digits.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) + " " + prefix + unit;
    }

    /// <summary>A length in millimetres, e.g. "0.315 mm".</summary>
    public static string Mm(double metres) => Text($"{metres * 1e3:0.###} mm");

    /// <summary>A length rounded to whole millimetres, e.g. "244 mm" (how wire is cut).</summary>
    public static string WholeMm(double metres) => Text($"{metres * 1e3:0} mm");

    /// <summary>A signed percentage with a true minus sign, e.g. "−2.9 %" or "+3.1 %".</summary>
    public static string SignedPercent(double fraction) => (fraction * 100).ToString("+0.##;−0.##;0", CultureInfo.InvariantCulture) + " %";

    /// <summary>A fraction as a percentage, e.g. "25 %".</summary>
    public static string Percent(double fraction) => Text($"{fraction * 100:0.#} %");

    /// <summary>A frequency to three significant figures, e.g. "100 kHz", "10.2 MHz", "949 Hz".</summary>
    public static string Hz(double frequencyHz) => frequencyHz switch
    {
        >= 999.5e6 => Text($"{frequencyHz / 1e9:G3} GHz"),
        >= 999.5e3 => Text($"{frequencyHz / 1e6:G3} MHz"),
        >= 999.5 => Text($"{frequencyHz / 1e3:G3} kHz"),
        _ => Text($"{frequencyHz:G3} Hz"),
    };

    /// <summary>A length of wire to cut: whole millimetres up to 2 m, then metres to the centimetre ("14.56 m").</summary>
    public static string CutLength(double metres) => metres < 2 ? WholeMm(metres) : Text($"{metres:0.00} m");

    /// <summary>An interpolated text in the invariant culture.</summary>
    public static string Text(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
