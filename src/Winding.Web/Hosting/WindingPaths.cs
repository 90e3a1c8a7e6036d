namespace Winding.Web.Hosting;

/// <summary>Where the app reads the built-in catalogue and keeps user data.</summary>
/// <param name="CatalogueDirectory">The built-in catalogue folder (a copy of the repository's <c>cores/</c>).</param>
/// <param name="DataDirectory">The user data folder (<c>WINDING_DATA_DIR</c>, default a per-user data directory).</param>
public sealed record WindingPaths(string CatalogueDirectory, string DataDirectory)
{
    /// <summary>Environment variable that moves the user data folder.</summary>
    public const string DataDirectoryVariable = "WINDING_DATA_DIR";

    /// <summary>Configuration key that moves the built-in catalogue folder.</summary>
    public const string CatalogueDirectoryKey = "Winding:CatalogueDirectory";

    /// <summary>Resolves the paths from configuration (environment variables included).</summary>
    public static WindingPaths FromConfiguration(IConfiguration configuration)
    {
        ArgumentNullException.ThrowIfNull(configuration);
        var catalogue = configuration[CatalogueDirectoryKey];
        if (string.IsNullOrWhiteSpace(catalogue))
        {
            catalogue = Path.Combine(AppContext.BaseDirectory, "cores");
        }

        var data = configuration[DataDirectoryVariable];
        if (string.IsNullOrWhiteSpace(data))
        {
            var local = Environment.GetFolderPath(Environment.SpecialFolder.LocalApplicationData);
            data = string.IsNullOrEmpty(local) ? Path.Combine(AppContext.BaseDirectory, "data") : Path.Combine(local, "winding");
        }

        return new WindingPaths(Path.GetFullPath(catalogue), Path.GetFullPath(data));
    }
}
