using System.Text.Json;

namespace Seepage.Api.Tests;

public class OpenApiDocumentTests
{
    [Fact]
    public async Task SwaggerJson_ListsSpreadsheetStudyAndReportEndpoints()
    {
        using var factory = new SeepageFactory();
        var paths = JsonDocument.Parse(await factory.CreateClient().GetStringAsync("/swagger/v1/swagger.json")).RootElement.GetProperty("paths");
        foreach (string path in new[]
        {
            "/api/v1/sections/import", "/api/v1/sections/template.xlsx", "/api/v1/sections/template.csv", "/api/v1/studies",
            "/api/v1/studies/{id}", "/api/v1/studies/{id}/report", "/api/v1/analyses/{id}/report", "/api/v1/analyses/{id}/uplift.csv",
            "/api/v1/analyses/{id}/exit.csv",
        })
            Assert.True(paths.TryGetProperty(path, out _), path);
        var import = paths.GetProperty("/api/v1/sections/import").GetProperty("post");
        Assert.True(import.GetProperty("requestBody").GetProperty("content").TryGetProperty("text/csv", out _));
        Assert.True(import.GetProperty("responses").TryGetProperty("400", out _));
    }
}
