using Microsoft.Playwright;

namespace Winding.EndToEnd;

/// <summary>The frequency-response chart drawn by uPlot (wwwroot/js/response-chart.js) in a real browser against the real server.</summary>
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

        // The module draws with uPlot into a canvas and counts its draws in data-drawn.
        await Assertions.Expect(chart).ToHaveAttributeAsync("data-drawn", new System.Text.RegularExpressions.Regex("^[1-9][0-9]*$"), new LocatorAssertionsToHaveAttributeOptions { Timeout = 30_000 });
        var canvas = chart.Locator("canvas");
        await Assertions.Expect(canvas).ToBeVisibleAsync();
        Assert.Equal(2, await chart.EvaluateAsync<int>("el => el.windingChart.series.length"));
        Assert.True(await chart.EvaluateAsync<int>("el => el.windingChart.x.length") > 100);
        // The plan's line colour (#1565c0) is on the canvas: the lines were drawn, not just the axes.
        var linePixels = await canvas.EvaluateAsync<int>("""
            c => { const d = c.getContext('2d').getImageData(0, 0, c.width, c.height).data; let n = 0;
                   for (let i = 0; i < d.length; i += 4) { if (Math.abs(d[i] - 0x15) < 40 && Math.abs(d[i + 1] - 0x65) < 40 && Math.abs(d[i + 2] - 0xc0) < 40 && d[i + 3] > 200) n++; }
                   return n; }
            """);
        Assert.True(linePixels > 200, $"only {linePixels} pixels in the plan's colour");
        var legend = chart.Locator(".u-legend");
        await Assertions.Expect(legend).ToContainTextAsync("plan · insertion loss");
        await Assertions.Expect(legend).ToContainTextAsync("plan · return loss");

        // Pointing at the plot reads out the frequency and both values in the legend.
        var plotArea = chart.Locator(".u-over");
        var box = (await plotArea.BoundingBoxAsync())!;
        await page.Mouse.MoveAsync(box.X + (box.Width / 2), box.Y + (box.Height / 2));
        var values = legend.Locator(".u-value");
        await Assertions.Expect(values.Nth(0)).ToContainTextAsync(new System.Text.RegularExpressions.Regex(@"^[0-9.]+ [kMG]?Hz$"));
        await Assertions.Expect(values.Nth(1)).ToContainTextAsync(new System.Text.RegularExpressions.Regex(@"^-?[0-9]+\.[0-9]{2} dB$"));
        await Assertions.Expect(values.Nth(2)).ToContainTextAsync(new System.Text.RegularExpressions.Regex(@"^-?[0-9]+\.[0-9] dB$"));
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(ServerFixture.ArtefactDirectory, "response-chart.png"), FullPage = true });
    }

    [SkippableFact]
    public async Task ResponsePage_DarkColours_RedrawsTheChartInTheNewTextColour()
    {
        await using var session = await BrowserSession.StartAsync();
        var page = await session.OpenInteractiveAsync(new Uri(_server.BaseAddress, "/plan/response"));
        var chart = page.Locator("[data-testid=response-chart]");
        await Assertions.Expect(chart).ToHaveAttributeAsync("data-drawn", new System.Text.RegularExpressions.Regex("^[1-9][0-9]*$"), new LocatorAssertionsToHaveAttributeOptions { Timeout = 30_000 });
        var lightText = await chart.EvaluateAsync<string>("el => getComputedStyle(el.querySelector('.uplot')).color");
        var draws = await chart.GetAttributeAsync("data-drawn");

        await page.GetByTestId("dark-mode").ClickAsync();

        await Assertions.Expect(page.GetByTestId("dark-mode")).ToHaveAttributeAsync("aria-pressed", "true");
        await Assertions.Expect(chart).Not.ToHaveAttributeAsync("data-drawn", draws!);
        Assert.NotEqual(lightText, await chart.EvaluateAsync<string>("el => getComputedStyle(el.querySelector('.uplot')).color"));
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(ServerFixture.ArtefactDirectory, "response-chart-dark.png"), FullPage = true });
        await page.EmulateMediaAsync(new PageEmulateMediaOptions { Media = Media.Print });
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(ServerFixture.ArtefactDirectory, "response-chart-print.png"), FullPage = true });
    }
}
