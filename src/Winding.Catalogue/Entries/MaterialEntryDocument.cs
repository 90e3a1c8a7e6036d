namespace Winding.Catalogue.Entries;

/// <summary>
/// The JSON form of a material catalogue entry (<c>"kind": "material"</c>), one per file. Units are spelled out in the
/// keys and converted once at load; everything but <c>initialPermeability</c>, <c>family</c> and <c>source</c> is
/// optional.
/// </summary>
public sealed class MaterialEntryDocument
{
    /// <summary>Optional link to this kind's JSON Schema (<c>cores/schemas/material.schema.json</c>) so that editors validate the file.</summary>
    [System.Text.Json.Serialization.JsonPropertyName("$schema")]
    public string? Schema { get; set; }

    /// <summary>Always <c>material</c>.</summary>
    public string? Kind { get; set; }

    /// <summary>Stable id: a slug of lower-case letters, digits and hyphens.</summary>
    public string? Id { get; set; }

    /// <summary>Display name by class, e.g. "NiZn, μi 125".</summary>
    public string? Name { get; set; }

    /// <summary>Material family: <c>NiZn</c>, <c>MnZn</c> or <c>iron powder</c> (see <see cref="MaterialFamilies"/>).</summary>
    public string? Family { get; set; }

    /// <summary>Initial relative permeability μi (dimensionless).</summary>
    public double? InitialPermeability { get; set; }

    /// <summary>Series complex permeability μs′, μs″ against frequency, in increasing frequency.</summary>
    public List<PermeabilityPointDocument?>? Permeability { get; set; }

    /// <summary>Saturation flux density at 25 °C and 100 °C, T.</summary>
    public SaturationFluxDensityDocument? SaturationFluxDensityT { get; set; }

    /// <summary>Steinmetz loss parameters with the range they were fitted over.</summary>
    public SteinmetzDocument? Steinmetz { get; set; }

    /// <summary>Bulk resistivity, Ω·m.</summary>
    public double? ResistivityOhmM { get; set; }

    /// <summary>Curie temperature, °C.</summary>
    public double? CurieTemperatureC { get; set; }

    /// <summary>AL tolerance, ± percent; 25 when not given.</summary>
    public double? AlTolerancePercent { get; set; }

    /// <summary>Where the values come from (required).</summary>
    public string? Source { get; set; }

    /// <summary>
    /// Saved version of a user entry (1 and up), set by the store on every save; built-in files have none. A version
    /// sent with a save is ignored: the store takes the expected version as a separate argument.
    /// </summary>
    public int? Version { get; set; }

    /// <summary>When this version was saved (user entries, set by the store; ignored on input).</summary>
    public DateTimeOffset? SavedAt { get; set; }
}
