using Microsoft.Playwright;

namespace Winding.EndToEnd;

/// <summary>Playwright with Debian's Chromium, headless, with the flags this offline machine needs.</summary>
public sealed class BrowserSession : IAsyncDisposable
{
    private BrowserSession(IPlaywright playwright, IBrowser browser)
    {
        Playwright = playwright;
        Browser = browser;
    }

    public IPlaywright Playwright { get; }

    public IBrowser Browser { get; }

    /// <summary>Launches Chromium (skips or fails first when it is missing, see <see cref="RequiredTools"/>).</summary>
    public static async Task<BrowserSession> StartAsync()
    {
        var executable = RequiredTools.Chromium();
        var playwright = await Microsoft.Playwright.Playwright.CreateAsync();
        var browser = await playwright.Chromium.LaunchAsync(new BrowserTypeLaunchOptions
        {
            ExecutablePath = executable,
            Headless = true,
            Args =
            [
                "--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update",
                "--no-first-run", "--disable-sync", "--disable-quic",
            ],
        });
        return new BrowserSession(playwright, browser);
    }

    /// <summary>Opens a page at <paramref name="address"/> and waits until the Blazor circuit is interactive.</summary>
    public async Task<IPage> OpenInteractiveAsync(Uri address)
    {
        var page = await Browser.NewPageAsync(new BrowserNewPageOptions { ViewportSize = new ViewportSize { Width = 1280, Height = 900 } });
        await page.GotoAsync(address.ToString());
        await page.Locator("#app-content[data-interactive=true]").WaitForAsync(new LocatorWaitForOptions { Timeout = 30_000 });
        return page;
    }

    public async ValueTask DisposeAsync()
    {
        await Browser.DisposeAsync();
        Playwright.Dispose();
    }
}
