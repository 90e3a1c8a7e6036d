using Winding.Catalogue.Entries;

namespace Winding.Catalogue.Plans;

/// <summary>
/// The JSON form of a plan (the request of <c>POST /api/v1/evaluate</c> and, later, a saved plan file). Dimensions and
/// wire diameters in millimetres (how people measure them); everything else in SI. Every member is nullable so that
/// validation can name a missing field instead of failing to bind.
/// </summary>
public sealed class PlanDocument
{
    /// <summary>Optional display name.</summary>
    public string? Name { get; set; }

    /// <summary>The core: a catalogue id, or inline shape, dimensions and material.</summary>
    public PlanCoreDocument? Core { get; set; }

    /// <summary>The windings in winding order; the first is the primary.</summary>
    public List<PlanWindingDocument?>? Windings { get; set; }

    /// <summary>Band, source, load, drive and waveform (optional).</summary>
    public PlanOperatingDocument? Operating { get; set; }

    /// <summary>Lead length and margin for the length to cut (optional; defaults 50 mm per lead, 5 %).</summary>
    public PlanAllowanceDocument? Allowance { get; set; }

    /// <summary>The response sweep (optional; defaults: a decade beyond each band edge, 401 points).</summary>
    public PlanSweepDocument? Sweep { get; set; }

    /// <summary>Model options.</summary>
    public PlanOptionsDocument? Options { get; set; }

    /// <summary>Values measured on the built transformer that replace the estimates.</summary>
    public PlanMeasuredDocument? Measured { get; set; }

    /// <summary>The bench sheet's measured values, kept with the plan (they replace no estimate).</summary>
    public PlanBenchDocument? Bench { get; set; }
}

/// <summary>The response sweep in a plan document.</summary>
public sealed class PlanSweepDocument
{
    /// <summary>First frequency, Hz.</summary>
    public double? StartHz { get; set; }

    /// <summary>Last frequency, Hz.</summary>
    public double? StopHz { get; set; }

    /// <summary>Number of log-spaced points, 2 to 100 001.</summary>
    public int? Points { get; set; }
}

/// <summary>Model options in a plan document.</summary>
public sealed class PlanOptionsDocument
{
    /// <summary>
    /// True: μ = μi with no μ″, core loss as a fixed shunt resistance and winding resistances at the band's centre — a
    /// plain linear RLC circuit, as the SPICE export writes it.
    /// </summary>
    public bool? FrequencyIndependentCore { get; set; }
}

/// <summary>Measured values in a plan document; each replaces its estimate.</summary>
public sealed class PlanMeasuredDocument
{
    /// <summary>Measured AL of the wound core, nH per turn².</summary>
    public double? AlNh { get; set; }

    /// <summary>Leakage inductance measured at the primary with the last winding shorted, H.</summary>
    public double? LeakageInductanceH { get; set; }

    /// <summary>Capacitance measured between the first and the last winding, F.</summary>
    public double? InterwindingCapacitanceF { get; set; }

    /// <summary>Self-capacitance per winding, F (null entries: not measured).</summary>
    public List<double?>? SelfCapacitanceF { get; set; }
}

/// <summary>The core of a plan document.</summary>
public sealed class PlanCoreDocument
{
    /// <summary>Id of a catalogue core; or leave empty and give the inline fields.</summary>
    public string? CatalogueId { get; set; }

    /// <summary>Inline core: the shape (<c>toroid</c>, <c>sleeve</c>, <c>two-hole</c>, <c>bobbin</c>).</summary>
    public string? Shape { get; set; }

    /// <summary>Inline bobbin core: the family (<c>E</c>, <c>pot</c>, <c>RM</c>, <c>other</c>).</summary>
    public string? Family { get; set; }

    /// <summary>Inline core: dimensions in millimetres (see <see cref="DimensionsMmDocument"/> for each shape's fields).</summary>
    public DimensionsMmDocument? DimensionsMm { get; set; }

    /// <summary>Inline core: entered effective parameters (bobbin: required; two-hole: optional).</summary>
    public EffectiveParametersDocument? Effective { get; set; }

    /// <summary>Inline bobbin core: AL from the datasheet, nH per turn².</summary>
    public double? AlNh { get; set; }

    /// <summary>Id of a catalogue material (overrides a catalogue core's own material).</summary>
    public string? MaterialId { get; set; }

    /// <summary>Initial relative permeability μi, instead of a material id.</summary>
    public double? InitialPermeability { get; set; }

    /// <summary>Number of identical cores side by side, wound as one (default 1).</summary>
    public int? Stack { get; set; }
}

/// <summary>One winding of a plan document.</summary>
public sealed class PlanWindingDocument
{
    /// <summary>Display name (default "winding N").</summary>
    public string? Name { get; set; }

    /// <summary>Number of turns.</summary>
    public int? Turns { get; set; }

    /// <summary>The wire.</summary>
    public PlanWireDocument? Wire { get; set; }

    /// <summary>Where the winding lies (default: spread over the whole core).</summary>
    public PlanPlacementDocument? Placement { get; set; }

    /// <summary>Insulation wrapped under this winding.</summary>
    public PlanInsulationDocument? Insulation { get; set; }

    /// <summary>Turn counts where taps are brought out.</summary>
    public List<int>? Taps { get; set; }

    /// <summary>An inductance this winding should reach, H: the results then give the turns that reach it.</summary>
    public double? TargetInductanceH { get; set; }

    /// <summary>RMS current in this winding, A (optional; otherwise derived from drive and load for the first and last winding).</summary>
    public double? RmsCurrentA { get; set; }
}

/// <summary>
/// A wire in a plan document. Give exactly one form: a standard wire by <c>standardId</c> (from
/// <c>GET /api/v1/wires</c>); metric enamelled (<c>metricMm</c> with <c>grade</c> 1, 2 or 3); <c>awg</c> with
/// <c>build</c> single or heavy; custom (<c>conductorDiameterMm</c>, optional <c>overallDiameterMm</c>); <c>litz</c>; or
/// <c>hookUp</c>. Optionally <c>strandsInHand</c> and <c>metal</c>.
/// </summary>
public sealed class PlanWireDocument
{
    /// <summary>Id of a standard wire, e.g. <c>metric-0-500-g1</c> or <c>awg-24-heavy</c>.</summary>
    public string? StandardId { get; set; }

    /// <summary>Metric enamelled wire: nominal conductor diameter, mm (IEC 60317 series).</summary>
    public double? MetricMm { get; set; }

    /// <summary>Metric enamelled wire: grade 1, 2 or 3 (default 1).</summary>
    public int? Grade { get; set; }

    /// <summary>AWG size, 10 to 44.</summary>
    public int? Awg { get; set; }

    /// <summary>AWG film build: <c>single</c> (default) or <c>heavy</c>.</summary>
    public string? Build { get; set; }

    /// <summary>Custom: bare conductor diameter, mm.</summary>
    public double? ConductorDiameterMm { get; set; }

    /// <summary>Custom: overall diameter over the insulation, mm; when absent the grade 1 enamel build is assumed.</summary>
    public double? OverallDiameterMm { get; set; }

    /// <summary>A Litz bundle.</summary>
    public PlanLitzDocument? Litz { get; set; }

    /// <summary>Hook-up wire with a thick insulation.</summary>
    public PlanHookUpDocument? HookUp { get; set; }

    /// <summary>Parallel wires wound side by side as one turn (default 1).</summary>
    public int? StrandsInHand { get; set; }

    /// <summary>Conductor metal: <c>copper</c> (default) or <c>aluminium</c>.</summary>
    public string? Metal { get; set; }
}

/// <summary>A Litz bundle in a plan document.</summary>
public sealed class PlanLitzDocument
{
    /// <summary>Number of strands.</summary>
    public int? Strands { get; set; }

    /// <summary>Bare diameter of each strand, mm.</summary>
    public double? StrandDiameterMm { get; set; }

    /// <summary>Overall diameter of the bundle, mm.</summary>
    public double? OverallDiameterMm { get; set; }
}

/// <summary>Hook-up wire in a plan document.</summary>
public sealed class PlanHookUpDocument
{
    /// <summary>Conductor diameter, mm.</summary>
    public double? ConductorDiameterMm { get; set; }

    /// <summary>Radial insulation thickness, mm.</summary>
    public double? InsulationThicknessMm { get; set; }
}

/// <summary>A winding's placement in a plan document.</summary>
public sealed class PlanPlacementDocument
{
    /// <summary><c>spread</c>, <c>sector</c>, <c>over</c> or <c>bifilar</c>.</summary>
    public string? Kind { get; set; }

    /// <summary>Sector start angle, degrees (0 ≤ start &lt; end ≤ 360).</summary>
    public double? StartDegrees { get; set; }

    /// <summary>Sector end angle, degrees.</summary>
    public double? EndDegrees { get; set; }

    /// <summary>Index of the winding this one lies over (<c>over</c>) or is paired with (<c>bifilar</c>); an earlier winding.</summary>
    public int? Winding { get; set; }
}

/// <summary>An insulation wrap in a plan document.</summary>
public sealed class PlanInsulationDocument
{
    /// <summary><c>paper</c>, <c>polyester</c>, <c>ptfe</c>, <c>polyimide</c> or <c>other</c>.</summary>
    public string? Material { get; set; }

    /// <summary>Total thickness, mm.</summary>
    public double? ThicknessMm { get; set; }

    /// <summary>Relative permittivity (default: the material's typical value; required for <c>other</c>).</summary>
    public double? RelativePermittivity { get; set; }
}

/// <summary>Operating conditions in a plan document (SI).</summary>
public sealed class PlanOperatingDocument
{
    /// <summary>Lowest frequency of the band, Hz.</summary>
    public double? MinFrequencyHz { get; set; }

    /// <summary>Highest frequency of the band, Hz.</summary>
    public double? MaxFrequencyHz { get; set; }

    /// <summary>Source resistance, Ω.</summary>
    public double? SourceResistanceOhm { get; set; }

    /// <summary>Load resistance, Ω.</summary>
    public double? LoadResistanceOhm { get; set; }

    /// <summary>RMS drive voltage across the primary, V.</summary>
    public double? DriveVoltageRms { get; set; }

    /// <summary><c>sine</c> (default), <c>square</c> or <c>pulse</c>.</summary>
    public string? Waveform { get; set; }

    /// <summary>Duty cycle of a pulse waveform, 0 &lt; D &lt; 1.</summary>
    public double? DutyCycle { get; set; }

    /// <summary>Ambient temperature, °C (default 25).</summary>
    public double? AmbientTemperatureC { get; set; }

    /// <summary>k of the rule "primary reactance at f_min ≥ k × the impedance it works at" (default 4).</summary>
    public double? ReactanceFactor { get; set; }
}

/// <summary>Length-to-cut allowance in a plan document.</summary>
public sealed class PlanAllowanceDocument
{
    /// <summary>Lead length at each end, mm.</summary>
    public double? LeadLengthMm { get; set; }

    /// <summary>Margin on the wound length, percent.</summary>
    public double? MarginPercent { get; set; }
}
