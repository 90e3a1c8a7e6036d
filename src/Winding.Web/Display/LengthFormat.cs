using System.Globalization;
using System.Text.RegularExpressions;

namespace Winding.Web.Display;

/// <summary>
/// Lengths, areas and volumes for the results, in the chosen <see cref="UnitSystem"/>. Metric keeps the app's figures
/// as they were (mm with fixed decimals); imperial shows inches to 0.001 in for core dimensions (a caliper's resolution),
/// wire and skin-depth sizes in inches to 0.0001 in (0.1 mil, the resolution of the ASTM B258 and NEMA MW 1000 inch
/// tables), areas and volumes in in² and in³ to three significant figures, and lengths to cut in inches to 0.1 in with
/// feet and inches beside them from 12 in on.
/// </summary>
public static partial class LengthFormat
{
    /// <summary>The symbol lengths are shown in: "mm" or "in".</summary>
    public static string Symbol(UnitSystem system) => system == UnitSystem.Imperial ? "in" : "mm";

    /// <summary>The symbol areas are shown in: "mm²" or "in²".</summary>
    public static string AreaSymbol(UnitSystem system) => Symbol(system) + "²";

    /// <summary>A core dimension or mean turn length: mm with <paramref name="millimetreDecimals"/>, or in to 0.001 in.</summary>
    public static string Dimension(double millimetres, UnitSystem system, int millimetreDecimals) =>
        system == UnitSystem.Imperial
            ? Fixed(LengthConversion.FromMillimetresApproximately(millimetres, LengthUnit.Inch), 3) + " in"
            : Fixed(millimetres, millimetreDecimals) + " mm";

    /// <summary>A dimension as a bare number in the system's unit (mm "0.####", in "0.###"), for drawings.</summary>
    public static string DimensionNumber(double millimetres, UnitSystem system) =>
        system == UnitSystem.Imperial
            ? LengthConversion.FromMillimetresApproximately(millimetres, LengthUnit.Inch).ToString("0.###", CultureInfo.InvariantCulture)
            : millimetres.ToString("0.####", CultureInfo.InvariantCulture);

    /// <summary>A wire diameter or insulation thickness: mm "0.###", or in to 0.0001 in.</summary>
    public static string WireSize(double millimetres, UnitSystem system) =>
        system == UnitSystem.Imperial
            ? Fixed(LengthConversion.FromMillimetresApproximately(millimetres, LengthUnit.Inch), 4) + " in"
            : millimetres.ToString("0.###", CultureInfo.InvariantCulture) + " mm";

    /// <summary>An area: mm² with <paramref name="millimetreDecimals"/>, or in² to three significant figures.</summary>
    public static string Area(double squareMillimetres, UnitSystem system, int millimetreDecimals) =>
        system == UnitSystem.Imperial
            ? Significant(squareMillimetres / LengthConversion.SquareMillimetresPerSquareInch, 3) + " in²"
            : Fixed(squareMillimetres, millimetreDecimals) + " mm²";

    /// <summary>A volume: mm³ with <paramref name="millimetreDecimals"/>, or in³ to three significant figures.</summary>
    public static string Volume(double cubicMillimetres, UnitSystem system, int millimetreDecimals) =>
        system == UnitSystem.Imperial
            ? Significant(cubicMillimetres / LengthConversion.CubicMillimetresPerCubicInch, 3) + " in³"
            : Fixed(cubicMillimetres, millimetreDecimals) + " mm³";

    /// <summary>
    /// A quantity per length to the power <paramref name="power"/> (IEC 60205 core factors C1 in mm⁻¹, C2 in mm⁻³):
    /// per mm with <paramref name="format"/>, or per inch to four significant figures.
    /// </summary>
    public static string PerLength(double perMillimetrePower, int power, UnitSystem system, string format)
    {
        var exponent = power switch { 1 => "⁻¹", 2 => "⁻²", 3 => "⁻³", _ => throw new ArgumentOutOfRangeException(nameof(power), power, "1, 2 or 3.") };
        return system == UnitSystem.Imperial
            ? Significant(perMillimetrePower * Math.Pow((double)LengthConversion.MillimetresPerInch, power), 4) + " in" + exponent
            : perMillimetrePower.ToString(format, CultureInfo.InvariantCulture) + " mm" + exponent;
    }

    /// <summary>
    /// A length of wire to cut: whole mm, or inches to 0.1 in with feet and inches beside it from 12 in on
    /// ("48.6 in (4 ft 0.6 in)"). The feet and inches are taken from the rounded tenths, so they never read "12.0 in".
    /// </summary>
    public static string CutLength(double millimetres, UnitSystem system)
    {
        if (system != UnitSystem.Imperial)
        {
            return Fixed(millimetres, 0) + " mm";
        }

        var tenths = (long)Math.Round(LengthConversion.FromMillimetresApproximately(millimetres, LengthUnit.Inch) * 10, MidpointRounding.AwayFromZero);
        var inches = Fixed(tenths / 10.0, 1) + " in";
        if (tenths < 120)
        {
            return inches;
        }

        var feet = tenths / 120;
        var rest = tenths % 120;
        return inches + " (" + feet.ToString(CultureInfo.InvariantCulture) + " ft " + Fixed(rest / 10.0, 1) + " in)";
    }

    /// <summary>A skin depth given in metres: with an SI prefix (µm), or in inches to three significant figures.</summary>
    public static string SkinDepth(double metres, UnitSystem system) =>
        system == UnitSystem.Imperial
            ? Significant(LengthConversion.FromMillimetresApproximately(metres * 1e3, LengthUnit.Inch), 3) + " in"
            : EngineeringFormat.Format(metres, "m");

    /// <summary>
    /// A current density given in A/m²: A/mm², or A/in² with the trade's circular mils per ampere beside it (about
    /// 500 cmil/A is the usual limit for small windings, the 4 A/mm² rule of thumb; common practice, no source).
    /// </summary>
    public static string CurrentDensity(double amperesPerSquareMetre, UnitSystem system)
    {
        var perSquareMillimetre = amperesPerSquareMetre / 1e6;
        if (system != UnitSystem.Imperial)
        {
            return Fixed(perSquareMillimetre, 2) + " A/mm²";
        }

        var perSquareInch = perSquareMillimetre * LengthConversion.SquareMillimetresPerSquareInch;
        var circularMilsPerAmpere = perSquareMillimetre > 0 ? Fixed(1 / (perSquareMillimetre * LengthConversion.SquareMillimetresPerCircularMil), 0) : "—";
        return Fixed(perSquareInch, 0) + " A/in² (" + circularMilsPerAmpere + " cmil/A)";
    }

    /// <summary>A plain number with a fixed count of decimals (invariant culture).</summary>
    public static string Fixed(double value, int decimals) =>
        value.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    /// <summary>
    /// The engine's prose (fit reasons, warnings, wire-suggestion reasons), which gives lengths as "33.81 mm" and areas
    /// as "1.2 mm²", with each such figure written in <paramref name="system"/>: metric leaves the text as it is;
    /// imperial writes lengths under 1 mm as wire sizes (0.0001 in), longer ones as dimensions (0.001 in), areas in in².
    /// Other units (A/mm², mm⁻¹) are left alone.
    /// </summary>
    public static string Prose(string text, UnitSystem system)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (system != UnitSystem.Imperial)
        {
            return text;
        }

        return MillimetreFigure().Replace(text, m =>
        {
            var value = double.Parse(m.Groups["value"].Value, CultureInfo.InvariantCulture);
            if (m.Groups["square"].Success)
            {
                return Area(value, system, 0);
            }

            return value < 1 ? WireSize(value, system) : Dimension(value, system, 0);
        });
    }

    /// <summary>A number followed by " mm" or " mm²" that is not part of another unit.</summary>
    [GeneratedRegex(@"(?<![\w.,])(?<value>\d+(?:\.\d+)?) mm(?<square>²)?(?![\w²³⁻/])", RegexOptions.CultureInvariant)]
    private static partial Regex MillimetreFigure();

    /// <summary>A number to <paramref name="digits"/> significant figures, never in exponent form.</summary>
    public static string Significant(double value, int digits)
    {
        if (!double.IsFinite(value))
        {
            return "—";
        }

        if (value == 0)
        {
            return "0";
        }

        var magnitude = (int)Math.Floor(Math.Log10(Math.Abs(value)));
        var decimals = Math.Clamp(digits - 1 - magnitude, 0, 15);
        var rounded = Math.Round(value, decimals, MidpointRounding.AwayFromZero);
        return rounded.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
    }
}
