using Winding.Catalogue.Loading;
using Winding.Catalogue.Store;

namespace Winding.Web.Hosting;

/// <summary>
/// The catalogue the app works with: the built-in entries merged with the user's own (from the data folder), as an
/// immutable snapshot that is replaced after every write. Shared by all circuits and requests (a singleton: the snapshot
/// is read-only and the store serialises its writers). Problems met while loading are logged and kept for display.
/// </summary>
public sealed class CatalogueProvider
{
    private readonly ILogger<CatalogueProvider> _logger;
    private CoreCatalogue _catalogue;

    /// <summary>Loads the built-in and user catalogues from <paramref name="paths"/>.</summary>
    public CatalogueProvider(WindingPaths paths, TimeProvider timeProvider, ILogger<CatalogueProvider> logger)
    {
        ArgumentNullException.ThrowIfNull(paths);
        ArgumentNullException.ThrowIfNull(logger);
        _logger = logger;
        Store = new UserCatalogueStore(paths.DataDirectory, paths.CatalogueDirectory, timeProvider);
        _catalogue = Store.Load();
        Log(paths.CatalogueDirectory);
    }

    /// <summary>The user catalogue store (all writes go through it).</summary>
    public UserCatalogueStore Store { get; }

    /// <summary>The current catalogue snapshot.</summary>
    public CoreCatalogue Catalogue => Volatile.Read(ref _catalogue);

    /// <summary>Raised after the catalogue changed.</summary>
    public event Action? Changed;

    /// <summary>Reloads the snapshot after a write.</summary>
    public void Reload()
    {
        Volatile.Write(ref _catalogue, Store.Load());
        Changed?.Invoke();
    }

    private void Log(string directory)
    {
        foreach (var problem in _catalogue.Problems)
        {
            _logger.LogWarning("Catalogue file {File} at {Path}: {Reason}", problem.FileName, problem.JsonPath, problem.Reason);
        }

        _logger.LogInformation("Catalogue {Directory} and {User}: {Cores} cores, {Materials} materials", directory, Store.CatalogueDirectory, _catalogue.Cores.Count, _catalogue.Materials.Count);
    }
}
