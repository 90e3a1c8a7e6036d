using System.Diagnostics;
using System.Net;
using System.Net.Sockets;
using BenchmarkDotNet.Attributes;
using Microsoft.Playwright;

namespace Winding.Benchmarks;

/// <summary>
/// Edit-to-redraw as the user sees it: the real server (Release build of Winding.Web, Production environment, a fresh
/// data folder) and Debian's Chromium. One benchmark invocation types a new primary turn count into the plan page of the
/// end-fed demo (401-point response) and commits it (the field's change event, as Enter or leaving the field does, so
/// the typing debounce is not part of the figure), then waits in the browser until the results panel shows the new
/// evaluation and the response chart has been drawn again (the chart module's <c>winding-chart-drawn</c> event, which
/// also raises the container's <c>data-drawn</c> counter), and the next paint (a task queued from the next animation
/// frame).
/// Runs in process (Playwright's driver sits beside this assembly). Needs /usr/bin/chromium (or WINDING_CHROMIUM).
/// </summary>
[InProcess]
[MemoryDiagnoser(false)]
public class BrowserEditToRedrawBenchmarks : IDisposable
{
    /// <summary>Runs in the page: sets the field, commits it, waits for the fresh results and the redrawn chart and a
    /// paint. Returns the milliseconds measured in the browser (results shown, chart drawn).</summary>
    private const string EditScript = """
        async ([id, value]) => {
          const input = document.getElementById(id);
          const results = document.querySelector('[data-testid=results]');
          const chart = document.querySelector('[data-testid=response-chart]');
          const before = results.dataset.evaluation;
          const drawsBefore = chart.getAttribute('data-drawn');
          const redrawn = new Promise((resolve, reject) => {
            chart.addEventListener('winding-chart-drawn', () => resolve(), { once: true });
            setTimeout(() => reject(new Error('the chart was not redrawn')), 5000);
          });
          const t0 = performance.now();
          const shown = new Promise(resolve => {
            const observer = new MutationObserver(() => {
              if (results.dataset.evaluation !== before) { observer.disconnect(); resolve(); }
            });
            observer.observe(results, { attributes: true });
          });
          input.focus();
          input.value = value;
          input.dispatchEvent(new Event('input', { bubbles: true }));
          input.dispatchEvent(new Event('change', { bubbles: true }));
          input.blur();
          await shown;
          const tShown = performance.now() - t0;
          await redrawn;
          if (chart.getAttribute('data-drawn') === drawsBefore) throw new Error('data-drawn did not change');
          // The next paint: a task queued from the next animation frame runs once that frame has been painted.
          await new Promise(r => requestAnimationFrame(() => setTimeout(r, 0)));
          return [tShown, performance.now() - t0];
        }
        """;

    private Process? _server;
    private IPlaywright? _playwright;
    private IBrowser? _browser;
    private IPage _page = default!;
    private string _dataDirectory = string.Empty;
    private int _turns = 4;

    private readonly List<(double Shown, double Drawn)> _browserTimes = [];

    [GlobalSetup]
    public void Setup() => SetupAsync().GetAwaiter().GetResult();

    private async Task SetupAsync()
    {
        var root = RepositoryRoot();
        var web = Path.Combine(root, "src", "Winding.Web", "bin", "Release", "net10.0", "Winding.Web.dll");
        if (!File.Exists(web))
        {
            throw new InvalidOperationException($"Build the web app first: dotnet build -c Release src/Winding.Web ({web} is missing).");
        }

        var port = FreePort();
        _dataDirectory = Path.Combine(Path.GetTempPath(), "winding-bench-browser-" + Guid.NewGuid().ToString("N"));
        var start = new ProcessStartInfo("dotnet", [web, "--urls", $"http://127.0.0.1:{port}"])
        {
            WorkingDirectory = Path.GetDirectoryName(web)!,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
        };
        start.Environment["ASPNETCORE_ENVIRONMENT"] = "Production";
        start.Environment["WINDING_DATA_DIR"] = _dataDirectory;
        _server = Process.Start(start) ?? throw new InvalidOperationException("The web app did not start.");
        _server.OutputDataReceived += (_, _) => { };
        _server.ErrorDataReceived += (_, _) => { };
        _server.BeginOutputReadLine();
        _server.BeginErrorReadLine();

        var address = new Uri($"http://127.0.0.1:{port}/");
        using (var http = new HttpClient { Timeout = TimeSpan.FromSeconds(2) })
        {
            var until = DateTime.UtcNow.AddSeconds(60);
            while (true)
            {
                try
                {
                    using var response = await http.GetAsync(new Uri(address, "api/v1/wires"));
                    if (response.IsSuccessStatusCode)
                    {
                        break;
                    }
                }
                catch (HttpRequestException)
                {
                }
                catch (TaskCanceledException)
                {
                }

                if (DateTime.UtcNow > until)
                {
                    throw new InvalidOperationException("The web app did not answer within 60 s.");
                }

                await Task.Delay(200);
            }
        }

        _playwright = await Playwright.CreateAsync();
        _browser = await _playwright.Chromium.LaunchAsync(new BrowserTypeLaunchOptions
        {
            ExecutablePath = Environment.GetEnvironmentVariable("WINDING_CHROMIUM") ?? "/usr/bin/chromium",
            Headless = true,
            Args = ["--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--no-first-run", "--disable-sync"],
        });
        _page = await _browser.NewPageAsync(new BrowserNewPageOptions { ViewportSize = new ViewportSize { Width = 1280, Height = 900 } });
        await _page.GotoAsync(new Uri(address, "plan?demo=club-end-fed-unun").ToString());
        await _page.Locator("#app-content[data-interactive=true]").WaitForAsync(new LocatorWaitForOptions { Timeout = 30_000 });
        await _page.Locator("[data-testid=response-chart][data-drawn]").WaitForAsync(new LocatorWaitForOptions { Timeout = 30_000 });
        _turns = int.Parse(await _page.Locator("#windings-0-turns").InputValueAsync(), System.Globalization.CultureInfo.InvariantCulture);
    }

    /// <summary>Types a new primary turn count and waits until the browser has painted the new results and chart.</summary>
    [Benchmark]
    public async Task<double> EditTurnsInBrowser()
    {
        _turns = _turns % 2 == 0 ? _turns + 1 : _turns - 1;
        var times = await _page.EvaluateAsync<double[]>(EditScript, new object[] { "windings-0-turns", _turns.ToString(System.Globalization.CultureInfo.InvariantCulture) });
        _browserTimes.Add((times[0], times[1]));
        return times[1];
    }

    [GlobalCleanup]
    public void Dispose()
    {
        if (_browserTimes.Count > 0)
        {
            var shown = _browserTimes.Select(t => t.Shown).Order().ToArray();
            var drawn = _browserTimes.Select(t => t.Drawn).Order().ToArray();
            Console.WriteLine($"// Browser-side medians over {shown.Length} edits: results shown {shown[shown.Length / 2]:F1} ms, chart drawn and painted {drawn[drawn.Length / 2]:F1} ms");
            _browserTimes.Clear();
        }

        _browser?.DisposeAsync().AsTask().GetAwaiter().GetResult();
        _playwright?.Dispose();
        if (_server is { HasExited: false })
        {
            _server.Kill(entireProcessTree: true);
            _server.WaitForExit(10_000);
        }

        _server?.Dispose();
        if (Directory.Exists(_dataDirectory))
        {
            Directory.Delete(_dataDirectory, recursive: true);
        }

        GC.SuppressFinalize(this);
    }

    private static int FreePort()
    {
        using var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        return ((IPEndPoint)listener.LocalEndpoint).Port;
    }

    private static string RepositoryRoot()
    {
        for (var directory = new DirectoryInfo(Directory.GetCurrentDirectory()); directory is not null; directory = directory.Parent)
        {
            if (File.Exists(Path.Combine(directory.FullName, "Winding.sln")))
            {
                return directory.FullName;
            }
        }

        for (var directory = new DirectoryInfo(AppContext.BaseDirectory); directory is not null; directory = directory.Parent)
        {
            if (File.Exists(Path.Combine(directory.FullName, "Winding.sln")))
            {
                return directory.FullName;
            }
        }

        throw new InvalidOperationException("Run the benchmarks from inside the repository (Winding.sln not found above the working folder).");
    }
}
