using System.Globalization;
using System.Text.Json;
using System.Text.RegularExpressions;

namespace Seepage.Browser.Tests;

/// <summary>The page opens with the demo section analysed, and what it draws and shows matches the API's answer.</summary>
[Collection(BrowserCollection.Name)]
public sealed class DemoRunTests(BrowserFixture fixture)
{
    [Fact]
    public async Task FirstLoad_DefaultExample_DrawsFlowNetFromFieldData()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        await session.LoadDemoAsync();
        var page = session.Page;
        var id = await page.GetAttributeAsync("#figures", "data-analysis-id");
        Assert.False(string.IsNullOrEmpty(id));
        using var field = await GetJsonAsync($"api/v1/analyses/{id}/field");

        var equipotentials = await page.Locator("#picture path.equipotential").CountAsync();
        var flowLines = await page.Locator("#picture path.flow-line").CountAsync();
        var expectedEquipotentials = field.RootElement.GetProperty("equipotentials").EnumerateArray()
            .Sum(e => e.GetProperty("paths").EnumerateArray().Count(p => p.GetArrayLength() >= 2));
        var expectedFlowLines = field.RootElement.GetProperty("flowLines").EnumerateArray().Count(l => l.GetProperty("points").GetArrayLength() >= 2);
        Assert.True(equipotentials > 0, "no equipotential paths drawn");
        Assert.True(flowLines > 0, "no flow-line paths drawn");
        Assert.Equal(expectedEquipotentials, equipotentials);
        Assert.Equal(expectedFlowLines, flowLines);
        Assert.True(await page.Locator("#picture .head-fill path").CountAsync() > 0, "no head colour fill");
        Assert.True(await page.Locator("#picture path.wall").CountAsync() > 0, "no cutoff walls drawn");

        var net = field.RootElement.GetProperty("flowNet");
        var counts = await page.Locator("#flow-net-counts").InnerTextAsync();
        Assert.Contains($"Nf = {net.GetProperty("flowChannelsExact").GetDouble().ToString("0.00", CultureInfo.InvariantCulture)} ", counts);
        Assert.Contains($"Nd = {net.GetProperty("headDrops").GetInt32()} ", counts);

        var caution = page.Locator("#caution");
        Assert.True(await caution.IsVisibleAsync(), "caution hidden");
        Assert.Contains("licensed", await caution.InnerTextAsync(), StringComparison.OrdinalIgnoreCase);
        await session.ScreenshotAsync("demo-analysed");
        session.AssertNoConsoleErrors();
    }

    [Fact]
    public async Task FiguresPanel_AfterDemoRun_ShowsFlowRateOfTheApiResult()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        await session.LoadDemoAsync();
        var page = session.Page;
        var id = await page.GetAttributeAsync("#figures", "data-analysis-id");
        using var result = await GetJsonAsync($"api/v1/analyses/{id}");
        var flow = result.RootElement.GetProperty("flow");

        var shown = ShownNumber.Parse(await page.Locator("#flow-value").InnerTextAsync());
        AssertClose(flow.GetProperty("perMetre").GetDouble(), shown, "m³/s per m");

        await page.SelectOptionAsync("#flow-unit", "lmin");
        var shownLitres = ShownNumber.Parse(await page.Locator("#flow-value").InnerTextAsync());
        Assert.Contains("L/min per m", await page.Locator("#flow-value").InnerTextAsync());
        AssertClose(flow.GetProperty("litresPerMinutePerMetre").GetDouble(), shownLitres, "L/min per m");
        session.AssertNoConsoleErrors();
    }

    [Fact]
    public async Task HoverReadout_OverSoilZone_ShowsHeadPressureAndGradient()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        await session.LoadDemoAsync();
        var page = session.Page;
        var box = await page.Locator("#picture path.zone-outline").First.BoundingBoxAsync();
        Assert.NotNull(box);
        await page.Mouse.MoveAsync(box.X + box.Width * 0.5f, box.Y + box.Height * 0.5f);
        var text = (await page.Locator("#probe").InnerTextAsync()).Replace('−', '-');
        Assert.Contains("|i| =", text);
        double Read(string pattern) => double.Parse(Regex.Match(text, pattern).Groups[1].Value, CultureInfo.InvariantCulture);
        double x = Read(@"x = (-?[\d.]+) m"), y = Read(@"y = (-?[\d.]+) m"), h = Read(@"h = (-?[\d.]+) m");
        double u = Read(@"= (-?[\d.]+) kPa");

        // The readout rounds x and y to 1 cm; the head there may differ by |grad h| x 1.4 cm from the shown one.
        var id = await page.GetAttributeAsync("#figures", "data-analysis-id");
        using var field = await GetJsonAsync($"api/v1/analyses/{id}/field");
        var expected = FieldSample.HeadAt(field.RootElement, x, y);
        Assert.NotNull(expected);
        Assert.True(Math.Abs(expected.Value - h) < 0.02, $"readout h = {h} m at ({x}, {y}); field interpolates {expected} m");
        using var section = JsonDocument.Parse(await page.InputValueAsync("#editor"));
        var gammaW = section.RootElement.TryGetProperty("waterUnitWeight", out var g) ? g.GetDouble() : 9.81; // kN/m³, DESIGN default
        Assert.True(Math.Abs(gammaW * (h - y) - u) < 0.3, $"readout u = {u} kPa, γw(h − y) = {gammaW * (h - y)} kPa");
        await page.CheckAsync("#show-mesh");
        await page.ClickAsync("#zoom-in");
        await page.ClickAsync("#zoom-in");
        Assert.Equal(1, await page.Locator("#picture path.mesh").CountAsync());
        await page.CheckAsync("#show-arrows");
        Assert.Equal(1, await page.Locator("#picture path.velocity").CountAsync());
        await session.ScreenshotAsync("zoomed-mesh-hover");
        session.AssertNoConsoleErrors();
    }

    private async Task<JsonDocument> GetJsonAsync(string path)
    {
        using var client = new HttpClient { BaseAddress = fixture.Api.BaseAddress };
        var stream = await client.GetStreamAsync(path);
        return await JsonDocument.ParseAsync(stream);
    }

    private static void AssertClose(double expected, double shown, string unit)
    {
        // The panel shows four significant figures.
        var tolerance = Math.Abs(expected) * 6e-4;
        Assert.True(Math.Abs(expected - shown) <= tolerance, $"panel shows {shown} {unit}, API says {expected} {unit}");
    }
}
