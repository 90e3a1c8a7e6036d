using System.Globalization;

namespace Winding.Web.Display;

/// <summary>
/// Exact conversions between millimetres and inch-based units, done in <see cref="decimal"/> so that the decimal digits
/// a person typed are multiplied exactly and rounded to a <see cref="double"/> once.
/// </summary>
/// <remarks>
/// Definitions: 1 in = 25.4 mm exactly (the international inch of the international yard and pound agreement of 1959,
/// NIST SP 811 appendix B); 1 mil = 0.001 in = 0.0254 mm exactly; 1 circular mil = the area of a circle 1 mil across,
/// π/4 mil² (NIST SP 811 appendix B.9 gives 5.067075 × 10⁻¹⁰ m²).
/// </remarks>
public static class LengthConversion
{
    /// <summary>Millimetres per inch: exactly 25.4 (1959 agreement).</summary>
    public const decimal MillimetresPerInch = 25.4m;

    /// <summary>Millimetres per mil: exactly 0.0254 (1 mil = 0.001 in).</summary>
    public const decimal MillimetresPerMil = 0.0254m;

    /// <summary>Square millimetres per square inch: exactly 645.16.</summary>
    public const double SquareMillimetresPerSquareInch = 645.16;

    /// <summary>Cubic millimetres per cubic inch: exactly 16 387.064.</summary>
    public const double CubicMillimetresPerCubicInch = 16387.064;

    /// <summary>Square millimetres per circular mil: π/4 · 0.0254² ≈ 5.067075 × 10⁻⁴.</summary>
    public const double SquareMillimetresPerCircularMil = Math.PI / 4 * 0.0254 * 0.0254;

    // Beyond these magnitudes decimal loses digits or overflows; such lengths are converted in double.
    private const double LargestExact = 1e15;
    private const double SmallestExact = 1e-12;

    /// <summary>Millimetres in one <paramref name="unit"/>.</summary>
    public static decimal MillimetresPer(LengthUnit unit) => unit switch
    {
        LengthUnit.Millimetre => 1m,
        LengthUnit.Inch => MillimetresPerInch,
        LengthUnit.Mil => MillimetresPerMil,
        _ => throw new ArgumentOutOfRangeException(nameof(unit), unit, "Unknown length unit."),
    };

    /// <summary>The unit's symbol: "mm", "in" or "mil".</summary>
    public static string Symbol(LengthUnit unit) => unit switch
    {
        LengthUnit.Millimetre => "mm",
        LengthUnit.Inch => "in",
        LengthUnit.Mil => "mil",
        _ => throw new ArgumentOutOfRangeException(nameof(unit), unit, "Unknown length unit."),
    };

    /// <summary>The unit fields of a system are typed in: mm (metric) or in (imperial).</summary>
    public static LengthUnit FieldUnit(UnitSystem system) => system == UnitSystem.Imperial ? LengthUnit.Inch : LengthUnit.Millimetre;

    /// <summary>
    /// <paramref name="value"/> <paramref name="unit"/>s in millimetres, correctly rounded: the shortest decimal text of
    /// the value is multiplied exactly, then read as a double once.
    /// </summary>
    public static double ToMillimetres(double value, LengthUnit unit)
    {
        if (unit == LengthUnit.Millimetre || value == 0 || !double.IsFinite(value))
        {
            return value;
        }

        return TryExact(value, out var exact) ? DecimalToMillimetres(exact, unit) : value * (double)MillimetresPer(unit);
    }

    /// <summary>An exact decimal amount of <paramref name="unit"/>s in millimetres, rounded to a double once.</summary>
    public static double DecimalToMillimetres(decimal value, LengthUnit unit) => ToDouble(value * MillimetresPer(unit));

    /// <summary>
    /// <paramref name="millimetres"/> in <paramref name="unit"/> as a decimal with 28–29 significant digits (exact where
    /// the quotient terminates, as for every value typed in that unit), or null when the length lies outside
    /// 10⁻¹² … 10¹⁵ mm where decimal would lose digits.
    /// </summary>
    public static decimal? FromMillimetres(double millimetres, LengthUnit unit)
    {
        if (millimetres == 0)
        {
            return 0m;
        }

        return TryExact(millimetres, out var exact) ? exact / MillimetresPer(unit) : null;
    }

    /// <summary><paramref name="millimetres"/> in <paramref name="unit"/> as a double (for figures, not for stored values).</summary>
    public static double FromMillimetresApproximately(double millimetres, LengthUnit unit) =>
        FromMillimetres(millimetres, unit) is { } exact ? ToDouble(exact) : millimetres / (double)MillimetresPer(unit);

    /// <summary>The exact decimal of the shortest text that reads back as <paramref name="value"/>.</summary>
    private static bool TryExact(double value, out decimal exact)
    {
        exact = 0m;
        var magnitude = Math.Abs(value);
        return double.IsFinite(value) && magnitude is >= SmallestExact and <= LargestExact
            && decimal.TryParse(value.ToString("R", CultureInfo.InvariantCulture), NumberStyles.Float, CultureInfo.InvariantCulture, out exact);
    }

    /// <summary>Reads a decimal as the nearest double (via its text: .NET parses text correctly rounded).</summary>
    private static double ToDouble(decimal value) => double.Parse(value.ToString(CultureInfo.InvariantCulture), NumberStyles.Float, CultureInfo.InvariantCulture);
}
