using System.Text.Json;

namespace Seepage.Api.Tests;

/// <summary>Walks the served OpenAPI document as a client generator would read it: every operation answers with
/// described content types and schemas, every parameter is described or enumerated, every object schema of the
/// contracts has a required list, and nullability follows the contract (OpenAPI Specification 3.0.4, 2024).</summary>
public class OpenApiDocumentTests
{
    private static async Task<JsonElement> Document()
    {
        using var factory = new SeepageFactory();
        string json = await factory.CreateClient().GetStringAsync("/swagger/v1/swagger.json");
        return JsonDocument.Parse(json).RootElement.Clone();
    }

    private static IEnumerable<(string Path, string Method, JsonElement Operation)> Operations(JsonElement doc) =>
        doc.GetProperty("paths").EnumerateObject().SelectMany(p =>
            p.Value.EnumerateObject().Select(m => (p.Name, m.Name, m.Value)));

    [Fact]
    public async Task Document_EveryOperation_HasResponsesWithContentTypesAndSchemas()
    {
        var doc = await Document();
        var faults = new List<string>();
        int operations = 0;
        foreach (var (path, method, operation) in Operations(doc))
        {
            operations++;
            string at = $"{method.ToUpperInvariant()} {path}";
            if (!operation.TryGetProperty("operationId", out _)) faults.Add($"{at}: no operationId");
            var responses = operation.GetProperty("responses").EnumerateObject().ToList();
            if (!responses.Any(r => r.Name.StartsWith('2'))) faults.Add($"{at}: no success response");
            foreach (var response in responses)
            {
                if (response.Name == "204") continue; // no content by definition (RFC 9110, 15.3.5)
                if (!response.Value.TryGetProperty("content", out var content) || !content.EnumerateObject().Any())
                {
                    faults.Add($"{at} {response.Name}: no content type");
                    continue;
                }
                foreach (var media in content.EnumerateObject())
                    if (!media.Value.TryGetProperty("schema", out var schema) || !schema.EnumerateObject().Any())
                        faults.Add($"{at} {response.Name} {media.Name}: no schema");
                if (response.Name[0] is '4' or '5' && !content.TryGetProperty("application/problem+json", out _))
                    faults.Add($"{at} {response.Name}: an error answer that is not problem details");
            }
            foreach (var parameter in operation.TryGetProperty("parameters", out var ps) ? ps.EnumerateArray() : default)
            {
                bool described = parameter.TryGetProperty("description", out var d) && d.GetString()!.Length > 10;
                bool enumerated = parameter.GetProperty("schema").TryGetProperty("enum", out _);
                if (!described && !enumerated) faults.Add($"{at}: parameter '{parameter.GetProperty("name")}' undescribed");
            }
        }
        Assert.True(operations >= 17, $"only {operations} operations");
        Assert.True(faults.Count == 0, string.Join("\n", faults));
    }

    [Fact]
    public async Task Document_QueryChoices_AreEnumeratedWithDefaults()
    {
        var paths = (await Document()).GetProperty("paths");
        void Check(string path, string method, string name, string[] values)
        {
            var parameter = paths.GetProperty(path).GetProperty(method).GetProperty("parameters").EnumerateArray()
                .Single(p => p.GetProperty("name").GetString() == name);
            var schema = parameter.GetProperty("schema");
            Assert.Equal(values, schema.GetProperty("enum").EnumerateArray().Select(v => v.GetString()));
            Assert.Equal(values[0], schema.GetProperty("default").GetString());
        }
        Check("/api/v1/analyses/{id}/report", "get", "format", ["html", "pdf"]);
        Check("/api/v1/studies/{id}/report", "get", "figure", ["flow", "upliftForce", "exitGradient", "exitFactor"]);
        Check("/api/v1/studies/{id}", "get", "format", ["json", "csv"]);
        Check("/api/v1/studies", "post", "background", ["false", "true"]);
        Check("/api/v1/sections/system", "post", "part", ["matrix", "rhs"]);
    }

    [Fact]
    public async Task Document_StudyAndReportResponses_ListEveryContentType()
    {
        var paths = (await Document()).GetProperty("paths");
        JsonElement Content(string path, string code) =>
            paths.GetProperty(path).GetProperty("get").GetProperty("responses").GetProperty(code).GetProperty("content");
        var study = Content("/api/v1/studies/{id}", "200");
        Assert.Equal("#/components/schemas/StudyDto",
            study.GetProperty("application/json").GetProperty("schema").GetProperty("$ref").GetString());
        Assert.True(study.TryGetProperty("text/csv", out _));
        var report = Content("/api/v1/analyses/{id}/report", "200");
        var pdf = report.GetProperty("application/pdf").GetProperty("schema");
        Assert.Equal("binary", pdf.GetProperty("format").GetString());
        Assert.True(report.TryGetProperty("text/html", out _));
        Assert.True(Content("/api/v1/analyses/{id}/uplift.csv", "200").TryGetProperty("text/csv", out _));
        Assert.True(Content("/api/v1/sections/template.xlsx", "200")
            .TryGetProperty("application/vnd.openxmlformats-officedocument.spreadsheetml.sheet", out _));
        var import = paths.GetProperty("/api/v1/sections/import").GetProperty("post");
        Assert.True(import.GetProperty("requestBody").GetProperty("content").TryGetProperty("text/csv", out _));
    }

    [Fact]
    public async Task Document_Schemas_HaveRequiredListsAndContractNullability()
    {
        var schemas = (await Document()).GetProperty("components").GetProperty("schemas");
        var missing = schemas.EnumerateObject()
            .Where(s => s.Name.EndsWith("Dto", StringComparison.Ordinal) && s.Value.TryGetProperty("properties", out _))
            .Where(s => !s.Value.TryGetProperty("required", out _)).Select(s => s.Name).ToList();
        Assert.True(missing.Count == 0, "no required list: " + string.Join(", ", missing));

        var result = schemas.GetProperty("AnalysisResultDto");
        var required = result.GetProperty("required").EnumerateArray().Select(r => r.GetString()).ToHashSet();
        bool Nullable(string name) => result.GetProperty("properties").GetProperty(name)
            .TryGetProperty("nullable", out var n) && n.GetBoolean();
        foreach (string name in new[] { "id", "title", "flow", "mesh", "solver", "caution" })
        {
            Assert.Contains(name, required);
            Assert.False(Nullable(name), name + " should not be nullable");
        }
        foreach (string name in new[] { "exit", "creep", "independentVariables", "convergence", "truncation", "gauges" })
            Assert.True(Nullable(name), name + " should be nullable");

        var section = schemas.GetProperty("SectionDocument");
        Assert.Equal(["heads", "soils", "zones"],
            section.GetProperty("required").EnumerateArray().Select(r => r.GetString()));
        Assert.Equal(["id", "kx"], schemas.GetProperty("SoilDocument").GetProperty("required").EnumerateArray()
            .Select(r => r.GetString()));
    }
}
