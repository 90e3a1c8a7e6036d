using Microsoft.Playwright;

namespace Winding.EndToEnd;

/// <summary>The frequency-response chart drawn by plotly.js in a real browser against the real server.</summary>
public sealed class ResponseChartFlowTests : IClassFixture<ServerFixture>
{
    private readonly ServerFixture _server;

    public ResponseChartFlowTests(ServerFixture server) => _server = server;

    [SkippableFact]
    public async Task ResponsePage_DefaultPlan_DrawsTracesEdgesAndAHoverReadOut()
    {
        await using var session = await BrowserSession.StartAsync();
        var page = await session.OpenInteractiveAsync(new Uri(_server.BaseAddress, "/plan/response"));
        var chart = page.Locator("[data-testid=response-chart]");

        // plotly.js is loaded from the package's _content/ folder by the library itself, then draws SVG.
        var traces = chart.Locator(".scatterlayer .trace");
        await Assertions.Expect(traces).ToHaveCountAsync(2, new LocatorAssertionsToHaveCountOptions { Timeout = 30_000 });
        Assert.All(await traces.Locator("path.js-line").AllAsync(), async line => Assert.NotEmpty(await line.GetAttributeAsync("d") ?? ""));
        // Band, two tolerance spreads and four edge lines (the default plan has all of them within its sweep).
        Assert.True(await chart.Locator(".shapelayer path").CountAsync() >= 5);
        await Assertions.Expect(chart.Locator(".xtitle")).ToHaveTextAsync("frequency");

        var plotArea = chart.Locator(".nsewdrag").First;
        var box = (await plotArea.BoundingBoxAsync())!;
        await page.Mouse.MoveAsync(box.X + (box.Width / 2), box.Y + (box.Height / 2));
        await Assertions.Expect(chart.Locator(".hoverlayer")).ToContainTextAsync("IL");
        await Assertions.Expect(chart.Locator(".hoverlayer")).ToContainTextAsync("Hz");
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(ServerFixture.ArtefactDirectory, "response-chart.png"), FullPage = true });
    }
}
