using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;

namespace Winding.Web.Tests;

/// <summary>The app with a fresh, temporary user data folder (deleted afterwards).</summary>
public sealed class TempDataFactory : WebApplicationFactory<Program>
{
    /// <summary>The temporary data folder.</summary>
    public string DataDirectory { get; } = Path.Combine(Path.GetTempPath(), "winding-api-" + Guid.NewGuid().ToString("N"));

    protected override void ConfigureWebHost(IWebHostBuilder builder) => builder.UseSetting("WINDING_DATA_DIR", DataDirectory);

    protected override void Dispose(bool disposing)
    {
        base.Dispose(disposing);
        if (disposing && Directory.Exists(DataDirectory))
        {
            Directory.Delete(DataDirectory, recursive: true);
        }
    }
}
