using System.Net;
using System.Text;
using System.Text.Json;
using Xunit.Abstractions;

namespace Seepage.Api.Tests.Storage;

/// <summary>Listing, renaming and deleting stored analyses and studies over HTTP; the size an analysis adds to the database.</summary>
public sealed class StoredWorkEndpointTests(ITestOutputHelper output)
{
    private static StringContent Json(string json) => new(json, Encoding.UTF8, "application/json");

    private static string DesignExample() => File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "design-example.section.json"));

    private static async Task<JsonElement> ReadJson(HttpResponseMessage response) =>
        JsonDocument.Parse(await response.Content.ReadAsStringAsync()).RootElement;

    // The database file's size once the write-ahead log is checkpointed into it.
    private static long FileSize(string path)
    {
        using (var connection = new Microsoft.Data.Sqlite.SqliteConnection($"Data Source={path};Pooling=False"))
        {
            connection.Open();
            using var command = connection.CreateCommand();
            command.CommandText = "PRAGMA wal_checkpoint(TRUNCATE)";
            command.ExecuteNonQuery();
        }
        return new FileInfo(path).Length;
    }

    [Trait("Category", "Slow")] // design example stored and measured
    [Fact]
    public async Task DesignExample_ListRenameDelete_AndDatabaseGrowthUnder225kB()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        await client.GetAsync("/api/v1/analyses");                  // schema made
        var first = await ReadJson(await client.PostAsync("/api/v1/analyses", Json(DesignExample())));
        string fieldBefore = await client.GetStringAsync($"/api/v1/analyses/{first.GetProperty("id").GetString()}/field");
        long before = FileSize(factory.DatabasePath);
        var post = await client.PostAsync("/api/v1/analyses", Json(DesignExample()));
        int resultBytes = (await post.Content.ReadAsByteArrayAsync()).Length;
        var second = await ReadJson(post);
        long growth = FileSize(factory.DatabasePath) - before;
        output.WriteLine($"database growth of one design-example analysis: {growth / 1024.0:F0} kB (field JSON {fieldBefore.Length / 1024.0:F0} kB, result document {resultBytes / 1024.0:F0} kB)");
        // Measured 208 kB (field 192 kB, compressed result 6 kB, section, whole 4 kB pages); the JSON form took about 1.6 MB.
        Assert.True(growth < 225 * 1024, $"one analysis added {growth} bytes");
        string id = second.GetProperty("id").GetString()!;
        string field = await client.GetStringAsync($"/api/v1/analyses/{id}/field");
        Assert.Equal(fieldBefore.Replace(first.GetProperty("id").GetString()!, id), field);

        var list = await ReadJson(await client.GetAsync("/api/v1/analyses?page=1&pageSize=1&title=ALDER"));
        Assert.Equal(2, list.GetProperty("total").GetInt32());
        var item = list.GetProperty("items")[0];
        Assert.Equal(id, item.GetProperty("id").GetString());            // newest first
        Assert.Equal(second.GetProperty("flow").GetProperty("perMetre").GetDouble(),
            item.GetProperty("figures").GetProperty("flow").GetDouble());
        Assert.Equal(0, (await ReadJson(await client.GetAsync("/api/v1/analyses?title=nothing-like-it"))).GetProperty("total").GetInt32());

        var renamed = await client.PatchAsync($"/api/v1/analyses/{id}", Json("""{ "title": "Option B, revised" }"""));
        Assert.Equal(HttpStatusCode.OK, renamed.StatusCode);
        Assert.Equal("Option B, revised", (await ReadJson(await client.GetAsync($"/api/v1/analyses/{id}"))).GetProperty("title").GetString());
        Assert.Equal(id, (await ReadJson(await client.GetAsync("/api/v1/analyses?title=revised"))).GetProperty("items")[0]
            .GetProperty("id").GetString());

        Assert.Equal(HttpStatusCode.NoContent, (await client.DeleteAsync($"/api/v1/analyses/{id}")).StatusCode);
        Assert.Equal(HttpStatusCode.NotFound, (await client.GetAsync($"/api/v1/analyses/{id}/field")).StatusCode);
        Assert.Equal(HttpStatusCode.NotFound, (await client.DeleteAsync($"/api/v1/analyses/{id}")).StatusCode);
        Assert.Equal(1, (await ReadJson(await client.GetAsync("/api/v1/analyses"))).GetProperty("total").GetInt32());
    }

    [Theory]
    [InlineData("/api/v1/analyses?page=0", "page")]
    [InlineData("/api/v1/analyses?page=abc", "page")]
    [InlineData("/api/v1/analyses?pageSize=101", "pageSize")]
    [InlineData("/api/v1/studies?pageSize=-1", "pageSize")]
    [InlineData("/api/v1/studies?page=1e3", "page")]
    public async Task List_BadQueryValue_400NamingIt(string url, string member)
    {
        using var factory = new SeepageFactory();
        var response = await factory.CreateClient().GetAsync(url);
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
        Assert.True((await ReadJson(response)).GetProperty("errors").TryGetProperty(member, out _));
    }

    [Theory]
    [InlineData("""{ "title": "" }""", "/title")]
    [InlineData("""{ "title": 5 }""", "/title")]
    [InlineData("""{ "title": "a\u001b[31mb" }""", "/title")]
    [InlineData("""{ "title": "ok", "colour": "red" }""", "/colour")]
    [InlineData("""[1]""", "")]
    [InlineData("""{ "title": """, "")]
    public async Task Rename_BadBody_400NamingTheMember(string body, string pointer)
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        foreach (string kind in new[] { "analyses", "studies" })
        {
            var response = await client.PatchAsync($"/api/v1/{kind}/nope", Json(body));
            Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
            Assert.True((await ReadJson(response)).GetProperty("errors").TryGetProperty(pointer, out _), kind + " " + body);
        }
    }

    [Fact]
    public async Task Study_ListRenameDelete()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        string body = $$"""{ "base": {{DesignExample()}}, "alternatives": [ { "name": "high", "changes": { "/heads/0/total": 7.0 } } ] }""";
        var study = await ReadJson(await client.PostAsync("/api/v1/studies", Json(body)));
        string id = study.GetProperty("id").GetString()!;
        var list = await ReadJson(await client.GetAsync("/api/v1/studies"));
        var item = list.GetProperty("items")[0];
        Assert.Equal(id, item.GetProperty("id").GetString());
        Assert.Equal("done", item.GetProperty("status").GetString());
        Assert.Equal(1, item.GetProperty("done").GetInt32());
        Assert.Equal(1, item.GetProperty("total").GetInt32());
        var renamed = await ReadJson(await client.PatchAsync($"/api/v1/studies/{id}", Json("""{ "title": "Heads" }""")));
        Assert.Equal("Heads", renamed.GetProperty("title").GetString());
        Assert.Single(renamed.GetProperty("rows").EnumerateArray());
        Assert.Equal(HttpStatusCode.NotFound, (await client.PatchAsync("/api/v1/studies/nope", Json("""{ "title": "x" }"""))).StatusCode);
        Assert.Equal(HttpStatusCode.NoContent, (await client.DeleteAsync($"/api/v1/studies/{id}")).StatusCode);
        Assert.Equal(HttpStatusCode.NotFound, (await client.GetAsync($"/api/v1/studies/{id}")).StatusCode);
        string analysisId = study.GetProperty("rows")[0].GetProperty("analysisId").GetString()!;
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync($"/api/v1/analyses/{analysisId}")).StatusCode);
    }
}
