using System.Net;
using System.Net.Http.Json;
using System.Text.Json;

namespace Seepage.Api.Tests;

public class ExampleEndpointTests
{
    [Trait("Category", "Slow")]
    [Fact]
    public async Task Examples_EachAnalyses_201()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var list = JsonDocument.Parse(await client.GetStringAsync("/api/v1/examples")).RootElement;
        Assert.True(list.GetArrayLength() >= 3);
        Assert.Contains(list.EnumerateArray(), e => e.GetProperty("isDefault").GetBoolean());
        foreach (var e in list.EnumerateArray())
        {
            string json = await client.GetStringAsync($"/api/v1/examples/{e.GetProperty("name").GetString()}");
            var post = await client.PostAsync("/api/v1/analyses", new StringContent(json, System.Text.Encoding.UTF8, "application/json"));
            Assert.True(post.StatusCode == HttpStatusCode.Created, await post.Content.ReadAsStringAsync());
        }
    }

    [Fact]
    public async Task Example_Unknown_404Problem()
    {
        using var factory = new SeepageFactory();
        var response = await factory.CreateClient().GetAsync("/api/v1/examples/none-such");
        Assert.Equal(HttpStatusCode.NotFound, response.StatusCode);
    }

    [Fact]
    public async Task OpenApi_ListsEveryEndpoint()
    {
        using var factory = new SeepageFactory();
        var doc = JsonDocument.Parse(await factory.CreateClient().GetStringAsync("/swagger/v1/swagger.json")).RootElement;
        var paths = doc.GetProperty("paths");
        foreach (string p in new[] { "/api/v1/analyses", "/api/v1/analyses/{id}", "/api/v1/analyses/{id}/field", "/api/v1/examples",
                     "/api/v1/examples/{name}", "/api/v1/sections/validate" })
            Assert.True(paths.TryGetProperty(p, out _), $"OpenAPI lacks {p}");
        var post = paths.GetProperty("/api/v1/analyses").GetProperty("post");
        Assert.True(post.GetProperty("responses").TryGetProperty("400", out _));
        Assert.True(post.GetProperty("requestBody").GetProperty("content").GetProperty("application/json").TryGetProperty("example", out _));
    }

    [Fact]
    public async Task Page_ServedAtRoot()
    {
        using var factory = new SeepageFactory();
        var response = await factory.CreateClient().GetAsync("/");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Contains("<html", await response.Content.ReadAsStringAsync(), StringComparison.OrdinalIgnoreCase);
    }
}
