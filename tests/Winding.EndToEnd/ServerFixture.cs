using System.Net;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Hosting.Server;
using Microsoft.AspNetCore.Hosting.Server.Features;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Extensions.DependencyInjection;

namespace Winding.EndToEnd;

/// <summary>
/// Starts the real app on Kestrel on a free loopback port, in the Production environment, with a fresh data folder.
/// </summary>
public sealed class ServerFixture : IAsyncLifetime, IDisposable
{
    private readonly ServerFactory _factory = new();

    /// <summary>The server's base address, e.g. http://127.0.0.1:41234.</summary>
    public Uri BaseAddress { get; private set; } = default!;

    /// <summary>An HTTP client for the real server.</summary>
    public HttpClient CreateClient() => new() { BaseAddress = BaseAddress };

    /// <summary>Where the tests keep screenshots: the test output folder.</summary>
    public static string ArtefactDirectory
    {
        get
        {
            var directory = Path.Combine(AppContext.BaseDirectory, "artifacts", "screenshots");
            Directory.CreateDirectory(directory);
            return directory;
        }
    }

    public Task InitializeAsync()
    {
        _factory.UseKestrel(options => options.Listen(IPAddress.Loopback, 0));
        _factory.StartServer();
        var addresses = _factory.Services.GetRequiredService<IServer>().Features.Get<IServerAddressesFeature>()!;
        BaseAddress = new Uri(addresses.Addresses.First());
        return Task.CompletedTask;
    }

    public async Task DisposeAsync()
    {
        await _factory.DisposeAsync();
        if (Directory.Exists(_factory.DataDirectory))
        {
            Directory.Delete(_factory.DataDirectory, recursive: true);
        }
    }

    public void Dispose() => _factory.Dispose();

    private sealed class ServerFactory : WebApplicationFactory<Program>
    {
        public string DataDirectory { get; } = Path.Combine(Path.GetTempPath(), "winding-e2e-" + Guid.NewGuid().ToString("N"));

        protected override void ConfigureWebHost(IWebHostBuilder builder)
        {
            builder.UseEnvironment("Production");
            builder.UseSetting("WINDING_DATA_DIR", DataDirectory);
        }
    }
}
