using Winding.Core.Quantities;

namespace Winding.Core.Wire;

/// <summary>
/// One standard magnet wire of <see cref="StandardWireTable"/>: a size of a sizing system in one insulation grade or
/// build, with a stable id such as "metric-0-500-g1" or "awg-24-heavy".
/// </summary>
public sealed record StandardWire
{
    private readonly WindingWire _wire;

    internal StandardWire(string id, StandardWireSystem system, string sizeLabel, string insulationLabel, WindingWire wire, ValueProvenance overallDiameterProvenance)
    {
        Id = id;
        System = system;
        SizeLabel = sizeLabel;
        InsulationLabel = insulationLabel;
        _wire = wire;
        OverallDiameterProvenance = overallDiameterProvenance;
    }

    /// <summary>Stable id: "metric-&lt;d with '-' for '.'&gt;-g&lt;grade&gt;" or "awg-&lt;n&gt;-single|heavy".</summary>
    public string Id { get; }

    /// <summary>The sizing system.</summary>
    public StandardWireSystem System { get; }

    /// <summary>The size as it is written: "0.500 mm" or "AWG 24".</summary>
    public string SizeLabel { get; }

    /// <summary>The insulation as it is written: "grade 2" or "heavy build".</summary>
    public string InsulationLabel { get; }

    /// <summary>Plain description, "&lt;size&gt;, &lt;insulation&gt;", as carried by the winding wire.</summary>
    public string Description => _wire.Description;

    /// <summary>Nominal bare conductor diameter.</summary>
    public Length ConductorDiameter => _wire.StrandDiameter;

    /// <summary>Maximum overall diameter of the grade or build (the value to use for fit).</summary>
    public Length OverallDiameter => _wire.ElementOverallDiameter;

    /// <summary>Conductor cross-section π·d²/4 at the nominal diameter, m².</summary>
    public double ConductorAreaM2 => _wire.ConductorAreaM2;

    /// <summary>
    /// DC resistance per metre of copper at 20 °C, R′ = ρ20/(π·d²/4), in Ω/m, with ρ20 = 1/58 Ω·mm²/m (IEC 60028;
    /// physics-sources.md §3.2) at the nominal diameter.
    /// </summary>
    public double ResistancePerMetre20COhmPerM => ConductorMaterial.Copper.DcResistanceOhm(1.0, ConductorAreaM2);

    /// <summary>Where the overall diameter comes from.</summary>
    public ValueProvenance OverallDiameterProvenance { get; }

    /// <summary>The copper winding wire of this size and grade or build (a single wire; use InHand for more).</summary>
    public WindingWire ToWindingWire() => _wire;
}
