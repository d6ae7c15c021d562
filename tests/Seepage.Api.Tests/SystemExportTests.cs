using System.Net;
using System.Text;
using Seepage.Core.Solvers;

namespace Seepage.Api.Tests;

public class SystemExportTests
{
    // Matrix Market exchange format (Boisvert, Pozo & Remington, "The Matrix Market exchange formats", NIST 1996):
    // the exported K_FF reads back as a square symmetric matrix whose size matches the right-hand side, with a
    // positive diagonal (common practice for a conductivity matrix after eliminating fixed heads).
    [Trait("Category", "Slow")] // assembles the design example
    [Fact]
    public async Task Export_DesignExample_MatrixAndRhsReadBack()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        string json = File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "design-example.section.json"));
        var m = await client.PostAsync("/api/v1/sections/system", new StringContent(json, Encoding.UTF8, "application/json"));
        Assert.Equal(HttpStatusCode.OK, m.StatusCode);
        var r = await client.PostAsync("/api/v1/sections/system?part=rhs", new StringContent(json, Encoding.UTF8, "application/json"));
        var matrix = MatrixMarket.ReadMatrix(new StringReader(await m.Content.ReadAsStringAsync()));
        var rhs = MatrixMarket.ReadVector(new StringReader(await r.Content.ReadAsStringAsync()));
        Assert.Equal(matrix.Size, rhs.Length);
        Assert.True(matrix.Size > 1000);
        Assert.All(matrix.Diagonal(), d => Assert.True(d > 0));
        Assert.Contains(rhs, v => v != 0);
    }

    [Fact]
    public async Task Export_UnknownPart_400()
    {
        using var factory = new SeepageFactory();
        var response = await factory.CreateClient().PostAsync("/api/v1/sections/system?part=everything",
            new StringContent("{}", Encoding.UTF8, "application/json"));
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
    }
}
