using System.Text.Json;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Plans;

namespace Winding.Web.Planning;

/// <summary>
/// The demo plans shipped with the app, set on a radio club's shared bench (invented for the demo; never a test
/// oracle). Each is a plan document embedded in the assembly as <c>Demos/{id}.json</c>.
/// </summary>
public static class DemoPlans
{
    private const string Prefix = "Winding.Web.Demos.";

    private static readonly Lazy<IReadOnlyList<DemoPlan>> Loaded = new(Load);

    /// <summary>All demo plans, in name order; each call hands out its own copies, so no caller can change a demo for another.</summary>
    public static IReadOnlyList<DemoPlan> All => [.. Loaded.Value.Select(Copy)];

    /// <summary>The demo plan with <paramref name="id"/> (a copy of its own), or null.</summary>
    public static DemoPlan? Find(string? id) => Loaded.Value.FirstOrDefault(d => d.Id == id) is { } demo ? Copy(demo) : null;

    private static DemoPlan Copy(DemoPlan demo) =>
        demo with { Document = JsonSerializer.Deserialize<PlanDocument>(JsonSerializer.SerializeToUtf8Bytes(demo.Document, CatalogueJson.Options), CatalogueJson.Options)! };

    private static List<DemoPlan> Load()
    {
        var assembly = typeof(DemoPlans).Assembly;
        var plans = new List<DemoPlan>();
        foreach (var name in assembly.GetManifestResourceNames().Where(n => n.StartsWith(Prefix, StringComparison.Ordinal) && n.EndsWith(".json", StringComparison.Ordinal)))
        {
            using var stream = assembly.GetManifestResourceStream(name)!;
            var document = JsonSerializer.Deserialize<PlanDocument>(stream, CatalogueJson.Options)!;
            var id = name[Prefix.Length..^".json".Length];
            plans.Add(new DemoPlan(id, document.Name ?? id, document));
        }

        return [.. plans.OrderBy(p => p.Name, StringComparer.Ordinal)];
    }
}

/// <summary>One demo plan.</summary>
/// <param name="Id">Its id (the file name).</param>
/// <param name="Name">Display name.</param>
/// <param name="Document">The plan.</param>
public sealed record DemoPlan(string Id, string Name, PlanDocument Document);
