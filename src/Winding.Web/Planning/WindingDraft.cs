namespace Winding.Web.Planning;

/// <summary>
/// One winding as the user typed it (texts, not yet validated). The wire is given in one <see cref="WireForm"/>; the
/// fields of the other forms keep what was typed in them, so switching back restores it, but only the chosen form goes
/// into the plan. Length texts are millimetres when plain ("0.5") and carry their unit otherwise ("0.02 in").
/// An empty optional text stands for "not given" (the plan document leaves the member out).
/// </summary>
public sealed class WindingDraft
{
    /// <summary>Name.</summary>
    public string Name { get; set; } = string.Empty;

    /// <summary>Turns as typed.</summary>
    public string Turns { get; set; } = string.Empty;

    /// <summary>The form the wire is given in.</summary>
    public WireForm WireForm { get; set; } = WireForm.Custom;

    /// <summary>Table: the standard wire id (from the search or the suggestions), or null while none is picked.</summary>
    public string? StandardId { get; set; }

    /// <summary>Metric enamelled: nominal conductor diameter as typed (IEC 60317 series).</summary>
    public string MetricSize { get; set; } = string.Empty;

    /// <summary>Metric enamelled: grade "1", "2" or "3" (empty: not given, grade 1).</summary>
    public string MetricGrade { get; set; } = string.Empty;

    /// <summary>AWG: gauge as typed (10 … 44).</summary>
    public string AwgGauge { get; set; } = string.Empty;

    /// <summary>AWG: film build "single" or "heavy" (empty: not given, single).</summary>
    public string AwgBuild { get; set; } = string.Empty;

    /// <summary>Custom wire: conductor diameter as typed.</summary>
    public string ConductorDiameter { get; set; } = string.Empty;

    /// <summary>Custom wire: overall diameter as typed (empty: assume the grade 1 enamel build).</summary>
    public string OverallDiameter { get; set; } = string.Empty;

    /// <summary>Litz: number of strands as typed.</summary>
    public string LitzStrands { get; set; } = string.Empty;

    /// <summary>Litz: bare diameter of one strand as typed.</summary>
    public string LitzStrandDiameter { get; set; } = string.Empty;

    /// <summary>Litz: overall diameter of the bundle as typed.</summary>
    public string LitzOverallDiameter { get; set; } = string.Empty;

    /// <summary>Hook-up wire: conductor diameter as typed.</summary>
    public string HookUpConductor { get; set; } = string.Empty;

    /// <summary>Hook-up wire: radial insulation thickness as typed.</summary>
    public string HookUpInsulation { get; set; } = string.Empty;

    /// <summary>Conductor metal "copper" or "aluminium" (empty: not given, copper).</summary>
    public string Metal { get; set; } = string.Empty;

    /// <summary>Wires in hand as typed (empty: 1).</summary>
    public string StrandsInHand { get; set; } = string.Empty;

    /// <summary>RMS current in A as typed (empty: derived from drive and load).</summary>
    public string RmsCurrent { get; set; } = string.Empty;

    /// <summary>Placement from a loaded plan (kept as is; spread when null).</summary>
    public Winding.Catalogue.Plans.PlanPlacementDocument? Placement { get; set; }

    /// <summary>Insulation wrap from a loaded plan (kept as is).</summary>
    public Winding.Catalogue.Plans.PlanInsulationDocument? Insulation { get; set; }

    /// <summary>Taps as typed: turn counts separated by commas or spaces (empty: none).</summary>
    public string TapsText { get; set; } = string.Empty;

    /// <summary>Target inductance from a loaded plan (kept as is).</summary>
    public double? TargetInductanceH { get; set; }
}
