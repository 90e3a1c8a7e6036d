namespace Winding.Catalogue.Plans;

/// <summary>One saved plan in a list: enough to show and open it.</summary>
/// <param name="Id">The plan's id.</param>
/// <param name="Name">The plan's name.</param>
/// <param name="SavedAt">When its current version was saved.</param>
/// <param name="Version">Its current version.</param>
/// <param name="VariantOf">Id of the plan it was duplicated from, or null.</param>
public sealed record PlanSummary(string Id, string Name, DateTimeOffset SavedAt, int Version, string? VariantOf);
