using System.Text.Json;

namespace Seepage.Browser.Tests;

/// <summary>Client-side downloads: station tables as CSV, the picture as SVG and PNG.</summary>
[Collection(BrowserCollection.Name)]
public sealed class ExportTests(BrowserFixture fixture)
{
    [Fact]
    public async Task UpliftCsv_AfterDemoRun_DownloadsEveryStation()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        await session.LoadDemoAsync();
        var page = session.Page;
        var download = await page.RunAndWaitForDownloadAsync(() => page.ClickAsync("#export-uplift"));
        Assert.EndsWith("-uplift.csv", download.SuggestedFilename);
        var lines = (await File.ReadAllLinesAsync((await download.PathAsync())!)).Where(l => l.Length > 0).ToList();
        Assert.Equal("structure,x_m,y_m,total_head_m,pore_pressure_kPa", lines[0]);

        var id = await page.GetAttributeAsync("#figures", "data-analysis-id");
        using var client = new HttpClient { BaseAddress = fixture.Api.BaseAddress };
        using var result = JsonDocument.Parse(await client.GetStringAsync($"api/v1/analyses/{id}"));
        var stations = result.RootElement.GetProperty("uplift").EnumerateArray().Sum(u => u.GetProperty("stations").GetArrayLength());
        Assert.True(stations > 0, "the demo has no uplift stations");
        Assert.Equal(stations, lines.Count - 1);
        session.AssertNoConsoleErrors();
    }

    [Fact]
    public async Task PictureExports_AfterDemoRun_DownloadSvgWithFlowNetAndPng()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        await session.LoadDemoAsync();
        var page = session.Page;
        var svg = await page.RunAndWaitForDownloadAsync(() => page.ClickAsync("#export-svg"));
        var svgText = await File.ReadAllTextAsync((await svg.PathAsync())!);
        Assert.Contains("<svg", svgText);
        Assert.Contains("class=\"equipotential\"", svgText);
        Assert.Contains("class=\"flow-line\"", svgText);

        var png = await page.RunAndWaitForDownloadAsync(() => page.ClickAsync("#export-png"));
        var bytes = await File.ReadAllBytesAsync((await png.PathAsync())!);
        await File.WriteAllBytesAsync(Path.Combine(BrowserFixture.ScreenshotFolder, "exported-picture.png"), bytes);
        Assert.True(bytes.Length > 5_000, $"PNG is only {bytes.Length} bytes");
        Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47 }, bytes[..4]);
        session.AssertNoConsoleErrors();
    }
}
