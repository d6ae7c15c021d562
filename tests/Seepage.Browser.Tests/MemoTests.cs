namespace Seepage.Browser.Tests;

/// <summary>The design memo opened from the page: the server's HTML report of the shown analysis.</summary>
[Collection(BrowserCollection.Name)]
public sealed class MemoTests(BrowserFixture fixture)
{
    [Fact]
    public async Task DesignMemo_AfterDemoRun_OpensWithFiguresTableAndCaution()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        await session.LoadDemoAsync();
        var page = session.Page;
        var memo = await page.Context.RunAndWaitForPageAsync(() => page.ClickAsync("#open-memo"));
        await memo.WaitForLoadStateAsync();
        string text = await memo.Locator("body").InnerTextAsync();
        Assert.Contains("Figures and checks", text);
        Assert.Contains("Seepage discharge", text);
        Assert.Contains("licensed geotechnical engineer", text);
        Assert.True(await memo.Locator("svg").CountAsync() >= 3, "the memo should carry its vector figures");
        await memo.ScreenshotAsync(new() { Path = Path.Combine(BrowserFixture.ScreenshotFolder, "design-memo.png"), FullPage = true });
        session.AssertNoConsoleErrors();
    }
}
