using System.Globalization;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace Seepage.Browser.Tests;

/// <summary>The figures panel shows the reviewer's evidence (independent variables, gauges, truncation) as the API reports it.</summary>
[Collection(BrowserCollection.Name)]
public sealed class EvidenceTests(BrowserFixture fixture)
{
    [Fact]
    public async Task FiguresPanel_SectionWithGauge_ShowsIndependentVariablesGaugeAndTruncation()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        await session.LoadDemoAsync();
        var page = session.Page;
        // The demo floor with a gauge from its middle down to the impervious base, and the truncation check on.
        var id = await session.RunEditedAsync(section =>
        {
            section["gauges"] = JsonNode.Parse("""[{ "name": "below the floor", "along": [[2, 0], [2, -28]] }]""");
            section["truncationCheck"] = true;
        });
        using var client = new HttpClient { BaseAddress = fixture.Api.BaseAddress };
        using var result = JsonDocument.Parse(await client.GetStringAsync($"api/v1/analyses/{id}"));
        var root = result.RootElement;

        var piles = root.GetProperty("independentVariables").GetProperty("piles");
        var rows = page.Locator("#iv-table tbody tr");
        Assert.Equal(3 * piles.GetArrayLength(), await rows.CountAsync());
        var cells = await rows.First.Locator("td").AllInnerTextsAsync();
        Assert.Equal(piles[0].GetProperty("e").GetProperty("fe").GetDouble(), Number(cells[2]), 0.051);

        var gauge = root.GetProperty("gauges")[0];
        var gaugeCells = await page.Locator("#gauge-table tbody tr").First.Locator("td").AllInnerTextsAsync();
        Assert.Equal("below the floor", gaugeCells[0]);
        double shown = ShownNumber.Parse(gaugeCells[1]), flow = gauge.GetProperty("flow").GetDouble();
        Assert.True(Math.Abs(shown - flow) <= 6e-4 * Math.Abs(flow), $"gauge shows {shown}, API {flow}");
        // The gauge parts the section, so it carries the whole discharge (continuity).
        Assert.Equal(root.GetProperty("flow").GetProperty("perMetre").GetDouble(), flow, 1e-6 * Math.Abs(flow));
        Assert.Equal(3, await page.Locator("#truncation-table tbody tr").CountAsync());
        await session.ScreenshotAsync("evidence");
        session.AssertNoConsoleErrors();
    }

    // A permeable wall is drawn as its strip and hovering over it names the wall's own soil.
    [Fact]
    public async Task Picture_PermeableWall_DrawnAsStripWithItsSoilInTheReadout()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        await session.LoadDemoAsync();
        var page = session.Page;
        await session.RunEditedAsync(section =>
        {
            section["cutoffs"]![1]!["thickness"] = 3.0;
            section["cutoffs"]![1]!["kx"] = 1e-6;
        });
        var strip = page.Locator("#picture path.wall-thick");
        Assert.Equal(1, await strip.CountAsync());
        var box = await strip.BoundingBoxAsync();
        Assert.NotNull(box);
        Assert.True(box!.Width > 4 && box.Height > box.Width, $"strip {box.Width} × {box.Height} px");
        await page.Mouse.MoveAsync(box.X + box.Width * 0.5f, box.Y + box.Height * 0.6f);
        Assert.Contains("soil downstream pile (wall)", await page.Locator("#probe").InnerTextAsync());
        session.AssertNoConsoleErrors();
    }

    private static double Number(string text) => double.Parse(text.Replace('−', '-'), CultureInfo.InvariantCulture);
}
