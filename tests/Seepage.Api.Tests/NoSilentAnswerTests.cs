using System.Net;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace Seepage.Api.Tests;

/// <summary>Issue 11 over HTTP: input the service does not understand is refused with problem details naming the member
/// (RFC 9457), and every result says what it assumed, which checks its verdict covers and which did not run.</summary>
public class NoSilentAnswerTests
{
    private static StringContent Json(JsonNode node) => new(node.ToJsonString(), Encoding.UTF8, "application/json");

    private static async Task<JsonNode> Example(HttpClient client) => JsonNode.Parse(await client.GetStringAsync("/api/v1/examples/twin-pile-weir"))!;

    private static async Task<(JsonElement Errors, string Text)> Problems(HttpResponseMessage response)
    {
        string text = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == HttpStatusCode.BadRequest, $"{(int)response.StatusCode}: {text}");
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
        return (JsonDocument.Parse(text).RootElement.GetProperty("errors"), text);
    }

    [Theory]
    [InlineData("/api/v1/analyses")]
    [InlineData("/api/v1/sections/validate")]
    public async Task Post_MisspeltNestedMember_400AtItsPointerWithSuggestion(string endpoint)
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var section = await Example(client);
        section["exitCheck"]!.AsObject().Remove("requiredFactor");
        section["exitCheck"]!["requiredfactor"] = 10;
        var (errors, _) = await Problems(await client.PostAsync(endpoint, Json(section)));
        Assert.Contains("did you mean `requiredFactor`?", errors.GetProperty("/exitCheck/requiredfactor")[0].GetString(),
            StringComparison.OrdinalIgnoreCase);
    }

    [Fact]
    public async Task Post_NumberWithUnitText_400WithoutInternalTypeNames()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var section = await Example(client);
        section["soils"]![0]!["kx"] = "2e-4 m/s";
        var (errors, text) = await Problems(await client.PostAsync("/api/v1/analyses", Json(section)));
        Assert.Contains("found the text", errors.GetProperty("/soils/0/kx")[0].GetString());
        Assert.DoesNotContain("System.", text);
    }

    [Fact]
    public async Task PostStudy_ChangeToMemberNotInTheContract_400NamingIt()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var post = await client.PostAsync("/api/v1/studies", Json(new JsonObject
        {
            ["base"] = await Example(client),
            ["alternatives"] = new JsonArray(new JsonObject
            {
                ["name"] = "stricter", ["changes"] = new JsonObject { ["/exitCheck/requiredfactor"] = 4 },
            }),
        }));
        var (errors, _) = await Problems(post);
        Assert.Contains("`requiredFactor`", errors.GetProperty("/alternatives/0/changes/~1exitCheck~1requiredfactor")[0].GetString());

        var csv = await client.PostAsync("/api/v1/studies?base=twin-pile-weir",
            new StringContent("name,/heads/0/totl\r\na,7\r\n", Encoding.UTF8, "text/csv"));
        var (csvErrors, _) = await Problems(csv);
        Assert.Contains("`total`", csvErrors.GetProperty("sheet 'csv' row 1 column B")[0].GetString());
    }

    [Fact]
    public async Task PostImport_UnitInHeader_Converted()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        string template = await client.GetStringAsync("/api/v1/sections/template.csv");
        Assert.Contains("kx (m/s)", template);
        var response = await client.PostAsync("/api/v1/sections/import",
            new StringContent(template.Replace("kx (m/s)", "kx (cm/s)"), Encoding.UTF8, "text/csv"));
        string text = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == HttpStatusCode.OK, text);
        var original = await Example(client);
        Assert.Equal(original["soils"]![0]!["kx"]!.GetValue<double>() * 0.01, JsonNode.Parse(text)!["soils"]![0]!["kx"]!.GetValue<double>(), 15);
    }

    [Fact]
    public async Task PostAnalysis_Result_EchoesTheSectionAsAnalysedAndTheChecksItsVerdictCovers()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var response = await client.PostAsync("/api/v1/analyses", Json(await Example(client)));
        Assert.Equal(HttpStatusCode.Created, response.StatusCode);
        var r = JsonDocument.Parse(await response.Content.ReadAsStringAsync()).RootElement;
        Assert.Equal(["exit", "heave", "lane", "bligh"], r.GetProperty("passCovers").EnumerateArray().Select(x => x.GetString()));
        var checks = r.GetProperty("checks").EnumerateArray().ToDictionary(c => c.GetProperty("check").GetString()!);
        Assert.Contains("mesh.convergenceCheck", checks["convergence"].GetProperty("skipped").GetString());
        var analysed = r.GetProperty("analysedSection");
        Assert.Equal("m", analysed.GetProperty("lengthUnit").GetString());
        Assert.True(analysed.GetProperty("mesh").GetProperty("minAngle").GetDouble() > 0);
        var assumptions = r.GetProperty("assumptions").EnumerateArray().ToDictionary(a => a.GetProperty("member").GetString()!);
        Assert.Equal("default", assumptions["/mesh/order"].GetProperty("origin").GetString());

        var memo = await client.GetStringAsync($"/api/v1/analyses/{r.GetProperty("id").GetString()}/report");
        Assert.Contains("Values used by the analysis (given or default)", memo);
        Assert.Contains("/mesh/order", memo);
        Assert.Contains("Checks not run or without a verdict", memo);
    }

    [Fact]
    public async Task SwaggerJson_EnumeratedMembersListTheirNames()
    {
        using var factory = new SeepageFactory();
        var schemas = JsonDocument.Parse(await factory.CreateClient().GetStringAsync("/swagger/v1/swagger.json")).RootElement
            .GetProperty("components").GetProperty("schemas");
        var units = schemas.GetProperty("SectionDocument").GetProperty("properties").GetProperty("conductivityUnit").GetProperty("enum");
        Assert.Contains("ft/min", units.EnumerateArray().Select(x => x.GetString()));
        var classes = schemas.GetProperty("SoilDocument").GetProperty("properties").GetProperty("creepClass").GetProperty("enum");
        Assert.Contains("fine-sand", classes.EnumerateArray().Select(x => x.GetString()));
    }
}
