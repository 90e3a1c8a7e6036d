using System.Globalization;
using CsCheck;

namespace Winding.Web.Tests.Display;

/// <summary>Generators of lengths for the unit property tests.</summary>
internal static class LengthGenerators
{
    /// <summary>Any double from 1 µm to 1000 km in millimetres, spread evenly over the decades (not only "nice" values).</summary>
    public static Gen<double> Millimetres { get; } =
        Gen.Select(Gen.Double[-3, 9], Gen.Double[1, 10]).Select((decade, mantissa) => mantissa * Math.Pow(10, decade));

    /// <summary>
    /// Numbers as a person types them: 1 to 6 significant digits with 0 to 6 decimals ("0.0201", "12.7", "36"), with a
    /// decimal point or comma.
    /// </summary>
    public static Gen<string> TypedNumbers { get; } =
        Gen.Select(Gen.Int[1, 999_999], Gen.Int[0, 6], Gen.Bool).Select((digits, decimals, comma) =>
        {
            var text = (digits / Math.Pow(10, decimals)).ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
            return comma ? text.Replace('.', ',') : text;
        });
}
