namespace Seepage.Browser.Tests;

/// <summary>The "Design questions" pane: an uncertainty study and a target search run on the demo section from the page.</summary>
[Collection(BrowserCollection.Name)]
public sealed class DesignRunTests(BrowserFixture fixture)
{
    [Fact]
    public async Task DesignQuestions_OnDemo_ShowStatisticsAndSearchAnswer()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        await session.LoadDemoAsync();
        var page = session.Page;
        await page.ClickAsync("#design-runs > summary");
        await page.FillAsync("#uncertainty-form input[name=samples]", "30");
        await page.ClickAsync("#uncertainty-form button[type=submit]");
        await page.Locator(".design-out").GetByText("done: 30 of 30 samples").WaitForAsync(new() { Timeout = 120_000 });
        string text = await page.Locator(".design-out").InnerTextAsync();
        Assert.Contains("flow", text);
        Assert.Contains("p_f", text);
        Assert.Contains("Memo with the histograms", text);
        Assert.True(await page.Locator(".design-chart svg rect").CountAsync() > 2, "the histograms should be drawn");

        await page.FillAsync("#target-form input[name=to]", "-9");
        await page.ClickAsync("#target-form button[type=submit]");
        await page.Locator(".design-out").GetByText("meets every requirement").WaitForAsync(new() { Timeout = 180_000 });
        Assert.Contains("Memo with the curves", await page.Locator(".design-out").InnerTextAsync());
        Assert.Equal(2, await page.Locator(".design-chart polyline").CountAsync());
        await session.ScreenshotAsync("design-questions");
        session.AssertNoConsoleErrors();
    }
}
