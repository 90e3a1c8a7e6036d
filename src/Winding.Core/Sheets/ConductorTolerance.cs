using Winding.Core.Wire;

namespace Winding.Core.Sheets;

/// <summary>
/// The tolerance of a wire's bare conductor diameter, which sets how far its DC resistance may be from nominal
/// (R ∝ 1/d²).
/// <list type="bullet">
/// <item>Metric enamelled wire, IEC 60317-0-1 (conductor tolerance; from memory, only ±0.003 mm at 0.100 mm was read,
/// physics-sources §3.3): up to 0.025 mm ±0.001 mm, up to 0.063 mm ±0.002 mm, up to 0.250 mm ±0.003 mm, above that ±1 %
/// of the diameter rounded up to the next 0.001 mm.</item>
/// <item>AWG sizes: ASTM B258 gives only nominal diameters; the tolerance of soft copper wire is ASTM B3's (from memory):
/// ±0.0001 in (0.00254 mm) under 0.010 in, ±1 % from 0.010 in up.</item>
/// </list>
/// Custom sizes, Litz strands and hook-up conductors are given the metric rule (an assumption the sheet states).
/// </summary>
public static class ConductorTolerance
{
    /// <summary>The tolerance of <paramref name="wire"/>'s conductor (strand) diameter, m, with where it comes from.</summary>
    public static (double ToleranceM, string Source) For(WindingWire wire)
    {
        ArgumentNullException.ThrowIfNull(wire);
        var d = wire.StrandDiameter.Metres;
        if (IsAwgSize(d))
        {
            return (d < 0.254e-3 ? 0.00254e-3 : 0.01 * d,
                "AWG conductor tolerance of ASTM B3 (±0.0001 in under 0.010 in, ±1 % above; from memory; ASTM B258 gives only the nominal diameters)");
        }

        var metric = Metric(d);
        var kind = wire.Kind switch
        {
            WireKind.Litz => "Litz strands: ",
            WireKind.HookUp => "hook-up conductor, assumed like enamelled wire of its size: ",
            _ => string.Empty,
        };
        return (metric, kind + "IEC 60317-0-1 conductor tolerance (from memory; ±0.003 mm at 0.100 mm read, physics-sources §3.3)");
    }

    /// <summary>The IEC 60317-0-1 conductor tolerance for a nominal diameter, m (see the class remarks).</summary>
    public static double Metric(double diameterM)
    {
        var mm = diameterM * 1e3;
        return mm switch
        {
            <= 0.025 => 0.001e-3,
            <= 0.063 => 0.002e-3,
            <= 0.250 => 0.003e-3,
            _ => Math.Ceiling(mm * 10 - 1e-9) / 1000 * 1e-3,
        };
    }

    private static bool IsAwgSize(double diameterM)
    {
        for (var gauge = AwgWireTable.FirstGauge; gauge <= AwgWireTable.LastGauge; gauge++)
        {
            var awg = AwgWireTable.ConductorDiameter(gauge).Metres;
            if (Math.Abs(awg - diameterM) <= 1e-9 * awg)
            {
                return true;
            }
        }

        return false;
    }
}
