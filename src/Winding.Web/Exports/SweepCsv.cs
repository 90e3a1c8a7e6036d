using System.Globalization;
using System.Text;
using Winding.Core.Response;

namespace Winding.Web.Exports;

/// <summary>
/// Writes a response sweep as CSV (RFC 4180): a header row naming each column with its unit, then one row per frequency,
/// fields separated by commas, lines ended by CRLF, numbers in the invariant culture with the round-trip format ("R"),
/// so that each value reads back exactly. No field needs quoting (the header is plain ASCII without commas or quotes;
/// numbers have none), and there are no comment lines (RFC 4180 has none): the plan's name goes only into the file
/// name. The columns, in order:
/// <list type="number">
/// <item><c>frequency (Hz)</c>;</item>
/// <item><c>insertion loss (dB)</c> against an ideal lossless transformer of the same ratio;</item>
/// <item><c>return loss (dB)</c> at the primary;</item>
/// <item><c>|Zin| (ohm)</c> and <c>Zin phase (deg)</c>: the impedance into the primary (source excluded), magnitude and
/// angle;</item>
/// <item><c>Zin real (ohm)</c> and <c>Zin imaginary (ohm)</c>: the same as R + jX;</item>
/// <item><c>|Vout'| (V)</c> and <c>Vout' phase (deg)</c>: the voltage across the load referred to the primary for a
/// 1 V source behind the source resistance (multiply by N_last/N_first for the voltage at the last winding).</item>
/// </list>
/// </summary>
public static class SweepCsv
{
    /// <summary>The media type, with RFC 4180's optional <c>header</c> parameter.</summary>
    public const string ContentType = "text/csv; charset=utf-8; header=present";

    /// <summary>The header row's fields, in column order.</summary>
    public static IReadOnlyList<string> Columns { get; } =
    [
        "frequency (Hz)",
        "insertion loss (dB)",
        "return loss (dB)",
        "|Zin| (ohm)",
        "Zin phase (deg)",
        "Zin real (ohm)",
        "Zin imaginary (ohm)",
        "|Vout'| (V)",
        "Vout' phase (deg)",
    ];

    /// <summary>The CSV text of <paramref name="sweep"/>.</summary>
    public static string Write(IReadOnlyList<CircuitPoint> sweep)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        var text = new StringBuilder(128 * (sweep.Count + 1));
        text.AppendJoin(',', Columns).Append("\r\n");
        foreach (var point in sweep)
        {
            text.AppendJoin(
                ',',
                Number(point.FrequencyHz),
                Number(point.InsertionLossDb),
                Number(point.ReturnLossDb),
                Number(point.InputImpedanceOhm.Magnitude),
                Number(Degrees(point.InputImpedanceOhm.Phase)),
                Number(point.InputImpedanceOhm.Real),
                Number(point.InputImpedanceOhm.Imaginary),
                Number(point.OutputVoltage.Magnitude),
                Number(Degrees(point.OutputVoltage.Phase)));
            text.Append("\r\n");
        }

        return text.ToString();
    }

    /// <summary>An angle in radians in degrees.</summary>
    public static double Degrees(double radians) => radians * (180 / Math.PI);

    private static string Number(double value) => value.ToString("R", CultureInfo.InvariantCulture);
}
