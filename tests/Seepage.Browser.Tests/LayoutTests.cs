namespace Seepage.Browser.Tests;

/// <summary>The bench fits a tablet-width window and its controls are reachable from the keyboard.</summary>
[Collection(BrowserCollection.Name)]
public sealed class LayoutTests(BrowserFixture fixture)
{
    [Fact]
    public async Task TabletWidth_DemoAnalysed_HasNoHorizontalScroll()
    {
        await using var session = await PageSession.OpenAsync(fixture, width: 800, height: 1100);
        await session.LoadDemoAsync();
        var page = session.Page;
        var overflow = await page.EvaluateAsync<int>("() => document.documentElement.scrollWidth - window.innerWidth");
        Assert.True(overflow <= 1, $"page is {overflow} px wider than the window");
        await session.ScreenshotAsync("tablet-width");
        session.AssertNoConsoleErrors();
    }

    [Fact]
    public async Task Keyboard_RunButton_StartsAnAnalysis()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        await session.LoadDemoAsync();
        var page = session.Page;
        Assert.Equal("1", await page.GetAttributeAsync("body", "data-runs"));
        await page.FocusAsync("#run");
        await page.Keyboard.PressAsync("Enter");
        await page.WaitForFunctionAsync("() => document.body.dataset.runs === '2' && document.body.dataset.runState === 'done'",
            null, new() { Timeout = 60_000 });
        session.AssertNoConsoleErrors();
    }
}
