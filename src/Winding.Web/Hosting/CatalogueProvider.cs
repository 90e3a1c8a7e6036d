using Winding.Catalogue.Loading;

namespace Winding.Web.Hosting;

/// <summary>
/// Holds the built-in catalogue, loaded once at start-up. Shared, read-only data: safe as a singleton. Problems met while
/// loading are logged and kept for display.
/// </summary>
public sealed class CatalogueProvider
{
    /// <summary>Loads the catalogue from <paramref name="paths"/>.</summary>
    public CatalogueProvider(WindingPaths paths, ILogger<CatalogueProvider> logger)
    {
        ArgumentNullException.ThrowIfNull(paths);
        ArgumentNullException.ThrowIfNull(logger);
        Catalogue = CatalogueLoader.Load(paths.CatalogueDirectory);
        foreach (var problem in Catalogue.Problems)
        {
            logger.LogWarning("Catalogue file {File} at {Path}: {Reason}", problem.FileName, problem.JsonPath, problem.Reason);
        }

        logger.LogInformation("Catalogue {Directory}: {Cores} cores, {Materials} materials", paths.CatalogueDirectory, Catalogue.Cores.Count, Catalogue.Materials.Count);
    }

    /// <summary>The loaded catalogue.</summary>
    public CoreCatalogue Catalogue { get; }
}
