namespace Seepage.Browser.Tests;

/// <summary>The picture and the key figures share the first screen; the bench fits a tablet-width window and its
/// controls are reachable from the keyboard.</summary>
[Collection(BrowserCollection.Name)]
public sealed class LayoutTests(BrowserFixture fixture)
{
    [Theory]
    [InlineData(1600, 1000, "screen-1600x1000")]
    [InlineData(1280, 800, "screen-1280x800")]
    public async Task Screen_DemoAnalysed_PictureAndKeyFiguresVisibleWithoutScrolling(int width, int height, string shot)
    {
        await using var session = await PageSession.OpenAsync(fixture, width, height);
        await session.LoadDemoAsync();
        var page = session.Page;
        // Every key figure with its value, required value and pass/fail, and the whole picture, inside the window.
        var keys = new[] { "flow", "uplift-weir floor", "exit", "heave-upstream pile", "heave-downstream pile", "lane", "bligh" };
        foreach (var key in keys)
        {
            var cells = page.Locator($"#key-table tr[data-key='{key}'] td");
            Assert.Equal(4, await cells.CountAsync());
            for (int c = 0; c < 4; c++) await AssertInsideAsync(page, cells.Nth(c), width, height, $"key figure '{key}' cell {c}");
            Assert.False(string.IsNullOrWhiteSpace(await cells.Nth(2).InnerTextAsync()), $"'{key}' has no required value");
        }
        Assert.Equal("pass", await page.Locator("#key-table tr[data-key='exit'] .pill").InnerTextAsync());
        await AssertInsideAsync(page, page.Locator("#picture"), width, height, "picture");
        await AssertInsideAsync(page, page.Locator("#run"), width, height, "analyse button");
        Assert.Equal(0, await page.EvaluateAsync<int>("() => window.scrollY"));
        var overflow = await page.EvaluateAsync<int>("() => document.documentElement.scrollWidth - window.innerWidth");
        Assert.True(overflow <= 1, $"page is {overflow} px wider than the window");
        await session.ScreenshotViewportAsync(shot);
        session.AssertNoConsoleErrors();
    }

    [Fact]
    public async Task TabletWidth_DemoAnalysed_HasNoHorizontalScroll()
    {
        await using var session = await PageSession.OpenAsync(fixture, width: 800, height: 1100);
        await session.LoadDemoAsync();
        var page = session.Page;
        var overflow = await page.EvaluateAsync<int>("() => document.documentElement.scrollWidth - window.innerWidth");
        Assert.True(overflow <= 1, $"page is {overflow} px wider than the window");
        // Picture first, then the key figures below it.
        var picture = await page.Locator("#picture").BoundingBoxAsync();
        var keys = await page.Locator("#key-table").BoundingBoxAsync();
        Assert.True(picture!.Y + picture.Height <= keys!.Y + 1, "the key figures should follow the picture at tablet width");
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

    private static async Task AssertInsideAsync(Microsoft.Playwright.IPage page, Microsoft.Playwright.ILocator element, int width, int height, string what)
    {
        var box = await element.BoundingBoxAsync();
        Assert.NotNull(box);
        Assert.True(box.X >= 0 && box.Y >= 0 && box.X + box.Width <= width + 0.5 && box.Y + box.Height <= height + 0.5,
            $"{what} at x {box.X:F0}…{box.X + box.Width:F0}, y {box.Y:F0}…{box.Y + box.Height:F0} is not inside the {width}×{height} window");
    }
}
