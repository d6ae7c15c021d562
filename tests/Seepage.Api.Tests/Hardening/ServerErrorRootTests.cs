using System.Net;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;
using static Seepage.Api.Tests.Hardening.HostileSamples;

namespace Seepage.Api.Tests.Hardening;

/// <summary>The classes of server error a hostile-input probe found, each refused at its root: a figure that would become
/// infinite, a solver failure whose reply carried a NaN, damaged multipart bodies, duplicate JSON members, a repeated pointer
/// column in a study CSV and two cutoffs on the same line.</summary>
public class ServerErrorRootTests
{
    [Fact]
    public async Task Post_StructureLengthNearDoubleMax_400NamesStructureLength()
    {
        using var factory = new SeepageFactory();
        var section = WeirNode();
        section["structureLength"] = 1e308;
        var response = await factory.CreateClient().PostAsync("/api/v1/analyses", Json(section));
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Contains("/structureLength", await ErrorKeys(response));
    }

    [Fact]
    public async Task Study_OneAlternativeWithHugeStructureLength_ThatRowHasAProblemTheOthersRun()
    {
        using var factory = new SeepageFactory();
        var study = new JsonObject
        {
            ["base"] = WeirNode(),
            ["alternatives"] = new JsonArray(
                new JsonObject { ["name"] = "huge", ["changes"] = new JsonObject { ["/structureLength"] = 1e308 } },
                new JsonObject { ["name"] = "plain", ["changes"] = new JsonObject { ["/heads/0/total"] = 5.0 } }),
        };
        var response = await factory.CreateClient().PostAsync("/api/v1/studies", Json(study));
        string text = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == HttpStatusCode.Created, text);
        var root = JsonDocument.Parse(text).RootElement;
        Assert.Equal("done", root.GetProperty("status").GetString());
        var rows = root.GetProperty("rows").EnumerateArray().ToDictionary(r => r.GetProperty("name").GetString()!);
        Assert.True(rows["huge"].GetProperty("problems").TryGetProperty("/structureLength", out _), text);
        Assert.True(rows["plain"].GetProperty("valid").GetBoolean(), text);
    }

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public async Task Post_ContrastBeyondTheSolver_422WithFiniteFigures(bool designExample)
    {
        using var factory = new SeepageFactory();
        var section = designExample
            ? JsonNode.Parse(File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "design-example.section.json")))!
            : WeirNode();
        // The upper soil (where the heads are) all but impervious beside a gravel-like lower one: a contrast of 1e18 that
        // both lie in the accepted range, but that the solver cannot resolve (its residual overflowed on today's main).
        section["soils"]![0]!["kx"] = 1e-16;
        section["soils"]![0]!.AsObject().Remove("ky");
        section["soils"]![1]!["kx"] = 100.0;
        section["soils"]![1]!.AsObject().Remove("ky");
        var response = await factory.CreateClient().PostAsync("/api/v1/analyses", Json(section));
        string text = await response.Content.ReadAsStringAsync();
        Assert.DoesNotContain("NaN", text);
        Assert.DoesNotContain(":Infinity", text.Replace(" ", ""));
        Assert.True(response.StatusCode == HttpStatusCode.UnprocessableEntity, text);
        var problem = JsonDocument.Parse(text).RootElement;
        Assert.True(problem.TryGetProperty("iterations", out _), text);
        Assert.True(problem.TryGetProperty("tolerance", out _), text);
    }

    [Theory]
    [InlineData("--x\r\nContent-Disposition: form-data; name=\"file\"; filename=\"a.csv\"\r\n\r\nsection\r\n")] // truncated
    [InlineData("--x\r\nContent-Disposition: form-data; name=\"file\"; filename=\"a.csv\"\r\n")] // headers only
    [InlineData("garbage without any boundary")]
    [InlineData("--x--\r\n")] // closing boundary only
    [InlineData("--x\r\nContent-Disposition: form-data; name=\"file\"; filename=\"a.csv\"\r\nContent-Type: text/csv\r\n\r\n\r\n--y--")]
    public async Task Import_DamagedMultipart_400(string body)
    {
        using var factory = new SeepageFactory();
        var content = new ByteArrayContent(Encoding.UTF8.GetBytes(body));
        content.Headers.TryAddWithoutValidation("Content-Type", "multipart/form-data; boundary=x");
        var response = await factory.CreateClient().PostAsync("/api/v1/sections/import", content);
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType!.MediaType);
    }

    [Fact]
    public async Task Import_MultipartWithoutBoundary_400()
    {
        using var factory = new SeepageFactory();
        var content = new ByteArrayContent(Encoding.UTF8.GetBytes("section\r\n"));
        content.Headers.TryAddWithoutValidation("Content-Type", "multipart/form-data");
        var response = await factory.CreateClient().PostAsync("/api/v1/sections/import", content);
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
    }

    [Fact]
    public async Task Study_DuplicateMembersInBody_400WithPointer()
    {
        using var factory = new SeepageFactory();
        string body = "{\"base\":" + Weir + ",\"alternatives\":[{\"name\":\"a\",\"changes\":{\"/heads/0/total\":5,\"/heads/0/total\":4}}]}";
        var response = await factory.CreateClient().PostAsync("/api/v1/studies", Json(body));
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Contains(await ErrorKeys(response), k => k.StartsWith("/alternatives/0/changes", StringComparison.Ordinal));
    }

    [Fact]
    public async Task Study_DuplicateBaseMember_400WithPointer()
    {
        using var factory = new SeepageFactory();
        string body = "{\"base\":" + Weir + ",\"base\":{},\"alternatives\":[]}";
        var response = await factory.CreateClient().PostAsync("/api/v1/studies", Json(body));
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Contains("/base", await ErrorKeys(response));
    }

    [Fact]
    public async Task Post_SectionWithDuplicateMember_400WithPointer()
    {
        using var factory = new SeepageFactory();
        string body = Weir.Replace("\"kx\": 1e-4 }", "\"kx\": 1e-4, \"kx\": 1e-3 }");
        var response = await factory.CreateClient().PostAsync("/api/v1/analyses", Json(body));
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Contains(await ErrorKeys(response), k => k.StartsWith("/soils/0", StringComparison.Ordinal));
    }

    [Fact]
    public async Task Study_CsvRepeatedPointerColumn_400NamingBothCells()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var response = await client.PostAsync("/api/v1/studies?base=twin-pile-weir",
            Csv("name,/heads/0/total,/heads/0/total\r\na,6,5\r\n"));
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        var keys = await ErrorKeys(response);
        Assert.Contains(keys, k => k.Contains("column C", StringComparison.Ordinal));
        string text = (await Problem(response)).GetProperty("errors").ToString();
        Assert.Contains("column B", text);
    }

    [Fact]
    public async Task Validate_TwoIdenticalCutoffs_InvalidNamingBoth()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var section = WeirNode();
        section["cutoffs"]!.AsArray().Add(new JsonObject { ["name"] = "copy", ["top"] = new JsonArray(-10, 0), ["tip"] = new JsonArray(-10, -4) });
        var validate = await client.PostAsync("/api/v1/sections/validate", Json(section));
        string text = await validate.Content.ReadAsStringAsync();
        Assert.True(validate.StatusCode == HttpStatusCode.BadRequest, text);
        Assert.Contains("/cutoffs/2", await ErrorKeys(validate));
        Assert.Contains("/cutoffs/0", text);
        var analysis = await client.PostAsync("/api/v1/analyses", Json(section));
        Assert.Equal(HttpStatusCode.BadRequest, analysis.StatusCode);
        Assert.DoesNotContain("", await ErrorKeys(analysis));
    }

    [Fact]
    public async Task Validate_OverlappingCutoffs_InvalidNamingBoth()
    {
        using var factory = new SeepageFactory();
        var section = WeirNode();
        section["cutoffs"]!.AsArray().Add(new JsonObject { ["name"] = "inner", ["top"] = new JsonArray(-10, -1), ["tip"] = new JsonArray(-10, -6) });
        var validate = await factory.CreateClient().PostAsync("/api/v1/sections/validate", Json(section));
        string text = await validate.Content.ReadAsStringAsync();
        Assert.True(validate.StatusCode == HttpStatusCode.BadRequest, text);
        Assert.Contains("/cutoffs/2", await ErrorKeys(validate));
        Assert.Contains("/cutoffs/0", text);
    }
}
