using Winding.Core.Wire;

namespace Winding.Web.Display;

/// <summary>
/// A wire described for the chosen <see cref="UnitSystem"/>. Metric: the engine's own description ("0.500 mm, grade 1",
/// "AWG 24, heavy build", "Litz 20 × 0.100 mm, …"). Imperial: the wire's identity — its AWG size when the conductor is
/// an AWG size (<see cref="AwgSize"/>), otherwise the metric size and grade it was chosen as — followed by the
/// diameters in inches.
/// </summary>
public static class WireText
{
    /// <summary>The wire as shown in <paramref name="system"/> (without the wires in hand).</summary>
    public static string Describe(WindingWire wire, UnitSystem system)
    {
        ArgumentNullException.ThrowIfNull(wire);
        if (system != UnitSystem.Imperial)
        {
            return wire.Description;
        }

        var strandMm = wire.StrandDiameter.Millimetres;
        var overallMm = wire.ElementOverallDiameter.Millimetres;
        var strand = Conductor(strandMm);
        return wire.Kind switch
        {
            WireKind.Litz => $"Litz {wire.StrandsPerElement} × {strand}, {Inches(overallMm)} overall",
            WireKind.HookUp => $"hook-up wire {strand}, {Inches((overallMm - strandMm) / 2)} insulation",
            _ when wire.Description.StartsWith("AWG ", StringComparison.Ordinal) => $"{wire.Description} · {Inches(strandMm)} over {Inches(overallMm)}",
            _ when wire.Description.Contains(", grade ", StringComparison.Ordinal) => AwgSize.Match(strandMm) is null
                ? $"{wire.Description} · {Inches(strandMm)} over {Inches(overallMm)}"
                : $"{strand} over {Inches(overallMm)} (metric {wire.Description})",
            _ => $"{strand} over {Inches(overallMm)}{(wire.OverallDiameterAssumed ? " (grade 1 enamel assumed)" : string.Empty)}",
        };
    }

    /// <summary>A standard wire as listed for picking: its description, and in imperial its conductor in inches.</summary>
    public static string Label(StandardWire wire, UnitSystem system)
    {
        ArgumentNullException.ThrowIfNull(wire);
        return system == UnitSystem.Imperial ? $"{wire.Description} ({Inches(wire.ConductorDiameter.Millimetres)})" : wire.Description;
    }

    /// <summary>A conductor in imperial: "AWG 24 (0.0201 in)" for an AWG size, else "0.0197 in".</summary>
    private static string Conductor(double millimetres) =>
        AwgSize.Match(millimetres) is { } gauge ? $"{AwgSize.Label(gauge)} ({Inches(millimetres)})" : Inches(millimetres);

    private static string Inches(double millimetres) => LengthFormat.WireSize(millimetres, UnitSystem.Imperial);
}
