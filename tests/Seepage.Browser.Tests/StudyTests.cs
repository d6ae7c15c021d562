using System.Text;
using System.Text.Json.Nodes;

namespace Seepage.Browser.Tests;

/// <summary>A study set up in the page (members chosen by name) gives the same rows as the same alternatives posted
/// as CSV, and an alternative opens in the picture.</summary>
[Collection(BrowserCollection.Name)]
public sealed class StudyTests(BrowserFixture fixture)
{
    [Fact]
    public async Task Study_SetUpInThePage_MatchesTheSameStudyPostedAsCsv()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        var page = session.Page;
        await page.GotoAsync("/?example=twin-pile-weir&run=0");
        await page.Locator("#form-editor [data-path]").First.WaitForAsync();
        await page.ClickAsync("#tab-study");
        await page.SelectOptionAsync("#study-member", new Microsoft.Playwright.SelectOptionValue { Label = "tip elevation of 'downstream pile' (m)" });
        await page.ClickAsync("#study-add-member");
        await page.SelectOptionAsync("#study-member", new Microsoft.Playwright.SelectOptionValue { Label = "total head of 'headwater' (m)" });
        await page.ClickAsync("#study-add-member");
        await page.ClickAsync("#study-add-row");
        await page.ClickAsync("#study-add-row");
        string[][] cells = [["deeper pile", "-9", ""], ["high water", "", "7.5"], ["both", "-9", "7.5"], ["base", "", ""]];
        for (int i = 0; i < cells.Length; i++)
        {
            var row = page.Locator($"#study-grid tr[data-row='{i}']");
            await row.Locator("input[data-study='name']").FillAsync(cells[i][0]);
            await row.Locator("input[data-study='/cutoffs/1/tip/1']").FillAsync(cells[i][1]);
            await row.Locator("input[data-study='/heads/0/total']").FillAsync(cells[i][2]);
        }
        await page.ClickAsync("#study-run");
        await page.Locator("#study-results tbody tr").Nth(3).WaitForAsync(new() { Timeout = 120_000 });
        var studyId = await page.GetAttributeAsync(".study-results", "data-study-id");
        await session.ScreenshotAsync("study");

        using var client = new HttpClient { BaseAddress = fixture.Api.BaseAddress, Timeout = TimeSpan.FromMinutes(3) };
        var pageStudy = JsonNode.Parse(await client.GetStringAsync($"api/v1/studies/{studyId}"))!;
        var csv = "name,/cutoffs/1/tip/1,/heads/0/total\n" + string.Join("\n", cells.Select(c => string.Join(",", c))) + "\n";
        using var response = await client.PostAsync("api/v1/studies?base=twin-pile-weir", new StringContent(csv, Encoding.UTF8, "text/csv"));
        Assert.True(response.IsSuccessStatusCode, await response.Content.ReadAsStringAsync());
        var posted = JsonNode.Parse(await response.Content.ReadAsStringAsync())!;
        var a = pageStudy["rows"]!.AsArray();
        var b = posted["rows"]!.AsArray();
        Assert.Equal(4, a.Count);
        Assert.Equal(b.Count, a.Count);
        foreach (var (x, y) in a.Zip(b))
        {
            Assert.Equal(y!["name"]!.GetValue<string>(), x!["name"]!.GetValue<string>());
            Assert.True(x["valid"]!.GetValue<bool>(), x.ToJsonString());
            foreach (var figure in new[] { "flow", "upliftForce", "maxExitGradient", "exitFactor", "heaveFactor" })
                Assert.Equal(y[figure]!.GetValue<double>(), x[figure]!.GetValue<double>(), 12);
            Assert.Equal(y["pass"]!.GetValue<bool>(), x["pass"]!.GetValue<bool>());
        }
        // A deeper downstream pile passes less water than the base (continuity of the flow net).
        Assert.True(a[0]!["flow"]!.GetValue<double>() < a[3]!["flow"]!.GetValue<double>());

        Assert.Equal(1, await page.Locator("#study-chart").CountAsync());
        await page.Locator("#study-results tbody tr[data-name='both'] button").ClickAsync();
        var bothId = a[2]!["analysisId"]!.GetValue<string>();
        await page.WaitForFunctionAsync($"() => document.querySelector('#figures').dataset.analysisId === '{bothId}'");
        Assert.Contains("both", await page.Locator("#work-note").InnerTextAsync());
        session.AssertNoConsoleErrors();
    }
}
