using System.Net;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace Seepage.Api.Tests;

[Trait("Category", "Slow")] // unconfined iterations
public class UnconfinedEndpointTests
{
    private static StringContent Json(string body) => new(body, System.Text.Encoding.UTF8, "application/json");

    // The result and field documents carry the unconfined members under their fixed names.
    [Fact]
    public async Task PostAnalysis_Embankment_ResultAndFieldCarryPhreaticSurface()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        string section = await client.GetStringAsync("/api/v1/examples/levee-pervious-foundation");
        var post = await client.PostAsync("/api/v1/analyses", Json(section));
        string text = await post.Content.ReadAsStringAsync();
        Assert.True(post.StatusCode == HttpStatusCode.Created, text);
        var r = JsonDocument.Parse(text).RootElement;
        Assert.True(r.GetProperty("phreaticSurface")[0].GetProperty("points").GetArrayLength() > 2);
        var faces = r.GetProperty("seepageFaces");
        Assert.Equal(2, faces.GetArrayLength());
        foreach (string member in new[] { "name", "flow", "exitPoint", "wettedLength" }) Assert.True(faces[1].TryGetProperty(member, out _), member);
        var u = r.GetProperty("unconfined");
        Assert.True(u.GetProperty("iterations").GetInt32() > 1);
        Assert.StartsWith("Picard", u.GetProperty("method").GetString());
        Assert.True(u.TryGetProperty("change", out _));
        Assert.Contains(r.GetProperty("flow").GetProperty("boundaries").EnumerateArray(), b => b.GetProperty("kind").GetString() == "seepage face");
        string id = r.GetProperty("id").GetString()!;
        var field = JsonDocument.Parse(await client.GetStringAsync($"/api/v1/analyses/{id}/field")).RootElement.GetProperty("unconfined");
        Assert.True(field.GetProperty("pressureHeads").GetArrayLength() > 0);
        Assert.Contains(field.GetProperty("relativeConductivity").EnumerateArray(), v => v.GetDouble() < 0.5);
    }

    // The memo shows the phreatic surface, what leaves through each drain and seepage face, and the hand methods.
    [Trait("Category", "Slow")] // unconfined iteration and memo
    [Fact]
    public async Task Report_Embankment_ShowsPhreaticSurfaceFlowsAndHandMethods()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var post = await client.PostAsync("/api/v1/analyses", Json(await client.GetStringAsync("/api/v1/examples/embankment-toe-drain")));
        string id = JsonDocument.Parse(await post.Content.ReadAsStringAsync()).RootElement.GetProperty("id").GetString()!;
        string html = await client.GetStringAsync($"/api/v1/analyses/{id}/report");
        foreach (string text in new[] { "phreatic surface", "Water leaving the soil", "toe drain", "Hand methods beside the FE", "Kozeny 1931" })
            Assert.Contains(text, html);
    }

    // A seepage face in a confined section is refused with its pointer (no silent meaning given to it).
    [Fact]
    public async Task Validate_SeepageFaceWithoutUnconfined_400()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var doc = JsonNode.Parse(await client.GetStringAsync("/api/v1/examples/embankment-toe-drain"))!.AsObject();
        doc["unconfined"] = false;
        var response = await client.PostAsync("/api/v1/analyses", Json(doc.ToJsonString()));
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Contains("/seepageFaces", await response.Content.ReadAsStringAsync());
    }
}
