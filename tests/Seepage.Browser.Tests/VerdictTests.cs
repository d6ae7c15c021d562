using System.Net.Http.Json;
using System.Text.Json;

namespace Seepage.Browser.Tests;

/// <summary>The page's overall verdict says which checks it covers, exactly as the result document does
/// (<c>pass</c>, <c>passCovers</c>), so a reader never takes "pass" for more than it is.</summary>
[Collection(BrowserCollection.Name)]
public sealed class VerdictTests(BrowserFixture fixture)
{
    [Fact]
    public async Task KeyFigures_DemoAnalysed_VerdictNamesTheChecksItCovers()
    {
        await using var session = await PageSession.OpenAsync(fixture, 1600, 1000);
        await session.LoadDemoAsync();
        var page = session.Page;
        string id = (await page.GetAttributeAsync("#figures", "data-analysis-id"))!;
        using var http = new HttpClient { BaseAddress = new Uri(page.Url) };
        var result = await http.GetFromJsonAsync<JsonElement>($"/api/v1/analyses/{id}");
        bool pass = result.GetProperty("pass").GetBoolean();
        var covers = result.GetProperty("passCovers").EnumerateArray().Select(c => c.GetString()!).ToList();
        Assert.NotEmpty(covers);
        var verdict = page.Locator("#key-table tr[data-key='overall']");
        Assert.Equal(pass ? "pass" : "fail", await verdict.Locator(".pill").InnerTextAsync());
        Assert.Contains("covers " + string.Join(", ", covers), await verdict.InnerTextAsync());
        session.AssertNoConsoleErrors();
    }
}
