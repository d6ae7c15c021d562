using System.Text.Json;
using Seepage.Api.Contracts;
using Seepage.Api.Storage;

namespace Seepage.Api.Tests;

/// <summary>A public name that changed stays readable for a deprecation period: the heave prism's water force is
/// <c>prismUpliftForce</c>, and <c>upliftForce</c> (its former name) is still written and read.</summary>
public class DeprecatedNameTests
{
    [Fact]
    public void HeaveDto_StoredBeforeRename_ReadsPrismUpliftForceFromOldName()
    {
        const string old = """
            { "cutoff": "pile", "depth": 4, "averageExcessHead": 1, "factor": 2, "requiredFactor": 1.5,
              "pass": true, "effectiveWeight": 80, "upliftForce": 39.24, "prism": [0, 2, 0] }
            """;
        var heave = JsonSerializer.Deserialize<HeaveDto>(old, AnalysisService.Json)!;
        Assert.Equal(39.24, heave.PrismUpliftForce);
        var written = JsonDocument.Parse(JsonSerializer.Serialize(heave, AnalysisService.Json)).RootElement;
        Assert.Equal(39.24, written.GetProperty("prismUpliftForce").GetDouble());
        Assert.Equal(39.24, written.GetProperty("upliftForce").GetDouble());
    }

    [Fact]
    public async Task Document_OldHeaveName_MarkedDeprecated()
    {
        using var factory = new SeepageFactory();
        var schemas = JsonDocument.Parse(await factory.CreateClient().GetStringAsync("/swagger/v1/swagger.json")).RootElement
            .GetProperty("components").GetProperty("schemas");
        var properties = schemas.GetProperty("HeaveDto").GetProperty("properties");
        Assert.True(properties.GetProperty("upliftForce").GetProperty("deprecated").GetBoolean());
        Assert.True(properties.TryGetProperty("prismUpliftForce", out _));
    }
}
