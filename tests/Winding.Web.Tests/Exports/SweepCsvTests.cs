using System.Globalization;
using Winding.Core.Geometry;
using Winding.Core.Materials;
using Winding.Core.Plans;
using Winding.Core.Quantities;
using Winding.Core.Response;
using Winding.Core.Windings;
using Winding.Core.Wire;
using Winding.Web.Exports;

namespace Winding.Web.Tests.Exports;

/// <summary>
/// The sweep as CSV: read back by an RFC 4180 reader written here (fields split on commas, records on CRLF, quoted fields
/// refused since none should occur), it equals the engine's own sweep value for value. A presentation test: the values
/// are the engine's, the check is that none is lost or altered on the way.
/// </summary>
public sealed class SweepCsvTests
{
    [Fact]
    public void Write_ReadBack_EqualsTheEnginesSweepExactly()
    {
        var sweep = Sweep(41);

        var rows = Read(SweepCsv.Write(sweep));

        Assert.Equal(SweepCsv.Columns, rows[0]);
        Assert.Equal(sweep.Count, rows.Count - 1);
        for (var i = 0; i < sweep.Count; i++)
        {
            var p = sweep[i];
            var row = rows[i + 1].Select(f => double.Parse(f, NumberStyles.Float, CultureInfo.InvariantCulture)).ToArray();
            Assert.Equal(9, row.Length);
            // Exactly: "R" writes the shortest text that reads back as the same double.
            Assert.Equal(p.FrequencyHz, row[0]);
            Assert.Equal(p.InsertionLossDb, row[1]);
            Assert.Equal(p.ReturnLossDb, row[2]);
            Assert.Equal(p.InputImpedanceOhm.Real, row[5]);
            Assert.Equal(p.InputImpedanceOhm.Imaginary, row[6]);
            // Magnitudes and angles agree with the real and imaginary parts (|z| = √(x² + y²), arg z = atan2(y, x)).
            Assert.Equal(Math.Sqrt((row[5] * row[5]) + (row[6] * row[6])), row[3], 1e-12 * row[3]);
            Assert.Equal(Math.Atan2(row[6], row[5]) * 180 / Math.PI, row[4], 1e-9);
            Assert.Equal(p.OutputVoltage.Magnitude, row[7]);
            Assert.Equal(Math.Atan2(p.OutputVoltage.Imaginary, p.OutputVoltage.Real) * 180 / Math.PI, row[8], 1e-9);
        }
    }

    [Fact]
    public void Write_FollowsRfc4180Framing()
    {
        var text = SweepCsv.Write(Sweep(5));

        // RFC 4180 §2 (1): each record ends with CRLF, the last one too; no bare CR or LF inside.
        Assert.EndsWith("\r\n", text, StringComparison.Ordinal);
        Assert.Equal(6, text.Split("\r\n").Length - 1);
        Assert.DoesNotContain('\n', text.Replace("\r\n", string.Empty, StringComparison.Ordinal));
        Assert.DoesNotContain('\r', text.Replace("\r\n", string.Empty, StringComparison.Ordinal));
        // §2 (4), (6): fields are plain (no quotes needed), and every record has as many fields as the header (§2 (4)).
        Assert.DoesNotContain('"', text);
        Assert.All(text.Split("\r\n", StringSplitOptions.RemoveEmptyEntries), line => Assert.Equal(SweepCsv.Columns.Count, line.Split(',').Length));
    }

    [Fact]
    public void Write_UnderACommaDecimalCulture_StaysInvariant()
    {
        var sweep = Sweep(3);
        var before = CultureInfo.CurrentCulture;
        try
        {
            CultureInfo.CurrentCulture = CultureInfo.GetCultureInfo("de-DE");

            var rows = Read(SweepCsv.Write(sweep));

            Assert.Equal(sweep[1].InsertionLossDb, double.Parse(rows[2][1], CultureInfo.InvariantCulture));
            Assert.All(rows, r => Assert.Equal(SweepCsv.Columns.Count, r.Length));
        }
        finally
        {
            CultureInfo.CurrentCulture = before;
        }
    }

    [Fact]
    public void Write_EmptySweep_IsTheHeaderOnly() => Assert.Equal(string.Join(',', SweepCsv.Columns) + "\r\n", SweepCsv.Write([]));

    /// <summary>The sweep of <see cref="Response"/>.</summary>
    internal static IReadOnlyList<CircuitPoint> Sweep(int points) => Response(points).Sweep;

    /// <summary>The response of a 4 : 12 turn toroid plan over 1.8–30 MHz between 50 Ω and 450 Ω, swept with <paramref name="points"/> points.</summary>
    internal static ResponseEvaluation Response(int points)
    {
        var core = new PlanCore(ToroidCore.Create(Length.FromMillimetres(36), Length.FromMillimetres(23), Length.FromMillimetres(15)), 1, MagneticMaterial.Create("NiZn, μi 125", 125));
        var wire = WindingWire.Enamelled(Length.FromMillimetres(0.5));
        var plan = new TransformerPlan("sweep", core, [WindingSpec.Create("primary", 4, wire), WindingSpec.Create("secondary", 12, wire)], new OperatingConditions(1.8e6, 3e7, 50, 450, 1), WireLengthAllowance.Default)
        {
            Sweep = new SweepSettings(1e5, 1e9, points),
        };
        return PlanEvaluator.Evaluate(plan).Response!;
    }

    /// <summary>An RFC 4180 reader for unquoted fields: records end with CRLF, fields are separated by commas.</summary>
    internal static List<string[]> Read(string text)
    {
        Assert.DoesNotContain('"', text);
        return [.. text.Split("\r\n").SkipLast(1).Select(line => line.Split(','))];
    }
}
