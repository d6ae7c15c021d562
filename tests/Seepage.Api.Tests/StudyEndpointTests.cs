using System.Net;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace Seepage.Api.Tests;

/// <summary>Study endpoints: input problems and the handling of alternatives that cannot be analysed.</summary>
public class StudyEndpointTests
{
    private static async Task<JsonElement> ReadJson(HttpResponseMessage response) =>
        JsonDocument.Parse(await response.Content.ReadAsStringAsync()).RootElement;

    private static StringContent Json(JsonNode node) => new(node.ToJsonString(), Encoding.UTF8, "application/json");

    private static async Task<JsonNode> Example(HttpClient client) => JsonNode.Parse(await client.GetStringAsync("/api/v1/examples/twin-pile-weir"))!;

    [Fact]
    public async Task Post_InvalidBase_400KeyedUnderBase()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var section = await Example(client);
        section["soils"]![0]!["kx"] = -1;
        var post = await client.PostAsync("/api/v1/studies", Json(new JsonObject
        {
            ["base"] = section, ["alternatives"] = new JsonArray(new JsonObject { ["name"] = "a", ["changes"] = new JsonObject() }),
        }));
        Assert.Equal(HttpStatusCode.BadRequest, post.StatusCode);
        Assert.True((await ReadJson(post)).GetProperty("errors").TryGetProperty("/base/soils/0/kx", out _));
    }

    [Fact]
    public async Task Post_CsvWithoutBase_400()
    {
        using var factory = new SeepageFactory();
        var post = await factory.CreateClient().PostAsync("/api/v1/studies", new StringContent("name,/heads/0/total\r\na,7\r\n", Encoding.UTF8, "text/csv"));
        Assert.Equal(HttpStatusCode.BadRequest, post.StatusCode);
        Assert.True((await ReadJson(post)).GetProperty("errors").TryGetProperty("base", out _));
    }

    [Fact]
    public async Task Post_AlternativesThatCannotBeAnalysed_RowsReportProblemsAndStudyIsStored()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var csv = "name,/soils/0/kx,/cutoffs/9/tip/1\r\nnegative,-1,\r\nmissing pile,,-8\r\n";
        var post = await client.PostAsync("/api/v1/studies?base=twin-pile-weir", new StringContent(csv, Encoding.UTF8, "text/csv"));
        Assert.Equal(HttpStatusCode.Created, post.StatusCode);
        var study = await ReadJson(post);
        Assert.Equal("done", study.GetProperty("status").GetString());
        var rows = study.GetProperty("rows");
        Assert.Equal(2, rows.GetArrayLength());
        Assert.False(rows[0].GetProperty("valid").GetBoolean());
        Assert.True(rows[0].GetProperty("problems").TryGetProperty("/soils/0/kx", out _));
        Assert.True(rows[1].GetProperty("problems").TryGetProperty("/cutoffs/9/tip/1", out _));

        var get = await client.GetAsync($"/api/v1/studies/{study.GetProperty("id").GetString()}?format=csv");
        Assert.Equal("text/csv", get.Content.Headers.ContentType?.MediaType);
        var lines = (await get.Content.ReadAsStringAsync()).Split("\r\n", StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(3, lines.Length);
        Assert.StartsWith("name,/soils/0/kx,/cutoffs/9/tip/1,flow (m³/s per m)", lines[0]);
    }

    [Fact]
    public async Task Post_Background_202ThenDone()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var post = await client.PostAsync("/api/v1/studies?base=twin-pile-weir&background=true",
            new StringContent("name,/soils/0/kx\r\na,-1\r\nb,-2\r\nc,-3\r\n", Encoding.UTF8, "text/csv"));
        Assert.Equal(HttpStatusCode.Accepted, post.StatusCode);
        var location = post.Headers.Location!.OriginalString;
        JsonElement study = default;
        for (int i = 0; i < 100; i++)
        {
            study = await ReadJson(await client.GetAsync(location));
            if (study.GetProperty("status").GetString() != "running") break;
            await Task.Delay(100);
        }
        Assert.Equal("done", study.GetProperty("status").GetString());
        Assert.Equal(3, study.GetProperty("done").GetInt32());
        Assert.Equal(3, study.GetProperty("total").GetInt32());
    }

    [Fact]
    public async Task Get_UnknownStudy_404ProblemDetails()
    {
        using var factory = new SeepageFactory();
        var get = await factory.CreateClient().GetAsync("/api/v1/studies/nope");
        Assert.Equal(HttpStatusCode.NotFound, get.StatusCode);
        Assert.Equal("application/problem+json", get.Content.Headers.ContentType?.MediaType);
    }
}
