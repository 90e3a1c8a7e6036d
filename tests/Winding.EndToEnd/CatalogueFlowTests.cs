using Microsoft.Playwright;

namespace Winding.EndToEnd;

/// <summary>The catalogue and the salvaged-core flow in a real browser.</summary>
public sealed class CatalogueFlowTests : IClassFixture<ServerFixture>
{
    private readonly ServerFixture _server;

    public CatalogueFlowTests(ServerFixture server) => _server = server;

    [SkippableFact]
    public async Task MeasureASalvagedSleeve_SaveIt_AndPlanOnIt()
    {
        await using var session = await BrowserSession.StartAsync();
        var page = await session.OpenInteractiveAsync(new Uri(_server.BaseAddress, "/measure"));

        await page.Locator("#measure-od").FillAsync("17");
        await page.Locator("#measure-id").FillAsync("7");
        await page.Locator("#measure-length").FillAsync("28");
        await page.Locator("#measure-gap").FillAsync("0.04");
        await page.Locator("#measure-turns").FillAsync("5");
        await page.Locator("#measure-inductance").FillAsync("12u");
        await page.GetByTestId("measure-run").ClickAsync();
        await Assertions.Expect(page.GetByTestId("measure-al")).ToContainTextAsync("nH/turn²");
        await page.Locator("#measure-name").FillAsync("Split sleeve from the junk box");
        await page.GetByTestId("measure-save").ClickAsync();
        await Assertions.Expect(page.GetByTestId("measure-saved")).ToContainTextAsync("Saved");
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(ServerFixture.ArtefactDirectory, "measure-page.png"), FullPage = true });

        await page.GetByTestId("measure-plan-link").ClickAsync();
        await page.Locator("#app-content[data-interactive=true]").WaitForAsync();

        // 12 µH on 5 turns is AL = 480 nH (AL = L/N²); the plan page's AL is the stored core's, so it reads 480 nH.
        await Assertions.Expect(page.GetByTestId("value-al")).ToContainTextAsync("480 nH");
        await Assertions.Expect(page.GetByTestId("core-select")).ToContainTextAsync("Split sleeve from the junk box");
    }

    [SkippableFact]
    public async Task Catalogue_SearchAndOpenACore()
    {
        await using var session = await BrowserSession.StartAsync();
        var page = await session.OpenInteractiveAsync(new Uri(_server.BaseAddress, "/catalogue"));

        await page.Locator("#catalogue-search").FillAsync("36 × 23");
        await page.GetByRole(AriaRole.Link, new PageGetByRoleOptions { Name = "Toroid 36 × 23 × 15 mm" }).First.ClickAsync();

        await Assertions.Expect(page.GetByTestId("core-name")).ToHaveTextAsync("Toroid 36 × 23 × 15 mm");
        await Assertions.Expect(page.GetByTestId("value-le")).ToContainTextAsync("mm");
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(ServerFixture.ArtefactDirectory, "core-detail.png"), FullPage = true });
    }

    [SkippableFact]
    public async Task EditingFromTwoTabs_GivesAConflictInsteadOfALostEdit()
    {
        await using var session = await BrowserSession.StartAsync();
        var tabA = await session.OpenInteractiveAsync(new Uri(_server.BaseAddress, "/catalogue/materials/nizn-250"));
        await tabA.Locator("#clone-name").FillAsync("NiZn, μi 250 (club bench)");
        await tabA.GetByTestId("clone").ClickAsync();
        await Assertions.Expect(tabA.GetByTestId("material-name")).ToHaveTextAsync("NiZn, μi 250 (club bench)");
        var address = new Uri(tabA.Url);
        await tabA.Locator("#app-content[data-interactive=true]").WaitForAsync();
        var tabB = await session.OpenInteractiveAsync(address);

        await tabA.Locator("#edit-mu").FillAsync("240");
        await tabA.GetByTestId("save").ClickAsync();
        await Assertions.Expect(tabA.GetByTestId("entry-message")).ToContainTextAsync("Saved as version 2");
        await tabB.Locator("#edit-mu").FillAsync("260");
        await tabB.GetByTestId("save").ClickAsync();

        await Assertions.Expect(tabB.GetByTestId("entry-message")).ToContainTextAsync("has changed since you opened it");
        await tabB.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(ServerFixture.ArtefactDirectory, "edit-conflict.png"), FullPage = true });
        using var client = _server.CreateClient();
        var stored = await client.GetStringAsync(new Uri("/api/v1/materials/" + address.Segments[^1], UriKind.Relative));
        Assert.Contains("\"initialPermeability\":240", stored, StringComparison.Ordinal);
    }
}
