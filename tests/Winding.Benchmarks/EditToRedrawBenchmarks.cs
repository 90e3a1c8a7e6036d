using BenchmarkDotNet.Attributes;
using Bunit;
using Microsoft.AspNetCore.Components;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging.Abstractions;
using MudBlazor.Services;
using Winding.Web.Components.Pages;
using Winding.Web.Hosting;
using Winding.Web.Planning;

namespace Winding.Benchmarks;

/// <summary>
/// Edit-to-redraw on the server: one turns edit on the plan page (with band, drive and the 401-point response) →
/// parse, validate, evaluate, and re-render the whole page (results, drawing, chart data) into its render tree.
/// The network round trip and the browser's paint are not included.
/// </summary>
[MemoryDiagnoser]
public class EditToRedrawBenchmarks : IDisposable
{
    private BunitContext _context = default!;
    private IRenderedComponent<PlanPage> _page = default!;
    private PlanningState _state = default!;
    private PlanningState _unrendered = default!;
    private int _turns = 4;

    [GlobalSetup]
    public void Setup()
    {
        _context = new BunitContext();
        _context.Services.AddMudServices();
        var paths = new WindingPaths(Path.Combine(AppContext.BaseDirectory, "cores"), Path.Combine(Path.GetTempPath(), "winding-bench-" + Guid.NewGuid().ToString("N")));
        _context.Services.AddSingleton(paths);
        _context.Services.AddSingleton(new CatalogueProvider(paths, TimeProvider.System, NullLogger<CatalogueProvider>.Instance));
        _context.Services.AddSingleton(new Winding.Catalogue.Plans.PlanStore(paths.DataDirectory, TimeProvider.System));
        _context.Services.AddWindingViewModels();
        _context.JSInterop.Mode = JSRuntimeMode.Loose;
        _context.SetRendererInfo(new RendererInfo("Server", isInteractive: true));
        _page = _context.Render<PlanPage>();
        _state = _context.Services.GetRequiredService<PlanningState>();
        _state.SelectCore("toroid-36x23x15-nizn-125");
        _unrendered = new PlanningState(_context.Services.GetRequiredService<CatalogueProvider>(), _context.Services.GetRequiredService<Winding.Catalogue.Plans.PlanStore>());
        _unrendered.SelectCore("toroid-36x23x15-nizn-125");
        if (_state.Result?.Response is null)
        {
            throw new InvalidOperationException("The benchmark plan has no response to draw.");
        }
    }

    [GlobalCleanup]
    public void Dispose()
    {
        _context?.DisposeAsync().AsTask().GetAwaiter().GetResult();
        GC.SuppressFinalize(this);
    }

    /// <summary>Types a new primary turn count and waits for the page to render it.</summary>
    [Benchmark]
    public int EditTurnsAndRedraw()
    {
        _turns = _turns == 4 ? 5 : 4;
        var turns = _turns.ToString(System.Globalization.CultureInfo.InvariantCulture);
        _page.InvokeAsync(() => _state.EditWinding(0, w => w.Turns = turns)).GetAwaiter().GetResult();
        return _page.RenderCount;
    }

    /// <summary>The same edit without a page: parse, validate and evaluate only (what the render adds is the difference).</summary>
    [Benchmark]
    public double EditTurnsOnly()
    {
        _turns = _turns == 4 ? 5 : 4;
        var turns = _turns.ToString(System.Globalization.CultureInfo.InvariantCulture);
        _unrendered.EditWinding(0, w => w.Turns = turns);
        return _unrendered.Result!.Windings[0].InductanceH;
    }
}
