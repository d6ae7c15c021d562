using System.Net;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace Seepage.Api.Tests;

/// <summary>Studies and spreadsheet imports that run analyses through the API.</summary>
[Trait("Category", "Slow")]
public class StudyAnalysisTests
{
    private static async Task<JsonElement> ReadJson(HttpResponseMessage response) =>
        JsonDocument.Parse(await response.Content.ReadAsStringAsync()).RootElement;

    [Fact]
    public async Task Study_FiveCutoffDepths_FlowFallsAndRowsMatchTheirStoredAnalyses()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var section = JsonNode.Parse(await client.GetStringAsync("/api/v1/examples/twin-pile-weir"))!;
        var alternatives = new JsonArray(new[] { -5.0, -6.0, -7.0, -8.0, -9.0 }.Select(y => (JsonNode)new JsonObject
        {
            ["name"] = $"tip {y} m", ["changes"] = new JsonObject { ["/cutoffs/1/tip/1"] = y },
        }).ToArray());
        var post = await client.PostAsync("/api/v1/studies",
            new StringContent(new JsonObject { ["base"] = section, ["alternatives"] = alternatives }.ToJsonString(), Encoding.UTF8, "application/json"));
        Assert.Equal(HttpStatusCode.Created, post.StatusCode);
        var study = await ReadJson(post);
        var rows = study.GetProperty("rows").EnumerateArray().ToList();
        Assert.Equal(5, rows.Count);
        // A deeper cutoff lengthens every flow path, so the discharge falls (common practice).
        for (int i = 1; i < 5; i++) Assert.True(rows[i].GetProperty("flow").GetDouble() < rows[i - 1].GetProperty("flow").GetDouble());

        // Each row is a stored analysis of its own section: same flow, and its section has the change.
        foreach (var row in rows)
        {
            string analysis = row.GetProperty("analysisId").GetString()!;
            var result = JsonDocument.Parse(await client.GetStringAsync($"/api/v1/analyses/{analysis}")).RootElement;
            Assert.Equal(row.GetProperty("flow").GetDouble(), result.GetProperty("flow").GetProperty("perMetre").GetDouble());
            var changed = JsonNode.Parse(await client.GetStringAsync($"/api/v1/analyses/{analysis}/section"))!;
            Assert.Equal(row.GetProperty("changes").GetProperty("/cutoffs/1/tip/1").GetDouble(), changed["cutoffs"]![1]!["tip"]![1]!.GetValue<double>());
        }

        string id = study.GetProperty("id").GetString()!;
        string html = await client.GetStringAsync($"/api/v1/studies/{id}/report?figure=exitFactor");
        Assert.Contains("<caption>Comparison of the alternatives</caption>", html);
        Assert.Contains("<th>/cutoffs/1/tip/1</th>", html);
        Assert.Contains("factor against piping against /cutoffs/1/tip/1", html);
        Assert.Contains("licensed geotechnical engineer", html);
        var pdf = await client.GetAsync($"/api/v1/studies/{id}/report?format=pdf");
        Assert.Equal("application/pdf", pdf.Content.Headers.ContentType?.MediaType);
        Assert.Equal(HttpStatusCode.BadRequest, (await client.GetAsync($"/api/v1/studies/{id}/report?figure=colour")).StatusCode);
    }

    [Fact]
    public async Task Import_TemplateCsvThenAnalyse_SameFlowAsJsonExample()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        string json = await client.GetStringAsync("/api/v1/examples/twin-pile-weir");
        var fromJson = await ReadJson(await client.PostAsync("/api/v1/analyses", new StringContent(json, Encoding.UTF8, "application/json")));
        var csv = await client.GetStringAsync("/api/v1/sections/template.csv");
        var imported = await client.PostAsync("/api/v1/sections/import", new StringContent(csv, Encoding.UTF8, "text/csv"));
        Assert.Equal(HttpStatusCode.OK, imported.StatusCode);
        var fromCsv = await ReadJson(await client.PostAsync("/api/v1/analyses",
            new StringContent(await imported.Content.ReadAsStringAsync(), Encoding.UTF8, "application/json")));
        double q = fromJson.GetProperty("flow").GetProperty("perMetre").GetDouble();
        Assert.Equal(q, fromCsv.GetProperty("flow").GetProperty("perMetre").GetDouble(), q * 1e-12);
    }
}
