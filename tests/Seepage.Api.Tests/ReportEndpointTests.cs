using System.Net;
using System.Text;
using System.Text.Json;
using System.Text.RegularExpressions;
using UglyToad.PdfPig;

namespace Seepage.Api.Tests;

/// <summary>Design memos and station tables, built from a stored analysis of the shipped example.</summary>
public class ReportEndpointTests
{
    private const string Caution = "licensed geotechnical engineer";

    private static async Task<string> Analyse(HttpClient client)
    {
        var json = await client.GetStringAsync("/api/v1/examples/twin-pile-weir");
        var post = await client.PostAsync("/api/v1/analyses", new StringContent(json, Encoding.UTF8, "application/json"));
        Assert.Equal(HttpStatusCode.Created, post.StatusCode);
        return JsonDocument.Parse(await post.Content.ReadAsStringAsync()).RootElement.GetProperty("id").GetString()!;
    }

    private static string Squeeze(string s) => Regex.Replace(s, @"\s+", "");

    [Fact]
    public async Task Report_Html_HasCautionFiguresTableAndSvgFigures()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        string id = await Analyse(client);
        var response = await client.GetAsync($"/api/v1/analyses/{id}/report");
        Assert.Equal("text/html", response.Content.Headers.ContentType?.MediaType);
        string html = await response.Content.ReadAsStringAsync();
        Assert.Contains(Caution, html);
        Assert.Contains("<caption>Figures and checks</caption>", html);
        Assert.Contains("<th>Figure or check</th><th>Method</th><th>Achieved</th><th>Required</th><th>Result</th>", html);
        Assert.Contains("Terzaghi", html);
        Assert.Contains("Lane 1935", html);
        Assert.Contains("<caption>Truncation check of the lateral boundaries</caption>", html);
        Assert.True(Regex.Matches(html, "<svg ").Count >= 4, "four figures: geometry, flow net, uplift, exit gradient");
    }

    // The memo states the element order used and lists a permeable wall with its thickness and conductivity.
    [Trait("Category", "Slow")] // order 2
    [Fact]
    public async Task Report_QuadraticElementsAndWall_StatedInTheMemo()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var doc = System.Text.Json.Nodes.JsonNode.Parse(await client.GetStringAsync("/api/v1/examples/twin-pile-weir"))!;
        doc["mesh"]!["order"] = 2;
        doc["cutoffs"]![0]!["thickness"] = 0.6;
        doc["cutoffs"]![0]!["kx"] = 1e-6;
        var post = await client.PostAsync("/api/v1/analyses", new StringContent(doc.ToJsonString(), Encoding.UTF8, "application/json"));
        Assert.Equal(HttpStatusCode.Created, post.StatusCode);
        string id = JsonDocument.Parse(await post.Content.ReadAsStringAsync()).RootElement.GetProperty("id").GetString()!;
        string html = await client.GetStringAsync($"/api/v1/analyses/{id}/report");
        Assert.Contains("quadratic (P2)", html);
        Assert.DoesNotContain("linear (P1)", html);
        Assert.Matches(@"wall 0\.60* m, kx 1\.000E-06 m/s", html);
    }

    [Trait("Category", "Slow")]
    [Fact]
    public async Task Report_Pdf_OpensAndHoldsCautionAndChecksHeadings()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        string id = await Analyse(client);
        var response = await client.GetAsync($"/api/v1/analyses/{id}/report?format=pdf");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("application/pdf", response.Content.Headers.ContentType?.MediaType);
        using var pdf = PdfDocument.Open(await response.Content.ReadAsByteArrayAsync());
        Assert.True(pdf.NumberOfPages >= 2);
        string text = Squeeze(string.Join(" ", pdf.GetPages().SelectMany(p => p.GetWords()).Select(w => w.Text)));
        Assert.Contains(Squeeze(Caution), text);
        Assert.Contains("Figuresandchecks", text);
        foreach (string heading in new[] { "Figureorcheck", "Achieved", "Required", "Result" }) Assert.Contains(heading, text);
    }

    [Fact]
    public async Task StationCsv_UpliftAndExit_HeaderWithUnitsAndOneRowPerStation()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        string id = await Analyse(client);
        var result = JsonDocument.Parse(await client.GetStringAsync($"/api/v1/analyses/{id}")).RootElement;
        var uplift = (await client.GetStringAsync($"/api/v1/analyses/{id}/uplift.csv")).Split("\r\n", StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal("structure,x (m),y (m),total head (m),pore pressure (kPa)", uplift[0]);
        Assert.Equal(result.GetProperty("uplift")[0].GetProperty("stations").GetArrayLength() + 2, uplift.Length);
        Assert.Contains(Caution, uplift[^1]);
        var exit = (await client.GetStringAsync($"/api/v1/analyses/{id}/exit.csv")).Split("\r\n", StringSplitOptions.RemoveEmptyEntries);
        Assert.StartsWith("x (m),upward exit gradient (-)", exit[0]);
        Assert.Equal(result.GetProperty("exit").GetProperty("profile").GetArrayLength() + 2, exit.Length);
        Assert.Contains(Caution, exit[^1]);
    }

    [Fact]
    public async Task Report_UnknownIdOrFormat_ProblemDetails()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        Assert.Equal(HttpStatusCode.NotFound, (await client.GetAsync("/api/v1/analyses/nope/report")).StatusCode);
        Assert.Equal(HttpStatusCode.NotFound, (await client.GetAsync("/api/v1/analyses/nope/uplift.csv")).StatusCode);
        var bad = await client.GetAsync("/api/v1/analyses/nope/report?format=docx");
        Assert.Equal(HttpStatusCode.BadRequest, bad.StatusCode);
        Assert.Equal("application/problem+json", bad.Content.Headers.ContentType?.MediaType);
    }
}
