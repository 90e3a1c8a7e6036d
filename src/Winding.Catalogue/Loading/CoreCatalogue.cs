using Winding.Catalogue.Entries;

namespace Winding.Catalogue.Loading;

/// <summary>The loaded catalogue: cores and materials by id, and the problems met while loading.</summary>
public sealed class CoreCatalogue
{
    /// <summary>Creates a catalogue from validated entries.</summary>
    public CoreCatalogue(IEnumerable<CatalogueCore> cores, IEnumerable<CatalogueMaterial> materials, IEnumerable<CatalogueProblem> problems)
    {
        Cores = [.. cores.OrderBy(c => c.Shape.ShapeName, StringComparer.Ordinal).ThenBy(c => c.Shape.WindowAreaM2).ThenBy(c => c.Name, StringComparer.Ordinal).ThenBy(c => c.Id, StringComparer.Ordinal)];
        Materials = [.. materials.OrderBy(m => m.Material.InitialPermeability).ThenBy(m => m.Name, StringComparer.Ordinal)];
        Problems = [.. problems];
        CoresById = Cores.ToDictionary(c => c.Id, StringComparer.Ordinal);
        MaterialsById = Materials.ToDictionary(m => m.Id, StringComparer.Ordinal);
    }

    /// <summary>An empty catalogue.</summary>
    public static CoreCatalogue Empty { get; } = new([], [], []);

    /// <summary>Cores by shape, then smallest window first.</summary>
    public IReadOnlyList<CatalogueCore> Cores { get; }

    /// <summary>Materials, lowest permeability first.</summary>
    public IReadOnlyList<CatalogueMaterial> Materials { get; }

    /// <summary>Files or entries that could not be loaded.</summary>
    public IReadOnlyList<CatalogueProblem> Problems { get; }

    /// <summary>Cores by id.</summary>
    public IReadOnlyDictionary<string, CatalogueCore> CoresById { get; }

    /// <summary>Materials by id.</summary>
    public IReadOnlyDictionary<string, CatalogueMaterial> MaterialsById { get; }
}
