using System.Net;
using System.Text.Json.Nodes;
using Seepage.Core.Tests.Support;
using static Seepage.Api.Tests.Hardening.HostileSamples;

namespace Seepage.Api.Tests.Hardening;

/// <summary>Security of the service: formula injection in every export, security headers on every route, the Swagger UI
/// setting, and proofs that stored XSS, SQL injection and path traversal still fail.</summary>
public class SecurityTests
{
    private const string Formula = "=HYPERLINK(\"http://example.invalid\",\"x\")";

    [Fact]
    public async Task Exports_TextLikeAFormula_EscapedNumbersKept()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var section = WeirNode();
        section["title"] = "@SUM(A1)";
        section["structures"]![0]!["name"] = Formula;
        var post = await client.PostAsync("/api/v1/analyses", Json(section));
        Assert.Equal(HttpStatusCode.Created, post.StatusCode);
        string id = JsonNode.Parse(await post.Content.ReadAsStringAsync())!["id"]!.GetValue<string>();
        string uplift = await client.GetStringAsync($"/api/v1/analyses/{id}/uplift.csv");
        var rows = uplift.Split("\r\n", StringSplitOptions.RemoveEmptyEntries).Skip(1).Where(r => !r.TrimStart('"').StartsWith('#')).ToList();
        Assert.All(rows, r => Assert.StartsWith("\"'=HYPERLINK(", r));
        Assert.Contains(rows, r => r.Contains(",-10,", StringComparison.Ordinal)); // x = −10 m stays a number

        var study = new JsonObject
        {
            ["base"] = WeirNode(),
            ["alternatives"] = new JsonArray(new JsonObject { ["name"] = "-cmd|' /C calc'!A0", ["changes"] = new JsonObject { ["/heads/1/total"] = -1.5 } }),
        };
        var studyPost = await client.PostAsync("/api/v1/studies?format=csv", Json(study));
        string csv = await studyPost.Content.ReadAsStringAsync();
        Assert.Contains("\n'-cmd|' /C calc'!A0,-1.5,", csv);
    }

    [Fact]
    public async Task Template_TitleLikeAFormula_EscapedAndReadBackUnchanged()
    {
        // Core round trip: the writer escapes, the reader takes the apostrophe off again.
        var doc = Seepage.Core.Sections.SectionParser.Parse(Weir.Replace("Hardening sample weir", "+cmd"), out _)!;
        string csv = Seepage.Core.Imports.SectionSpreadsheet.WriteCsv(doc);
        Assert.Contains("'+cmd", csv);
        Assert.Equal("+cmd", Seepage.Core.Imports.SectionSpreadsheet.ReadCsv(csv).Document!.Title);
        var xlsx = Seepage.Core.Imports.SectionSpreadsheet.WriteXlsx(doc);
        Assert.Equal("+cmd", Seepage.Core.Imports.SectionSpreadsheet.ReadXlsx(new MemoryStream(xlsx)).Document!.Title);
        using var factory = new SeepageFactory();
        var template = await factory.CreateClient().GetStringAsync("/api/v1/sections/template.csv");
        Assert.DoesNotContain("\n=", template);
    }

    [Theory]
    [InlineData("/")]
    [InlineData("/index.html")]
    [InlineData("/api/v1/examples")]
    [InlineData("/api/v1/analyses/nope")]
    [InlineData("/swagger/v1/swagger.json")]
    [InlineData("/no/such/route")]
    public async Task AnyRoute_SecurityHeaders(string path)
    {
        using var factory = new SeepageFactory();
        var response = await factory.CreateClient().GetAsync(path);
        Assert.Equal("nosniff", response.Headers.GetValues("X-Content-Type-Options").Single());
        Assert.Equal("DENY", response.Headers.GetValues("X-Frame-Options").Single());
        string csp = response.Headers.GetValues("Content-Security-Policy").Single();
        Assert.Contains("frame-ancestors 'none'", csp);
        Assert.Contains("script-src 'self'", csp);
    }

    [Trait("Category", "Slow")] // two server starts
    [Fact]
    public async Task SwaggerUi_OnByDefaultOffBySetting()
    {
        using var on = new SeepageFactory();
        Assert.Equal(HttpStatusCode.OK, (await on.CreateClient().GetAsync("/swagger/index.html")).StatusCode);
        using var off = new SeepageFactory(new Dictionary<string, string> { ["OpenApi:SwaggerUi"] = "false" });
        var client = off.CreateClient();
        Assert.Equal(HttpStatusCode.NotFound, (await client.GetAsync("/swagger/index.html")).StatusCode);
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/swagger/v1/swagger.json")).StatusCode);
    }

    [Fact]
    public async Task StoredTitleWithMarkup_EscapedInTheMemo()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var section = WeirNode();
        section["title"] = "<script>alert(1)</script><img src=x onerror=alert(2)>";
        var post = await client.PostAsync("/api/v1/analyses", Json(section));
        string id = JsonNode.Parse(await post.Content.ReadAsStringAsync())!["id"]!.GetValue<string>();
        string memo = await client.GetStringAsync($"/api/v1/analyses/{id}/report");
        Assert.DoesNotContain("<script>alert", memo);
        Assert.DoesNotContain("<img src=x", memo);
        Assert.Contains("&lt;script&gt;", memo);
    }

    [Fact]
    public async Task SqlInTitleAndId_StoredAsTextNeverRun()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var section = WeirNode();
        const string title = "x'); DROP TABLE analyses; --";
        section["title"] = title;
        var post = await client.PostAsync("/api/v1/analyses", Json(section));
        string id = JsonNode.Parse(await post.Content.ReadAsStringAsync())!["id"]!.GetValue<string>();
        Assert.Equal(HttpStatusCode.NotFound, (await client.GetAsync("/api/v1/analyses/x'%20OR%20'1'='1")).StatusCode);
        var again = JsonNode.Parse(await client.GetStringAsync($"/api/v1/analyses/{id}"))!;
        Assert.Equal(title, again["title"]!.GetValue<string>());
    }

    [Theory]
    [InlineData("/api/v1/examples/..%2F..%2Fappsettings.json")]
    [InlineData("/api/v1/examples/%2E%2E%2F%2E%2E%2Fappsettings")]
    [InlineData("/..%2F..%2Fappsettings.json")]
    [InlineData("/js/..%2F..%2F..%2Fappsettings.json")]
    [InlineData("/api/v1/analyses/..%2F..%2Fdata%2Fseepage.db")]
    public async Task PathTraversal_NothingOutsideIsServed(string path)
    {
        using var factory = new SeepageFactory();
        var response = await factory.CreateClient().GetAsync(path);
        string text = await response.Content.ReadAsStringAsync();
        Assert.True((int)response.StatusCode is 400 or 404, $"{(int)response.StatusCode}: {text[..Math.Min(200, text.Length)]}");
        Assert.DoesNotContain("AllowedHosts", text);
        Assert.DoesNotContain("SQLite format", text);
    }

    [Trait("Category", "Slow")] // a hostile workbook
    [Fact]
    public async Task Import_WorkbookDeclaringTheWholeGrid_400Quickly()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var template = await client.GetByteArrayAsync("/api/v1/sections/template.xlsx"); // warm the host (start-up is not the figure)
        await client.PostAsync("/api/v1/sections/import", Bytes(template, "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet"));
        var workbook = MinimalWorkbook.Build(MinimalWorkbook.Of("soils", MinimalWorkbook.Text("A1", "soils"), "A1:XFD1048576"));
        var clock = System.Diagnostics.Stopwatch.StartNew();
        var response = await client.PostAsync("/api/v1/sections/import",
            Bytes(workbook, "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet"));
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.True(clock.Elapsed.TotalSeconds < 5, $"{clock.Elapsed.TotalSeconds:F1} s");
        Assert.Contains(await ErrorKeys(response), k => k.Contains("sheet 'soils'", StringComparison.Ordinal));
    }
}
