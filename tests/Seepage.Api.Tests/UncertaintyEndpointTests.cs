using System.Net;
using System.Text.Json.Nodes;
using static Seepage.Api.Tests.DesignSections;

namespace Seepage.Api.Tests;

/// <summary>Uncertainty-study endpoints: the fixed names of the statistics, long runs with progress, cancellation, exports, bad input.</summary>
public class UncertaintyEndpointTests
{
    private static JsonObject Request(int samples, string variable = """{ "member": "/soils/0/kx", "distribution": "lognormal", "median": 1e-5, "cov": 0.5 }""") => new()
    {
        ["base"] = SheetPile(), ["variables"] = new JsonArray(JsonNode.Parse(variable),
            JsonNode.Parse("""{ "member": "/heads/0/total", "distribution": "normal", "mean": 3, "sd": 0.5 }""")),
        ["samples"] = samples, ["seed"] = 7,
    };

    [Trait("Category", "Slow")] // a design run
    [Fact]
    public async Task Post_SmallStudy_201WithStatisticsChecksFosmAndSamples()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var post = await client.PostAsync("/api/v1/uncertainty-studies", Json(Request(40)));
        Assert.Equal(HttpStatusCode.Created, post.StatusCode);
        var body = await Read(post);
        Assert.Equal("done", body.GetProperty("status").GetString());
        Assert.Equal(40, body.GetProperty("done").GetInt32());
        Assert.Equal(40, body.GetProperty("total").GetInt32());
        var flow = body.GetProperty("figures").GetProperty("flow");
        foreach (string name in new[] { "mean", "sd", "p05", "p50", "p95" }) Assert.True(flow.GetProperty(name).GetDouble() > 0, name);
        Assert.Equal(20, flow.GetProperty("histogram").GetProperty("counts").GetArrayLength());
        var exit = body.GetProperty("checks").GetProperty("exit");
        Assert.InRange(exit.GetProperty("probabilityOfFailure").GetDouble(), 0, 1);
        Assert.True(exit.TryGetProperty("standardError", out _) && exit.TryGetProperty("beta", out _));
        Assert.True(body.GetProperty("fosm").GetProperty("flow").GetProperty("mean").GetDouble() > 0);
        Assert.True(body.GetProperty("fosm").GetProperty("exitFactor").GetProperty("sd").GetDouble() > 0);
        Assert.True(body.GetProperty("sensitivity").GetProperty("/soils/0/kx").GetProperty("flow").GetDouble() > 0.5);
        Assert.Equal(1.0, body.GetProperty("variables")[0].GetProperty("median").GetDouble() / 1e-5, 9);

        string location = post.Headers.Location!.ToString();
        string csv = await client.GetStringAsync(location + "/samples.csv");
        Assert.StartsWith("sample,/soils/0/kx,/heads/0/total,flow (m³/s per m)", csv);
        Assert.Equal(41, csv.Trim().Split('\n').Length);
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync(location + "/samples.xlsx")).StatusCode);
        string html = await client.GetStringAsync(location + "/report");
        Assert.Contains("only as good as the distributions assumed", html);
        Assert.Contains("Histogram of the factor against piping", html);
    }

    [Trait("Category", "Slow")] // a long design run, twice
    [Fact]
    public async Task Post_LargeStudy_202ThenProgressToDone_SameSeedSameStatistics()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var post = await client.PostAsync("/api/v1/uncertainty-studies", Json(Request(150)));
        Assert.Equal(HttpStatusCode.Accepted, post.StatusCode);
        Assert.Equal("running", (await Read(post)).GetProperty("status").GetString());
        var done = await WaitAsync(client, post.Headers.Location!.ToString(), TimeSpan.FromMinutes(5));
        Assert.Equal("done", done.GetProperty("status").GetString());
        Assert.Equal(150, done.GetProperty("done").GetInt32());

        var again = await WaitAsync(client, (await client.PostAsync("/api/v1/uncertainty-studies?background=true", Json(Request(150))))
            .Headers.Location!.ToString(), TimeSpan.FromMinutes(5));
        Assert.Equal(done.GetProperty("figures").GetProperty("flow").GetProperty("mean").GetDouble(),
            again.GetProperty("figures").GetProperty("flow").GetProperty("mean").GetDouble());
    }

    [Fact]
    public async Task Cancel_RunningStudy_StopsWithSamplesSoFar()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var post = await client.PostAsync("/api/v1/uncertainty-studies", Json(Request(20000)));
        string location = post.Headers.Location!.ToString();
        var cancel = await client.PostAsync(location + "/cancel", null);
        Assert.Equal(HttpStatusCode.Accepted, cancel.StatusCode);
        var state = await WaitAsync(client, location, TimeSpan.FromMinutes(2));
        Assert.Equal("cancelled", state.GetProperty("status").GetString());
        Assert.True(state.GetProperty("done").GetInt32() < 20000);
        Assert.Equal(HttpStatusCode.Conflict, (await client.PostAsync(location + "/cancel", null)).StatusCode);
    }

    [Theory]
    [InlineData("""{ "member": "/soils/0/kx", "distribution": "normal", "mean": 1e-5, "sd": 1e-6 }""", "/variables/0/distribution")]
    [InlineData("""{ "member": "/soils/0/kx", "distribution": "lognormal", "median": 1e-5 }""", "/variables/0/distribution")]
    [InlineData("""{ "member": "/soils/0/kx", "distribution": "beta", "median": 1e-5, "cov": 1 }""", "/variables/0/distribution")]
    [InlineData("""{ "member": "/soils/3/kx", "distribution": "lognormal", "median": 1e-5, "cov": 1 }""", "/variables/0/member")]
    [InlineData("""{ "member": "/soils/0/kx", "distribution": "lognormal", "median": 1e-5, "cov": 1, "shape": 2 }""", "/variables/0/shape")]
    [InlineData("""{ "member": "/soils/0/kx", "distribution": "uniform", "range": [2e-5, 1e-5] }""", "/variables/0/range")]
    public async Task Post_BadVariable_400KeyedByPointer(string variable, string pointer)
    {
        using var factory = new SeepageFactory();
        var post = await factory.CreateClient().PostAsync("/api/v1/uncertainty-studies", Json(Request(20, variable)));
        Assert.Equal(HttpStatusCode.BadRequest, post.StatusCode);
        var errors = (await Read(post)).GetProperty("errors");
        Assert.True(errors.TryGetProperty(pointer, out _), errors.ToString());
    }

    [Fact]
    public async Task Post_CorrelationNotPositiveDefinite_400()
    {
        using var factory = new SeepageFactory();
        var request = Request(20);
        request["correlations"] = JsonNode.Parse("""[ { "between": ["/soils/0/kx", "/heads/0/total"], "rank": 0.5 }, { "between": ["/heads/0/total", "/nope"], "rank": 0.1 } ]""");
        var post = await factory.CreateClient().PostAsync("/api/v1/uncertainty-studies", Json(request));
        Assert.Equal(HttpStatusCode.BadRequest, post.StatusCode);
        Assert.True((await Read(post)).GetProperty("errors").TryGetProperty("/correlations/1/between", out _));
    }
}
