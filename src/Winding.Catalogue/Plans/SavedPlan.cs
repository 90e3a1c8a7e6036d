namespace Winding.Catalogue.Plans;

/// <summary>
/// The JSON form of a plan kept in the data folder (<c>{data}/plans/{id}.json</c>) and of an exported plan: the plan
/// document with its id, name, times and version. Every member is nullable so that a damaged or hand-edited file can be
/// reported field by field instead of failing to bind.
/// </summary>
public sealed class SavedPlan
{
    /// <summary>The plan's id, a slug made from its name when it was created (see <see cref="Entries.EntryId"/>); names the file.</summary>
    public string? Id { get; set; }

    /// <summary>The name the user gave the plan, 1–200 characters.</summary>
    public string? Name { get; set; }

    /// <summary>When the plan was created (from the store's clock).</summary>
    public DateTimeOffset? CreatedAt { get; set; }

    /// <summary>When this version was saved (from the store's clock).</summary>
    public DateTimeOffset? SavedAt { get; set; }

    /// <summary>Version number, 1 and up; each save or rename adds one.</summary>
    public int? Version { get; set; }

    /// <summary>Id of the plan this one was duplicated from, or null.</summary>
    public string? VariantOf { get; set; }

    /// <summary>The plan itself, as <c>POST /api/v1/evaluate</c> takes it.</summary>
    public PlanDocument? Plan { get; set; }
}
