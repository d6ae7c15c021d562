using System.Text.Json;
using System.Text.Json.Nodes;
using Microsoft.Playwright;

namespace Seepage.Browser.Tests;

/// <summary>One browser context and page on the bench, recording console errors and uncaught exceptions.</summary>
public sealed class PageSession : IAsyncDisposable
{
    private readonly IBrowserContext context;
    private readonly List<string> consoleErrors = [];

    private PageSession(IBrowserContext context, IPage page)
    {
        this.context = context;
        Page = page;
        page.Console += (_, message) => { if (message.Type == "error") lock (consoleErrors) consoleErrors.Add(message.Text); };
        page.PageError += (_, error) => { lock (consoleErrors) consoleErrors.Add($"uncaught: {error}"); };
    }

    public IPage Page { get; }

    /// <summary>Console errors and uncaught exceptions seen so far.</summary>
    public IReadOnlyList<string> ConsoleErrors { get { lock (consoleErrors) return [.. consoleErrors]; } }

    /// <summary>Opens the bench at a tablet-or-laptop viewport; downloads are accepted.</summary>
    public static async Task<PageSession> OpenAsync(BrowserFixture fixture, int width = 1400, int height = 1000)
    {
        fixture.EnsureStarted();
        var context = await fixture.Browser.NewContextAsync(new BrowserNewContextOptions
        {
            BaseURL = fixture.Api.BaseAddress.ToString(),
            ViewportSize = new ViewportSize { Width = width, Height = height },
            AcceptDownloads = true,
        });
        var page = await context.NewPageAsync();
        return new PageSession(context, page);
    }

    /// <summary>Loads the page and waits until it has analysed the default example (at most 90 s).</summary>
    public async Task LoadDemoAsync()
    {
        await Page.GotoAsync("/");
        var state = Page.Locator("body[data-run-state=done], body[data-run-state=error]");
        await state.WaitForAsync(new LocatorWaitForOptions { Timeout = 90_000 });
        var runState = await Page.GetAttributeAsync("body", "data-run-state");
        if (runState != "done")
        {
            var alert = await Page.Locator("#alert").InnerTextAsync();
            Assert.Fail($"The demo analysis did not finish: {alert}");
        }
    }

    /// <summary>Changes the section in the editor, runs it and waits (at most 60 s) until the figures show the new
    /// analysis; returns its id.</summary>
    public async Task<string> RunEditedAsync(Action<JsonNode> edit)
    {
        var before = await Page.GetAttributeAsync("#figures", "data-analysis-id");
        var section = JsonNode.Parse(await Page.InputValueAsync("#editor"))!;
        edit(section);
        await FillEditorAsync(section.ToJsonString(new JsonSerializerOptions { WriteIndented = true }));
        await Page.ClickAsync("#run");
        await Page.WaitForFunctionAsync($"() => document.querySelector('#figures')?.dataset.analysisId !== '{before}' && document.body.dataset.runState === 'done'",
            null, new() { Timeout = 60_000 });
        return (await Page.GetAttributeAsync("#figures", "data-analysis-id"))!;
    }

    /// <summary>Shows the JSON tab and replaces the editor's text (as typing would).</summary>
    public async Task FillEditorAsync(string text)
    {
        await Page.ClickAsync("#tab-json");
        await Page.FillAsync("#editor", text);
    }

    /// <summary>Saves a viewport screenshot (what the user sees without scrolling) as TestResults/screenshots/{name}.png.</summary>
    public async Task ScreenshotViewportAsync(string name)
    {
        await Page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(BrowserFixture.ScreenshotFolder, $"{name}.png") });
    }

    /// <summary>Saves a full-page screenshot as TestResults/screenshots/{name}.png.</summary>
    public async Task ScreenshotAsync(string name)
    {
        await Page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(BrowserFixture.ScreenshotFolder, $"{name}.png"), FullPage = true });
    }

    /// <summary>Asserts that no console error other than those matching <paramref name="expected"/> was logged.</summary>
    public void AssertNoConsoleErrors(Func<string, bool>? expected = null)
    {
        var unexpected = ConsoleErrors.Where(e => expected is null || !expected(e)).ToList();
        Assert.True(unexpected.Count == 0, "Console errors:\n" + string.Join("\n", unexpected));
    }

    public async ValueTask DisposeAsync() => await context.CloseAsync();
}
