namespace Winding.Catalogue.Entries;

/// <summary>The JSON form of a core catalogue entry (<c>"kind": "core"</c>), one per file.</summary>
public sealed class CoreEntryDocument
{
    /// <summary>Optional link to this kind's JSON Schema (<c>cores/schemas/core.schema.json</c>) so that editors validate the file.</summary>
    [System.Text.Json.Serialization.JsonPropertyName("$schema")]
    public string? Schema { get; set; }

    /// <summary>Always <c>core</c>.</summary>
    public string? Kind { get; set; }

    /// <summary>Stable id: a slug of lower-case letters, digits and hyphens.</summary>
    public string? Id { get; set; }

    /// <summary>Display name by shape and dimensions, e.g. "Toroid 36 × 23 × 15 mm".</summary>
    public string? Name { get; set; }

    /// <summary>Core shape: <c>toroid</c>, <c>sleeve</c>, <c>two-hole</c> or <c>bobbin</c>.</summary>
    public string? Shape { get; set; }

    /// <summary>Bobbin family (<c>E</c>, <c>pot</c>, <c>RM</c>, <c>other</c>); bobbin cores only.</summary>
    public string? Family { get; set; }

    /// <summary>Dimensions in millimetres (which ones depends on the shape).</summary>
    public DimensionsMmDocument? DimensionsMm { get; set; }

    /// <summary>Entered effective parameters (required for bobbins, optional for two-hole cores).</summary>
    public EffectiveParametersDocument? Effective { get; set; }

    /// <summary>AL from a datasheet in nH per turn² (bobbin cores, e.g. gapped).</summary>
    public double? AlNh { get; set; }

    /// <summary>
    /// AL measured on a wound sample of this core, nH per turn², for one core (any shape). When set it replaces the AL
    /// worked out from the material and dimensions (or the datasheet <see cref="AlNh"/>) in every plan that uses the core;
    /// <see cref="Source"/> says how it was measured. The bench sheet's "update the core's AL" writes it.
    /// </summary>
    public double? MeasuredAlNh { get; set; }

    /// <summary>Id of the material entry the core is made of.</summary>
    public string? MaterialId { get; set; }

    /// <summary>Where the values come from (handbook typical values, from memory, common practice, measured).</summary>
    public string? Source { get; set; }

    /// <summary>
    /// Saved version of a user entry (1 and up), set by the store on every save; built-in files have none. A version
    /// sent with a save is ignored: the store takes the expected version as a separate argument.
    /// </summary>
    public int? Version { get; set; }

    /// <summary>When this version was saved (user entries, set by the store; ignored on input).</summary>
    public DateTimeOffset? SavedAt { get; set; }
}
