using System.Globalization;
using System.Net;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;
using System.Text.RegularExpressions;

namespace Seepage.Api.Tests;

/// <summary>Memos and CSV downloads in US customary units (?units=us), the memo's title block and its tick labels.</summary>
public class ReportUnitsTests
{
    // Exact definitions (NIST Special Publication 811, 2008, appendix B): 1 ft = 0.3048 m, 1 lbf = 4.4482216152605 N.
    private const double Foot = 0.3048, PoundForce = 4.4482216152605;

    private static async Task<(HttpClient Client, SeepageFactory Factory, string Id, JsonElement Result)> Analyse(Action<JsonNode>? edit = null)
    {
        var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var doc = JsonNode.Parse(await client.GetStringAsync("/api/v1/examples/twin-pile-weir"))!;
        edit?.Invoke(doc);
        var post = await client.PostAsync("/api/v1/analyses", new StringContent(doc.ToJsonString(), Encoding.UTF8, "application/json"));
        Assert.Equal(HttpStatusCode.Created, post.StatusCode);
        var result = JsonDocument.Parse(await post.Content.ReadAsStringAsync()).RootElement;
        return (client, factory, result.GetProperty("id").GetString()!, result);
    }

    private static string FiguresTable(string html)
    {
        int start = html.IndexOf("<caption>Figures and checks</caption>", StringComparison.Ordinal);
        Assert.True(start >= 0, "no figures table");
        return WebUtility.HtmlDecode(html[start..html.IndexOf("</table>", start, StringComparison.Ordinal)]);
    }

    [Fact]
    public async Task Report_UsUnits_FiguresTableHasNoSiUnitAndConvertsTheFlow()
    {
        var (client, factory, id, result) = await Analyse();
        using var _ = factory;
        string siTable = FiguresTable(await client.GetStringAsync($"/api/v1/analyses/{id}/report"));
        foreach (var unit in new[] { "m³/s per m", "kN/m", " m)" }) Assert.Contains(unit, siTable);   // the check below can fail
        string table = FiguresTable(await client.GetStringAsync($"/api/v1/analyses/{id}/report?units=us"));
        foreach (var siUnit in new[] { " m)", " m,", " m ", "m³", "kN", "kPa", "L/min", "m/s" })
            Assert.DoesNotContain(siUnit, table);
        Assert.Contains("ft³/day per ft", table);
        Assert.Contains("gal/min per ft", table);
        Assert.Contains("kip/ft", table);
        // q (ft³/day per ft) = q (m³/s per m) × 86400 s/day ÷ (0.3048 m/ft)².
        var m = Regex.Match(table, @"Seepage discharge \(ft³/day per ft\)</td><td>[^<]*</td><td>([^<]+)</td>");
        Assert.True(m.Success, table);
        double shown = double.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture);
        double expected = result.GetProperty("flow").GetProperty("perMetre").GetDouble() * 86_400 / (Foot * Foot);
        Assert.True(Math.Abs(shown / expected - 1) < 5e-4, $"memo {shown}, expected {expected} ft³/day per ft");
        var f = Regex.Match(table, @"Uplift force under weir floor \(kip/ft\)</td><td>[^<]*</td><td>([^<]+)</td>");
        double force = double.Parse(f.Groups[1].Value, CultureInfo.InvariantCulture);
        double kN = result.GetProperty("uplift")[0].GetProperty("force").GetDouble();
        Assert.True(Math.Abs(force / (kN * 1000 / (1000 * PoundForce / Foot)) - 1) < 5e-4, $"memo {force} kip/ft for {kN} kN/m");
    }

    [Fact]
    public async Task StationCsv_UsUnits_FeetAndPoundsPerSquareFoot()
    {
        var (client, factory, id, result) = await Analyse();
        using var _ = factory;
        var lines = (await client.GetStringAsync($"/api/v1/analyses/{id}/uplift.csv?units=us")).Split("\r\n", StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal("structure,x (ft),y (ft),total head (ft),pore pressure (psf)", lines[0]);
        var first = result.GetProperty("uplift")[0].GetProperty("stations")[0];
        var cells = lines[1].Split(',');
        Assert.Equal(first.GetProperty("x").GetDouble() / Foot, double.Parse(cells[1], CultureInfo.InvariantCulture), 9);
        double psf = first.GetProperty("pressure").GetDouble() * 1000 / (PoundForce / (Foot * Foot));
        Assert.Equal(psf, double.Parse(cells[4], CultureInfo.InvariantCulture), 6);
        var exit = await client.GetStringAsync($"/api/v1/analyses/{id}/exit.csv?units=us");
        Assert.StartsWith("x (ft),", exit);
        Assert.Equal(HttpStatusCode.BadRequest, (await client.GetAsync($"/api/v1/analyses/{id}/exit.csv?units=imperial")).StatusCode);
        Assert.Equal(HttpStatusCode.BadRequest, (await client.GetAsync($"/api/v1/analyses/{id}/report?units=cgs")).StatusCode);
    }

    [Fact]
    public async Task Report_TitleBlockAndTicks_PrintedWithoutTrailingZeros()
    {
        var (client, factory, id, _) = await Analyse(doc => doc["titleBlock"] = new JsonObject
        {
            ["project"] = "Invented river crossing", ["jobNumber"] = "J-0042", ["preparedBy"] = "AB", ["checkedBy"] = "CD", ["revision"] = "B",
        });
        using var _ = factory;
        string html = WebUtility.HtmlDecode(await client.GetStringAsync($"/api/v1/analyses/{id}/report"));
        Assert.Contains("<caption>Title block</caption>", html);
        foreach (var v in new[] { "Invented river crossing", "J-0042", "Prepared by", "Checked by", "Revision" }) Assert.Contains(v, html);
        Assert.True(html.IndexOf("Title block", StringComparison.Ordinal) < html.IndexOf("1. Inputs", StringComparison.Ordinal));
        var ticks = Regex.Matches(html, "text-anchor=\"(?:middle|end)\">([^<]*)</text>").Select(m => m.Groups[1].Value).ToList();
        Assert.NotEmpty(ticks);
        Assert.DoesNotContain(ticks, t => Regex.IsMatch(t, @"\.\d*0$"));
        Assert.Contains("soil medium-sand", html);
    }
}
