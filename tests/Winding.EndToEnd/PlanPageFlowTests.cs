using System.Net.Http.Json;
using System.Text.Json;
using Microsoft.Playwright;
using Winding.Web.Display;

namespace Winding.EndToEnd;

/// <summary>The planning page in a real browser against the real server.</summary>
public sealed class PlanPageFlowTests : IClassFixture<ServerFixture>
{
    private readonly ServerFixture _server;

    public PlanPageFlowTests(ServerFixture server) => _server = server;

    [SkippableFact]
    public async Task PickCore_TypeTurns_InductanceFollowsTheApi()
    {
        await using var session = await BrowserSession.StartAsync();
        var page = await session.OpenInteractiveAsync(new Uri(_server.BaseAddress, "/plan"));

        await page.GetByRole(AriaRole.Combobox).First.ClickAsync();
        await page.GetByRole(AriaRole.Option, new PageGetByRoleOptions { Name = "Toroid 36 × 23 × 15 mm · NiZn, μi 125" }).ClickAsync();
        var inductance = page.Locator("[data-testid=value-w0-inductance]");
        await page.Locator("#windings-0-turns").FillAsync("8");
        await Assertions.Expect(inductance).ToHaveTextAsync(await ExpectedInductance(8));

        await page.Locator("#windings-0-turns").FillAsync("24");

        await Assertions.Expect(inductance).ToHaveTextAsync(await ExpectedInductance(24));
        await Assertions.Expect(page.Locator("[data-testid=value-w0-layers]")).ToHaveTextAsync("1");
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(ServerFixture.ArtefactDirectory, "plan-page.png"), FullPage = true });
    }

    [SkippableFact]
    public async Task NonsenseTurns_ShowAFieldError_AndTheAppKeepsWorking()
    {
        await using var session = await BrowserSession.StartAsync();
        var page = await session.OpenInteractiveAsync(new Uri(_server.BaseAddress, "/plan"));

        await page.Locator("#windings-0-turns").FillAsync("twelve");

        await Assertions.Expect(page.GetByText("'twelve' is not a number")).ToBeVisibleAsync();
        await page.Locator("#windings-0-turns").FillAsync("12");
        await Assertions.Expect(page.Locator("[data-testid=value-w0-inductance]")).ToBeVisibleAsync();
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(ServerFixture.ArtefactDirectory, "plan-page-recovered.png") });
    }

    [SkippableFact]
    public async Task UnitSwitch_Inches_FieldsAndResultsFollow_AndTheChoiceSurvivesAReload()
    {
        await using var session = await BrowserSession.StartAsync();
        var page = await session.OpenInteractiveAsync(new Uri(_server.BaseAddress, "/plan"));
        var label = page.Locator("label[for=windings-0-conductor]");
        await Assertions.Expect(label).ToContainTextAsync("Conductor (mm)");

        await page.GetByTestId("unit-system").ClickAsync();

        await Assertions.Expect(label).ToContainTextAsync("Conductor (in)");
        // 0.5 mm = 0.019685 in to six digits; 0.02 in typed = 0.508 mm (1 in = 25.4 mm exactly).
        await Assertions.Expect(page.Locator("#windings-0-conductor")).ToHaveValueAsync("0.019685");
        await page.Locator("#windings-0-conductor").FillAsync("0.02");
        await Assertions.Expect(page.Locator("[data-testid=value-w0-wire]")).ToContainTextAsync("0.0200 in over");
        await Assertions.Expect(page.GetByTestId("cross-section-scale")).ToContainTextAsync(" in");
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(ServerFixture.ArtefactDirectory, "plan-page-inches.png"), FullPage = true });

        await page.ReloadAsync();
        await page.Locator("#app-content[data-interactive=true]").WaitForAsync(new LocatorWaitForOptions { Timeout = 30_000 });

        await Assertions.Expect(page.GetByTestId("unit-system")).ToHaveAttributeAsync("aria-pressed", "true");
        await Assertions.Expect(label).ToContainTextAsync("Conductor (in)");
    }

    [SkippableFact]
    public async Task KeyboardOnly_ReachTheTurns_ChangeThem_AndSave()
    {
        await using var session = await BrowserSession.StartAsync();
        var page = await session.OpenInteractiveAsync(new Uri(_server.BaseAddress, "/plan?demo=club-long-wire-receive"));
        await Assertions.Expect(page.Locator("#windings-0-turns")).ToHaveValueAsync("12");

        // From the plan's name, Tab walks the form in reading order and reaches the first winding's turns.
        await page.Locator("#plan-name").FocusAsync();
        var steps = 0;
        while (await page.EvaluateAsync<string>("() => document.activeElement?.id ?? ''") != "windings-0-turns")
        {
            Assert.True(++steps < 60, "Tab never reached the first winding's turns");
            await page.Keyboard.PressAsync("Tab");
        }

        await page.Keyboard.PressAsync("Control+A");
        await page.Keyboard.TypeAsync("20");
        await page.Keyboard.PressAsync("Tab");
        await Assertions.Expect(page.Locator("[data-testid=value-w0-turns-per-layer]")).ToContainTextAsync("20");
        await page.Keyboard.PressAsync("Shift+Tab");
        Assert.Equal("windings-0-turns", await page.EvaluateAsync<string>("() => document.activeElement?.id ?? ''"));

        // The name, then the save button right after it, pressed with Enter.
        await page.Locator("#plan-name").FocusAsync();
        await page.Keyboard.PressAsync("Control+A");
        await page.Keyboard.TypeAsync("Receive transformer, keyboard");
        await page.Keyboard.PressAsync("Tab");
        Assert.Equal("save-plan", await page.EvaluateAsync<string>("() => document.activeElement?.dataset.testid ?? ''"));
        await page.Keyboard.PressAsync("Enter");
        await Assertions.Expect(page.GetByTestId("save-message")).ToContainTextAsync("Saved");
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(ServerFixture.ArtefactDirectory, "plan-keyboard.png"), FullPage = true });
    }

    [SkippableFact]
    public async Task Warning_GoToTheField_FocusesTheFieldItIsAbout()
    {
        await using var session = await BrowserSession.StartAsync();
        var page = await session.OpenInteractiveAsync(new Uri(_server.BaseAddress, "/plan?demo=club-end-fed-unun"));
        await Assertions.Expect(page.GetByTestId("warnings")).ToBeVisibleAsync();
        var link = page.Locator("[data-field^='windings[1]'] [data-testid=warning-target]").First;
        var targets = (await link.GetAttributeAsync("data-targets"))!.Split(' ');

        await link.ClickAsync();

        await page.WaitForFunctionAsync("ids => ids.includes(document.activeElement?.id)", targets);
        var focused = await page.EvaluateAsync<string>("() => document.activeElement.id");
        Assert.StartsWith("windings-1-", focused, StringComparison.Ordinal);
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(ServerFixture.ArtefactDirectory, "warning-go-to-field.png") });
    }

    /// <summary>What the API answers for the same plan, formatted as the page formats it.</summary>
    private async Task<string> ExpectedInductance(int turns)
    {
        using var client = _server.CreateClient();
        using var response = await client.PostAsJsonAsync(
            new Uri("/api/v1/evaluate", UriKind.Relative),
            new
            {
                core = new { catalogueId = "toroid-36x23x15-nizn-125" },
                windings = new[] { new { name = "winding", turns, wire = new { conductorDiameterMm = 0.5 } } },
            });
        response.EnsureSuccessStatusCode();
        using var json = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        return EngineeringFormat.Format(json.RootElement.GetProperty("windings")[0].GetProperty("inductanceH").GetDouble(), "H");
    }

    [SkippableFact]
    public async Task OpenADemo_ChangeTurns_FitDrawingAndResultsFollow_SaveAndReload()
    {
        await using var session = await BrowserSession.StartAsync();
        var page = await session.OpenInteractiveAsync(_server.BaseAddress);
        await page.GetByTestId("demo-club-long-wire-receive").ClickAsync();
        await Assertions.Expect(page.Locator("#windings-0-turns")).ToHaveValueAsync("12");
        var layers = page.Locator("[data-testid=value-w0-turns-per-layer]");
        await Assertions.Expect(page.GetByTestId("cross-section-svg")).ToBeVisibleAsync();

        await page.Locator("#windings-0-turns").FillAsync("40");

        await Assertions.Expect(layers).ToContainTextAsync("40");
        await page.Locator("#plan-name").FillAsync("Long-wire receive, 40 turns");
        await page.GetByTestId("save-plan").ClickAsync();
        await Assertions.Expect(page.GetByTestId("save-message")).ToContainTextAsync("Saved");
        var link = await page.GetByTestId("plan-link").GetAttributeAsync("href");
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(ServerFixture.ArtefactDirectory, "demo-plan.png"), FullPage = true });

        var reloaded = await session.OpenInteractiveAsync(new Uri(_server.BaseAddress, "/" + link));
        await Assertions.Expect(reloaded.Locator("#windings-0-turns")).ToHaveValueAsync("40");
        await Assertions.Expect(reloaded.Locator("#plan-name")).ToHaveValueAsync("Long-wire receive, 40 turns");
    }

    [SkippableFact]
    public async Task MakeAVariant_AndCompareItWithTheOriginal()
    {
        await using var session = await BrowserSession.StartAsync();
        var page = await session.OpenInteractiveAsync(new Uri(_server.BaseAddress, "/plan?demo=club-long-wire-receive"));
        await Assertions.Expect(page.Locator("#windings-0-turns")).ToHaveValueAsync("12");
        await page.Locator("#plan-name").FillAsync("Receive transformer, original");
        await page.GetByTestId("save-plan").ClickAsync();
        await Assertions.Expect(page.GetByTestId("save-message")).ToContainTextAsync("Saved");

        await page.Locator("#windings-0-turns").FillAsync("16");
        await Assertions.Expect(page.Locator("[data-testid=value-w0-turns-per-layer]")).ToContainTextAsync("16");
        await page.GetByTestId("save-variant").ClickAsync();
        await Assertions.Expect(page.GetByTestId("save-message")).ToContainTextAsync("Saved");
        await page.GetByTestId("compare-select").ClickAsync();
        await page.GetByRole(AriaRole.Option, new PageGetByRoleOptions { Name = "Receive transformer, original" }).ClickAsync();
        await page.Keyboard.PressAsync("Escape");

        var table = page.GetByTestId("variant-table");
        await Assertions.Expect(table).ToContainTextAsync("Receive transformer, original (variant)");
        await Assertions.Expect(table).ToContainTextAsync("16 :");
        await Assertions.Expect(table).ToContainTextAsync("12 :");
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(ServerFixture.ArtefactDirectory, "variant-compare.png"), FullPage = true });
    }

    /// <summary>build a plan from scratch on a salvaged core typed on the plan page</summary>
    [SkippableFact]
    public async Task BuildAPlanFromScratch_OnASalvagedCoreTypedOnThePlanPage()
    {
        await using var session = await BrowserSession.StartAsync();
        var page = await session.OpenInteractiveAsync(new Uri(_server.BaseAddress, "/plan"));

        await page.GetByTestId("core-source-typed").ClickAsync();
        await page.Locator("#core-outerDiameter").FillAsync("23");
        await page.Locator("#core-innerDiameter").FillAsync("14");
        await page.Locator("#core-height").FillAsync("7");
        await page.Locator("#core-measured-al").FillAsync("120");
        await page.Locator("#windings-0-turns").FillAsync("6");
        await ChooseWireKind(page, 0, "AWG enamelled");
        await page.Locator("#windings-0-awg").FillAsync("26");
        await ChooseWireKind(page, 1, "Litz");
        await page.Locator("#windings-1-litz-strands").FillAsync("20");
        await page.Locator("#windings-1-litz-strand").FillAsync("0.1");
        await page.Locator("#windings-1-litz-bundle").FillAsync("0.6");

        // L = AL·N² (definition of AL): 120 nH × 6² = 4.32 µH.
        var inductance = page.Locator("[data-testid=value-w0-inductance]");
        await Assertions.Expect(inductance).ToHaveTextAsync("4.32 µH");
        await Assertions.Expect(page.Locator("[data-testid=value-w0-wire]")).ToContainTextAsync("AWG 26");
        await Assertions.Expect(page.Locator("[data-testid=value-w1-wire]")).ToContainTextAsync("Litz 20");
        await Assertions.Expect(page.Locator("[data-testid=value-w1-fits]")).ToContainTextAsync("fits");
        await Assertions.Expect(page.GetByTestId("cross-section-svg")).ToBeVisibleAsync();
        await Assertions.Expect(page.GetByTestId("response-chart")).ToBeVisibleAsync();
        await page.Locator("#plan-name").FillAsync("Salvaged ring, AWG and Litz");
        await page.GetByTestId("save-plan").ClickAsync();
        await Assertions.Expect(page.GetByTestId("save-message")).ToContainTextAsync("Saved");
        var link = await page.GetByTestId("plan-link").GetAttributeAsync("href");
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(ServerFixture.ArtefactDirectory, "plan-page-salvaged-core.png"), FullPage = true });

        var reloaded = await session.OpenInteractiveAsync(new Uri(_server.BaseAddress, "/" + link));

        await Assertions.Expect(reloaded.Locator("#core-outerDiameter")).ToHaveValueAsync("23");
        await Assertions.Expect(reloaded.Locator("#core-measured-al")).ToHaveValueAsync("120");
        await Assertions.Expect(reloaded.Locator("#windings-0-awg")).ToHaveValueAsync("26");
        await Assertions.Expect(reloaded.Locator("#windings-1-litz-strands")).ToHaveValueAsync("20");
        await Assertions.Expect(reloaded.Locator("[data-testid=value-w0-inductance]")).ToHaveTextAsync("4.32 µH");
    }

    private static async Task ChooseWireKind(IPage page, int winding, string kind)
    {
        await page.GetByTestId($"windings-{winding}-wire-kind").ClickAsync();
        await page.GetByRole(AriaRole.Option, new PageGetByRoleOptions { Name = kind, Exact = true }).ClickAsync();
        await Assertions.Expect(page.GetByTestId($"windings-{winding}-wire-kind")).ToHaveValueAsync(kind);
    }
}
