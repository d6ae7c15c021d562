using System.Net;
using System.Net.Http.Headers;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;
using Seepage.Core.Sections;

namespace Seepage.Api.Tests;

public class ImportEndpointTests
{
    private const string Xlsx = "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet";

    private static async Task<JsonNode> Example(HttpClient client) =>
        JsonNode.Parse(await client.GetStringAsync("/api/v1/examples/twin-pile-weir"))!;

    private static ByteArrayContent Body(byte[] bytes, string type)
    {
        var content = new ByteArrayContent(bytes);
        content.Headers.ContentType = new MediaTypeHeaderValue(type);
        return content;
    }

    private static async Task<JsonElement> Errors(HttpResponseMessage response)
    {
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
        return JsonDocument.Parse(await response.Content.ReadAsStringAsync()).RootElement.GetProperty("errors");
    }

    [Fact]
    public async Task Import_TemplateCsv_GivesTheExampleSection()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var template = await client.GetAsync("/api/v1/sections/template.csv");
        Assert.Equal("text/csv", template.Content.Headers.ContentType?.MediaType);
        var csv = await template.Content.ReadAsByteArrayAsync();
        var post = await client.PostAsync("/api/v1/sections/import", Body(csv, "text/csv"));
        Assert.Equal(HttpStatusCode.OK, post.StatusCode);
        Assert.True(Same(await Example(client), await post.Content.ReadAsStringAsync()));
    }

    [Fact]
    public async Task Import_TemplateXlsxBodyAndMultipart_GiveTheExampleSection()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var template = await client.GetAsync("/api/v1/sections/template.xlsx");
        Assert.Equal(Xlsx, template.Content.Headers.ContentType?.MediaType);
        var bytes = await template.Content.ReadAsByteArrayAsync();
        var example = await Example(client);

        var body = await client.PostAsync("/api/v1/sections/import", Body(bytes, Xlsx));
        Assert.Equal(HttpStatusCode.OK, body.StatusCode);
        Assert.True(Same(example, await body.Content.ReadAsStringAsync()));

        using var form = new MultipartFormDataContent { { Body(bytes, "application/octet-stream"), "file", "my-weir.xlsx" } };
        var upload = await client.PostAsync("/api/v1/sections/import", form);
        Assert.Equal(HttpStatusCode.OK, upload.StatusCode);
        Assert.True(Same(example, await upload.Content.ReadAsStringAsync()));
    }

    [Fact]
    public async Task Import_UnreadableCell_400KeyedBySheetRowColumn()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var lines = (await client.GetStringAsync("/api/v1/sections/template.csv")).Split("\r\n");
        int row = Array.FindIndex(lines, l => l.StartsWith("downstream pile,")) + 1;
        lines[row - 1] = "downstream pile,14,0,14,deep,,";
        var errors = await Errors(await client.PostAsync("/api/v1/sections/import",
            new StringContent(string.Join("\r\n", lines), Encoding.UTF8, "text/csv")));
        Assert.True(errors.TryGetProperty($"sheet 'csv' row {row} column E", out var messages), errors.ToString());
        Assert.Contains("'deep' is not a number", messages[0].GetString());
    }

    [Fact]
    public async Task Import_InvalidValue_400KeyedByTheCellItCameFrom()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var lines = (await client.GetStringAsync("/api/v1/sections/template.csv")).Split("\r\n");
        int row = Array.FindIndex(lines, l => l.StartsWith("silt,")) + 1;
        lines[row - 1] = "silt,0,,,2.7,0.85,,very-fine-sand-or-silt";
        var errors = await Errors(await client.PostAsync("/api/v1/sections/import",
            new StringContent(string.Join("\r\n", lines), Encoding.UTF8, "text/csv")));
        Assert.True(errors.TryGetProperty($"sheet 'csv' row {row} column B", out _), errors.ToString());
    }

    [Fact]
    public async Task Import_NotAWorkbook_400ProblemDetails()
    {
        using var factory = new SeepageFactory();
        var post = await factory.CreateClient().PostAsync("/api/v1/sections/import", Body("not a zip"u8.ToArray(), Xlsx));
        Assert.Equal(HttpStatusCode.BadRequest, post.StatusCode);
        Assert.Equal("application/problem+json", post.Content.Headers.ContentType?.MediaType);
    }

    [Fact]
    public async Task Import_UnsupportedType_415ProblemDetails()
    {
        using var factory = new SeepageFactory();
        var post = await factory.CreateClient().PostAsync("/api/v1/sections/import", Body("{}"u8.ToArray(), "application/json"));
        Assert.Equal(HttpStatusCode.UnsupportedMediaType, post.StatusCode);
        Assert.Equal("application/problem+json", post.Content.Headers.ContentType?.MediaType);
    }

    // Compare as documents: both go through the contract type, so absent members and nulls read alike.
    private static bool Same(JsonNode expected, string actual) => JsonNode.DeepEquals(
        JsonNode.Parse(SectionParser.Write(SectionParser.Parse(expected.ToJsonString(), out _)!)),
        JsonNode.Parse(SectionParser.Write(SectionParser.Parse(actual, out _)!)));
}
