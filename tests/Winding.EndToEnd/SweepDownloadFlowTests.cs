using System.Text;
using Microsoft.Playwright;

namespace Winding.EndToEnd;

/// <summary>The plan page's "Sweep CSV" download in a real browser: the file the browser saves is what the API gives for the plan.</summary>
public sealed class SweepDownloadFlowTests : IClassFixture<ServerFixture>
{
    private readonly ServerFixture _server;

    public SweepDownloadFlowTests(ServerFixture server) => _server = server;

    [SkippableFact]
    public async Task SweepCsv_Click_BrowserSavesTheApisCsvForThePlanShown()
    {
        await using var session = await BrowserSession.StartAsync();
        var page = await session.OpenInteractiveAsync(new Uri(_server.BaseAddress, "/plan"));
        await page.Locator("#plan-name").FillAsync("bench 1:9");
        await page.Locator("#plan-name").PressAsync("Tab");
        await Assertions.Expect(page.GetByTestId("export-plan")).ToHaveAttributeAsync("download", "bench-19.json");

        var download = await page.RunAndWaitForDownloadAsync(() => page.GetByTestId("export-sweep").ClickAsync());

        Assert.Equal("bench-19.csv", download.SuggestedFilename);
        var saved = await File.ReadAllTextAsync((await download.PathAsync())!, Encoding.UTF8);
        // The plan shown, as the page's own "Export" link carries it (a data: address with the JSON), through the API.
        var href = (await page.GetByTestId("export-plan").GetAttributeAsync("href"))!;
        var plan = Uri.UnescapeDataString(href[(href.IndexOf(',', StringComparison.Ordinal) + 1)..]);
        using var client = _server.CreateClient();
        using var response = await client.PostAsync(new Uri("/api/v1/sweep?format=csv", UriKind.Relative), new StringContent(plan, Encoding.UTF8, "application/json"));
        Assert.Equal(await response.Content.ReadAsStringAsync(), saved);
        Assert.StartsWith("frequency (Hz),insertion loss (dB)", saved, StringComparison.Ordinal);
    }
}
