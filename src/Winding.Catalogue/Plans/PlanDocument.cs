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

    /// <summary>Band, source, load and drive (optional).</summary>
    public PlanOperatingDocument? Operating { get; set; }
}

/// <summary>The core of a plan document.</summary>
public sealed class PlanCoreDocument
{
    /// <summary>Id of a catalogue core; or leave empty and give the inline fields.</summary>
    public string? CatalogueId { get; set; }

    /// <summary>Inline core: the shape (<c>toroid</c>).</summary>
    public string? Shape { get; set; }

    /// <summary>Inline core: dimensions in millimetres.</summary>
    public Entries.DimensionsMmDocument? DimensionsMm { get; set; }

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
}

/// <summary>A round wire in a plan document, diameters in millimetres.</summary>
public sealed class PlanWireDocument
{
    /// <summary>Bare conductor diameter, mm.</summary>
    public double? ConductorDiameterMm { get; set; }

    /// <summary>Overall diameter over the insulation, mm; when absent the grade 1 enamel build is assumed.</summary>
    public double? OverallDiameterMm { get; set; }
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
}
