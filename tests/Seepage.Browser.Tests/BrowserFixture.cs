using Microsoft.Playwright;

namespace Seepage.Browser.Tests;

/// <summary>
/// One running API and one headless Chromium shared by the browser tests (each test opens its own context).
/// Chromium is the machine's /usr/bin/chromium; Playwright never downloads a browser here.
/// </summary>
public sealed class BrowserFixture : IAsyncLifetime
{
    /// <summary>Where the tests expect the browser.</summary>
    public const string ChromiumPath = "/usr/bin/chromium";

    private static readonly string[] ChromiumArgs =
    [
        "--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-quic", "--no-first-run",
        "--disable-component-update", "--disable-sync",
    ];

    private IPlaywright? playwright;
    private IBrowser? browser;
    private ApiProcess? api;

    /// <summary>Why the fixture could not start, or null when it did.</summary>
    public string? StartFailure { get; private set; }

    public ApiProcess Api => api ?? throw new InvalidOperationException(StartFailure);

    public IBrowser Browser => browser ?? throw new InvalidOperationException(StartFailure);

    /// <summary>Folder for screenshots: TestResults/screenshots under the test output folder.</summary>
    public static string ScreenshotFolder { get; } =
        Directory.CreateDirectory(Path.Combine(AppContext.BaseDirectory, "TestResults", "screenshots")).FullName;

    public async Task InitializeAsync()
    {
        if (!File.Exists(ChromiumPath))
        {
            StartFailure = $"Chromium is missing at {ChromiumPath}. Run the project's test script, which installs chromium with apt-get before running the tests.";
            return;
        }
        try
        {
            api = await ApiProcess.StartAsync();
            playwright = await Playwright.CreateAsync();
            browser = await playwright.Chromium.LaunchAsync(new BrowserTypeLaunchOptions
            {
                ExecutablePath = ChromiumPath,
                Headless = true,
                Args = ChromiumArgs,
            });
        }
        catch (Exception e)
        {
            StartFailure = $"The browser test fixture could not start: {e.Message}";
        }
    }

    /// <summary>Fails the calling test with the start-up problem, if there was one.</summary>
    public void EnsureStarted()
    {
        if (StartFailure is not null) Assert.Fail(StartFailure);
    }

    public async Task DisposeAsync()
    {
        if (browser is not null) await browser.CloseAsync();
        playwright?.Dispose();
        if (api is not null) await api.DisposeAsync();
    }
}
