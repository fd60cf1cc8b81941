using Microsoft.Playwright;

namespace Bramble.Web.Tests;

/// <summary>
/// One board and one headless Chromium (Debian's, driven by Playwright) shared by every browser
/// test: launching a browser costs seconds, a fresh page per test costs little.
/// </summary>
public sealed class BrowserFixture : IAsyncLifetime
{
    private readonly BoardServer _board = new();
    private IPlaywright? _playwright;

    public IBrowser Browser { get; private set; } = null!;
    public string Address => _board.Address;
    public BoardServer Board => _board;

    /// <summary>Where the tests leave screenshots of each view (BRAMBLE_SCREENSHOTS, else the test output folder).</summary>
    public string Screenshots { get; } = Environment.GetEnvironmentVariable("BRAMBLE_SCREENSHOTS") is { Length: > 0 } s
        ? s : Path.Combine(AppContext.BaseDirectory, "screenshots");

    public async Task InitializeAsync()
    {
        await _board.InitializeAsync();
        Directory.CreateDirectory(Screenshots);
        var home = Directory.CreateTempSubdirectory("bramble-chromium").FullName;
        _playwright = await Playwright.CreateAsync();
        // Never `playwright install`: the machine's own Chromium is used.
        Browser = await _playwright.Chromium.LaunchAsync(new BrowserTypeLaunchOptions
        {
            ExecutablePath = Environment.GetEnvironmentVariable("BRAMBLE_CHROMIUM") is { Length: > 0 } path ? path : "/usr/bin/chromium",
            Headless = true,
            Env = new Dictionary<string, string> { ["XDG_CONFIG_HOME"] = home, ["XDG_CACHE_HOME"] = home, ["HOME"] = home },
        });
    }

    /// <summary>A fresh page (its own tab, so its own game) at the board, once the page has started.</summary>
    public async Task<IPage> OpenAsync(int width = 1280, int height = 860)
    {
        var page = await Browser.NewPageAsync(new BrowserNewPageOptions { ViewportSize = new ViewportSize { Width = width, Height = height } });
        // Generous: CI machines are shared, and a wait that ends early is as good as a short one.
        page.SetDefaultTimeout(60_000);
        await page.GotoAsync(Address);
        await page.WaitForSelectorAsync("body[data-ready='true']");
        return page;
    }

    public Task ShotAsync(IPage page, string name) =>
        page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(Screenshots, name + ".png"), FullPage = true });

    public async Task DisposeAsync()
    {
        if (Browser is not null) await Browser.DisposeAsync();
        _playwright?.Dispose();
        await _board.DisposeAsync();
    }
}

[CollectionDefinition("browser")]
public sealed class BrowserCollection : ICollectionFixture<BrowserFixture>;
