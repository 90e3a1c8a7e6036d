namespace Winding.Web.Planning;

/// <summary>One winding as the user typed it (texts, not yet validated).</summary>
public sealed class WindingDraft
{
    /// <summary>Name.</summary>
    public string Name { get; set; } = string.Empty;

    /// <summary>Turns as typed.</summary>
    public string Turns { get; set; } = string.Empty;

    /// <summary>A standard wire id chosen from the suggestions, or null for a custom wire.</summary>
    public string? StandardId { get; set; }

    /// <summary>Custom wire: conductor diameter as typed (a plain number is mm; "0.02 in", "20 mil" carry their unit).</summary>
    public string ConductorDiameter { get; set; } = string.Empty;

    /// <summary>Custom wire: overall diameter as typed, like the conductor (empty: assume the enamel build).</summary>
    public string OverallDiameter { get; set; } = string.Empty;

    /// <summary>Wires in hand as typed (empty: 1).</summary>
    public string StrandsInHand { get; set; } = string.Empty;

    /// <summary>RMS current in A as typed (empty: derived from drive and load).</summary>
    public string RmsCurrent { get; set; } = string.Empty;

    /// <summary>A wire from a loaded plan in a form the page does not edit (metric size, AWG, Litz, hook-up…), kept as is.</summary>
    public Winding.Catalogue.Plans.PlanWireDocument? ImportedWire { get; set; }

    /// <summary>Placement from a loaded plan (kept as is; spread when null).</summary>
    public Winding.Catalogue.Plans.PlanPlacementDocument? Placement { get; set; }

    /// <summary>Insulation wrap from a loaded plan (kept as is).</summary>
    public Winding.Catalogue.Plans.PlanInsulationDocument? Insulation { get; set; }

    /// <summary>Taps as typed: turn counts separated by commas or spaces (empty: none).</summary>
    public string TapsText { get; set; } = string.Empty;

    /// <summary>Target inductance from a loaded plan (kept as is).</summary>
    public double? TargetInductanceH { get; set; }
}
