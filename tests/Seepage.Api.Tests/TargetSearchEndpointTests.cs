using System.Net;
using System.Text.Json.Nodes;
using static Seepage.Api.Tests.DesignSections;

namespace Seepage.Api.Tests;

/// <summary>Target-search endpoints: the answer's fixed names, stored points with memos, exports, infeasible answers, bad input.</summary>
public class TargetSearchEndpointTests
{
    private static JsonObject Request(double exitFactor) => new()
    {
        ["base"] = SheetPile(), ["member"] = "/cutoffs/0/tip/1", ["range"] = new JsonArray(-1.0, -8.0),
        ["require"] = new JsonObject { ["exitFactor"] = exitFactor }, ["scanPoints"] = 3, ["tolerance"] = 0.5,
    };

    [Trait("Category", "Slow")] // a design run
    [Fact]
    public async Task Post_FeasibleRequirement_201WithValuePointsAndMemo()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var post = await client.PostAsync("/api/v1/target-searches", Json(Request(2.0)));
        Assert.Equal(HttpStatusCode.Created, post.StatusCode);
        var body = await Read(post);
        Assert.Equal("done", body.GetProperty("status").GetString());
        Assert.True(body.GetProperty("feasible").GetBoolean());
        Assert.Equal("exitFactor", body.GetProperty("governing").GetString());
        double value = body.GetProperty("value").GetDouble();
        Assert.InRange(value, -8.0, -1.0);
        Assert.True(body.GetProperty("margins").GetProperty("exitFactor").GetDouble() >= 0);
        Assert.Equal(1, body.GetProperty("intervals").GetArrayLength());
        var points = body.GetProperty("points");
        Assert.Equal(body.GetProperty("done").GetInt32(), points.GetArrayLength());
        Assert.Equal(body.GetProperty("total").GetInt32(), points.GetArrayLength());
        string analysisId = points[0].GetProperty("analysisId").GetString()!;
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync($"/api/v1/analyses/{analysisId}/report")).StatusCode);

        string location = post.Headers.Location!.ToString();
        Assert.Equal(value, (await Read(await client.GetAsync(location))).GetProperty("value").GetDouble());
        string csv = await client.GetStringAsync(location + "/points.csv");
        Assert.StartsWith("/cutoffs/0/tip/1,flow (m³/s per m)", csv);
        Assert.Equal(points.GetArrayLength() + 1, csv.Trim().Split('\n').Length);
        var xlsx = await client.GetAsync(location + "/points.xlsx");
        Assert.Equal(HttpStatusCode.OK, xlsx.StatusCode);
        string html = await client.GetStringAsync(location + "/report");
        Assert.Contains("against /cutoffs/0/tip/1", html);
        Assert.Contains("licensed geotechnical engineer", html);
    }

    [Trait("Category", "Slow")] // a design run
    [Fact]
    public async Task Post_RequirementNoValueMeets_201InfeasibleWithBestMargin()
    {
        using var factory = new SeepageFactory();
        var post = await factory.CreateClient().PostAsync("/api/v1/target-searches", Json(Request(40)));
        Assert.Equal(HttpStatusCode.Created, post.StatusCode);
        var body = await Read(post);
        Assert.False(body.GetProperty("feasible").GetBoolean());
        Assert.Equal(System.Text.Json.JsonValueKind.Null, body.GetProperty("value").ValueKind);
        Assert.True(body.GetProperty("bestMargin").GetDouble() < 0);
        Assert.Contains("No value of /cutoffs/0/tip/1", body.GetProperty("message").GetString());
    }

    [Theory]
    [InlineData("member", "\"/cutoffs/5/tip/1\"", "/member")]
    [InlineData("range", "[-1]", "/range")]
    [InlineData("range", "[-1, -40]", "/range/1")] // the tip would leave the layer
    [InlineData("require", "{ \"exitFactr\": 3 }", "/require/exitFactr")]
    [InlineData("require", "{ \"maxFlow\": -1 }", "/require/maxFlow")]
    [InlineData("scanPoints", "2", "/scanPoints")]
    [InlineData("colour", "1", "/colour")]
    public async Task Post_BadMember_400KeyedByPointer(string member, string json, string pointer)
    {
        using var factory = new SeepageFactory();
        var request = Request(2.0);
        request[member] = JsonNode.Parse(json);
        var post = await factory.CreateClient().PostAsync("/api/v1/target-searches", Json(request));
        Assert.Equal(HttpStatusCode.BadRequest, post.StatusCode);
        var errors = (await Read(post)).GetProperty("errors");
        Assert.True(errors.TryGetProperty(pointer, out _), errors.ToString());
    }

    [Fact]
    public async Task Get_UnknownId_404()
    {
        using var factory = new SeepageFactory();
        Assert.Equal(HttpStatusCode.NotFound, (await factory.CreateClient().GetAsync("/api/v1/target-searches/t0")).StatusCode);
    }
}
