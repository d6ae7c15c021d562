using System.Net;
using System.Net.Http.Json;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace Seepage.Api.Tests;

public class AnalysisEndpointTests
{
    private static StringContent Json(string json) => new(json, Encoding.UTF8, "application/json");

    private static string DesignExample() => File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "design-example.section.json"));

    private static async Task<JsonElement> ReadJson(HttpResponseMessage response) =>
        JsonDocument.Parse(await response.Content.ReadAsStringAsync()).RootElement;

    [Fact]
    public async Task Post_DesignExample_CreatesAndRoundTrips()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var post = await client.PostAsync("/api/v1/analyses", Json(DesignExample()));
        Assert.Equal(HttpStatusCode.Created, post.StatusCode);
        var created = await ReadJson(post);
        string id = created.GetProperty("id").GetString()!;
        Assert.Equal($"/api/v1/analyses/{id}", post.Headers.Location!.OriginalString);
        double q = created.GetProperty("flow").GetProperty("perMetre").GetDouble();
        Assert.True(q > 0);
        Assert.Contains("licensed geotechnical engineer", created.GetProperty("caution").GetString());

        var get = await client.GetAsync($"/api/v1/analyses/{id}");
        Assert.Equal(HttpStatusCode.OK, get.StatusCode);
        Assert.Equal(q, (await ReadJson(get)).GetProperty("flow").GetProperty("perMetre").GetDouble());

        var field = await ReadJson(await client.GetAsync($"/api/v1/analyses/{id}/field"));
        Assert.Equal(created.GetProperty("mesh").GetProperty("nodes").GetInt32(), field.GetProperty("nodes").GetArrayLength());
        Assert.True(field.GetProperty("equipotentials").GetArrayLength() > 0);
        Assert.True(field.GetProperty("flowLines").GetArrayLength() > 0);
        int triangles = field.GetProperty("triangles").GetArrayLength();
        Assert.Equal(triangles, field.GetProperty("gradients").GetArrayLength());
        Assert.Equal(triangles, field.GetProperty("velocities").GetArrayLength());
    }

    [Trait("Category", "Slow")] // two server starts
    [Fact]
    public async Task Get_AfterRestartOnSameDatabase_StillThere()
    {
        string id, path = Path.Combine(Path.GetTempPath(), $"seepage-test-{Guid.NewGuid():N}.db");
        try
        {
            using (var first = new SeepageFactory(path))
            {
                var post = await first.CreateClient().PostAsync("/api/v1/analyses", Json(DesignExample()));
                id = (await ReadJson(post)).GetProperty("id").GetString()!;
            }
            using var second = new SeepageFactory(path);
            var get = await second.CreateClient().GetAsync($"/api/v1/analyses/{id}");
            Assert.Equal(HttpStatusCode.OK, get.StatusCode);
        }
        finally { SeepageFactory.DeleteDatabase(path); }
    }

    [Fact]
    public async Task Get_UnknownId_ProblemDetails404()
    {
        using var factory = new SeepageFactory();
        var response = await factory.CreateClient().GetAsync("/api/v1/analyses/nope");
        Assert.Equal(HttpStatusCode.NotFound, response.StatusCode);
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType!.MediaType);
    }

    [Theory]
    [InlineData("{ \"soils\": [", "/soils/0")]                                // malformed JSON: where the reader stopped
    [InlineData("{ \"soils\": [ { \"id\": \"a\", \"kx\": \"fast\" } ] }", "/soils/0/kx")] // wrong type
    [InlineData("", "")]                                                      // empty body
    public async Task Post_UnreadableBody_400WithPointer(string body, string pointer)
    {
        using var factory = new SeepageFactory();
        var response = await factory.CreateClient().PostAsync("/api/v1/analyses", Json(body));
        await AssertProblemAt(response, pointer);
    }

    [Theory]
    [InlineData("/soils/0/kx", "/soils/0/kx", -1.0)]
    [InlineData("/zones/1/soil", "/zones/1/soil", "granite")]
    [InlineData("/heads/0/along", "/heads/0/along", "offBoundary")]
    [InlineData("/cutoffs/0/tip", "/cutoffs/0/tip", "closesPath")]
    [InlineData("/cutoffs/0/kx", "/cutoffs/0/kx", "wallWithoutK")]
    public async Task Post_InvalidSection_400NamingTheField(string _, string pointer, object change)
    {
        var doc = JsonNode.Parse(DesignExample())!;
        switch (pointer)
        {
            case "/soils/0/kx": doc["soils"]![0]!["kx"] = (double)change; break;
            case "/zones/1/soil": doc["zones"]![1]!["soil"] = (string)change; break;
            case "/heads/0/along": doc["heads"]![0]!["along"] = JsonNode.Parse("[[-80,-3],[-12,-3]]"); break;
            case "/cutoffs/0/tip": doc["cutoffs"]![0]!["tip"] = JsonNode.Parse("[-12,-25]"); break;
            case "/cutoffs/0/kx": doc["cutoffs"]![0]!["thickness"] = 0.6; break;
        }
        using var factory = new SeepageFactory();
        var response = await factory.CreateClient().PostAsync("/api/v1/analyses", Json(doc.ToJsonString()));
        await AssertProblemAt(response, pointer);
    }

    // A cutoff with a thickness and kx is a permeable wall: accepted, meshed as a zone of its own, and it lets
    // water through, so the flow exceeds that of the same section with an impervious cutoff.
    [Trait("Category", "Slow")] // two analyses of a fine wall mesh
    [Fact]
    public async Task Post_PermeableWall_201AndMoreFlowThanImpervious()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var doc = JsonNode.Parse(DesignExample())!;
        var impervious = await ReadJson(await client.PostAsync("/api/v1/analyses", Json(doc.ToJsonString())));
        doc["cutoffs"]![0]!["thickness"] = 0.6;
        doc["cutoffs"]![0]!["kx"] = 1e-6;
        var post = await client.PostAsync("/api/v1/analyses", Json(doc.ToJsonString()));
        Assert.Equal(HttpStatusCode.Created, post.StatusCode);
        var wall = await ReadJson(post);
        double qWall = wall.GetProperty("flow").GetProperty("perMetre").GetDouble();
        double qImpervious = impervious.GetProperty("flow").GetProperty("perMetre").GetDouble();
        Assert.True(qWall > qImpervious, $"wall {qWall}, impervious {qImpervious}");
        Assert.True(Math.Abs(wall.GetProperty("flow").GetProperty("balance").GetDouble()) < 1e-6);
        // The field names the soil of every zone index its triangles use, the wall's own soil last.
        var field = await ReadJson(await client.GetAsync($"/api/v1/analyses/{wall.GetProperty("id").GetString()}/field"));
        var zoneSoils = field.GetProperty("zoneSoils").EnumerateArray().Select(z => z.GetString()).ToList();
        Assert.Equal("upstream pile (wall)", zoneSoils[^1]);
        Assert.All(field.GetProperty("zones").EnumerateArray(), z => Assert.InRange(z.GetInt32(), 0, zoneSoils.Count - 1));
        Assert.Contains(field.GetProperty("zones").EnumerateArray(), z => z.GetInt32() == zoneSoils.Count - 1);
    }

    [Fact]
    public async Task Post_OversizeBody_413()
    {
        using var factory = new SeepageFactory();
        string big = "{\"title\":\"" + new string('x', 5 * 1024 * 1024) + "\"}";
        var response = await factory.CreateClient().PostAsync("/api/v1/analyses", Json(big));
        Assert.Equal(HttpStatusCode.RequestEntityTooLarge, response.StatusCode);
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType!.MediaType);
    }

    [Fact]
    public async Task Validate_DesignExample_200()
    {
        using var factory = new SeepageFactory();
        var response = await factory.CreateClient().PostAsync("/api/v1/sections/validate", Json(DesignExample()));
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.True((await ReadJson(response)).GetProperty("valid").GetBoolean());
    }

    private static async Task AssertProblemAt(HttpResponseMessage response, string pointer)
    {
        string text = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == HttpStatusCode.BadRequest, $"{response.StatusCode}: {text}");
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType!.MediaType);
        var errors = JsonDocument.Parse(text).RootElement.GetProperty("errors");
        Assert.True(errors.TryGetProperty(pointer, out _), $"no error under '{pointer}': {text}");
    }
}
