using Winding.Catalogue.Entries;

namespace Winding.Web.Planning;

/// <summary>
/// Finds catalogue cores by what a user types: every word must appear in the core's id, name, shape or material
/// (case and spacing ignored, "x" and "×" alike), so "toroid 10x5 nizn", "sleeve 850" or "gapped" all narrow the list.
/// </summary>
public static class CoreSearch
{
    /// <summary>The cores matching <paramref name="query"/> (all of them for an empty query), in catalogue order.</summary>
    public static IReadOnlyList<CatalogueCore> Filter(IReadOnlyList<CatalogueCore> cores, string? query)
    {
        ArgumentNullException.ThrowIfNull(cores);
        var words = Normalise(query ?? string.Empty).Split(' ', StringSplitOptions.RemoveEmptyEntries);
        if (words.Length == 0)
        {
            return cores;
        }

        return [.. cores.Where(core =>
        {
            var text = Normalise(string.Join(' ', core.Id, core.Name, core.Shape.ShapeName, core.Material.Name));
            var packed = text.Replace(" ", string.Empty, StringComparison.Ordinal);
            return words.All(w => text.Contains(w, StringComparison.Ordinal) || packed.Contains(w, StringComparison.Ordinal));
        })];
    }

    private static string Normalise(string text) =>
        text.ToLowerInvariant().Replace('×', 'x').Replace(',', ' ').Replace('-', ' ');
}
