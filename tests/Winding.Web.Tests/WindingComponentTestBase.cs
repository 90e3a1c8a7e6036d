using Microsoft.AspNetCore.Components;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging.Abstractions;
using MudBlazor.Services;
using Winding.Web.Hosting;
using Winding.Web.Planning;

namespace Winding.Web.Tests;

/// <summary>
/// Shared bunit set-up: MudBlazor services, loose JS interop, an interactive server renderer, and the app's services
/// over the built-in catalogue. Disposed asynchronously (one MudBlazor service is async-dispose only).
/// </summary>
public abstract class WindingComponentTestBase : BunitContext, IAsyncLifetime
{
    protected WindingComponentTestBase()
    {
        // Inputs are debounced (200 ms) and the first render of a cold test process JIT-compiles MudBlazor; a second
        // is not enough on a loaded 2-core CI machine. Waits still end as soon as their condition holds.
        DefaultWaitTimeout = TimeSpan.FromSeconds(10);
        Services.AddMudServices();
        var paths = new WindingPaths(Path.Combine(AppContext.BaseDirectory, "cores"), Path.Combine(Path.GetTempPath(), "winding-tests-" + Guid.NewGuid().ToString("N")));
        Services.AddSingleton(paths);
        Services.AddSingleton(new CatalogueProvider(paths, TimeProvider.System, NullLogger<CatalogueProvider>.Instance));
        Services.AddSingleton(new Winding.Catalogue.Plans.PlanStore(paths.DataDirectory, TimeProvider.System));
        Services.AddWindingViewModels();
        JSInterop.Mode = JSRuntimeMode.Loose;
        SetRendererInfo(new RendererInfo("Server", isInteractive: true));
    }

    public Task InitializeAsync() => Task.CompletedTask;

    Task IAsyncLifetime.DisposeAsync() => base.DisposeAsync().AsTask();
}
