using System.Net;
using System.Text;
using System.Text.Json;

namespace Seepage.Api.Tests;

/// <summary>The page and the memo read what Core computed: the allowable exit gradient and the unit weight of water
/// the analysis used come with the result, so neither recomputes nor re-defaults them.</summary>
public class DefaultsEchoTests
{
    [Fact]
    public async Task Post_DemoWeir_ResultCarriesAllowableGradientAndWaterUnitWeight()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        string section = await client.GetStringAsync("/api/v1/examples/twin-pile-weir");
        var post = await client.PostAsync("/api/v1/analyses", new StringContent(section, Encoding.UTF8, "application/json"));
        Assert.Equal(HttpStatusCode.Created, post.StatusCode);
        var result = JsonDocument.Parse(await post.Content.ReadAsStringAsync()).RootElement;
        var exit = result.GetProperty("exit");
        double ic = exit.GetProperty("criticalGradient").GetDouble(), f = exit.GetProperty("requiredFactor").GetDouble();
        Assert.Equal(ic / f, exit.GetProperty("allowableGradient").GetDouble(), 12);
        var field = JsonDocument.Parse(await client.GetStringAsync(
            $"/api/v1/analyses/{result.GetProperty("id").GetString()}/field")).RootElement;
        double expected = JsonDocument.Parse(section).RootElement.TryGetProperty("waterUnitWeight", out var w)
            ? w.GetDouble() : Seepage.Core.Sections.SectionDefaults.WaterUnitWeight;
        Assert.Equal(expected, field.GetProperty("waterUnitWeight").GetDouble());
    }
}
