using Seepage.Core.Results;
using Seepage.Core.Sections;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Results;

public class CreepTableTests
{
    // Lane, "Security from under-seepage: masonry dams on earth foundations", Trans. ASCE 100, 1935: weighted
    // creep ratios by soil (table values as recalled, from memory). A single sheet pile of depth 5 m has a weighted
    // creep length of 10 m (both faces, vertical, counted in full); the head is set so that the ratio sits 1 % above
    // or below the class's value, and the check must pass or fail accordingly.
    [Theory]
    [InlineData("very-fine-sand-or-silt", 8.5)]
    [InlineData("fine-sand", 7.0)]
    [InlineData("medium-sand", 6.0)]
    [InlineData("coarse-sand", 5.0)]
    [InlineData("fine-gravel", 4.0)]
    [InlineData("medium-gravel", 3.5)]
    [InlineData("coarse-gravel", 3.0)]
    [InlineData("boulders", 2.5)]
    [InlineData("soft-clay", 3.0)]
    [InlineData("medium-clay", 2.0)]
    [InlineData("hard-clay", 1.8)]
    [InlineData("very-hard-clay", 1.6)]
    public void Lane_RatioAroundTableValue_PassesAboveFailsBelow(string creepClass, double ratio)
    {
        var above = Creep(creepClass, 10 / (ratio * 1.01), 5).Lane;
        var below = Creep(creepClass, 10 / (ratio * 0.99), 5).Lane;
        Assert.Equal(ratio, above.Required);
        Assert.True(above.Pass, $"ratio {above.Ratio:F3} ≥ {ratio} should pass");
        Assert.False(below.Pass, $"ratio {below.Ratio:F3} < {ratio} should fail");
    }

    // Lane's weighting: horizontal contacts count one third. A 30 m floor with a 5 m pile at its end: Lane's
    // weighted length 30/3 + 2·5 = 20 m, Bligh's 30 + 10 = 40 m (Bligh, "Dams, barrages and weirs on porous
    // foundations", Engineering News 64, 1910).
    [Fact]
    public void Compute_FloorAndPile_WeightsHorizontalOneThird()
    {
        var doc = SheetPile(5, 20, 100, 4) with
        {
            Structures = [new() { Name = "floor", Base = [P(-30, 0), P(0, 0)] }],
            Heads = [new() { Name = "up", Along = [P(-100, 0), P(-30, 0)], Total = 4 }, new() { Name = "down", Along = [P(0, 0), P(100, 0)], Total = 0 }],
        };
        var model = Valid(doc);
        var creep = CreepCalculator.Compute(model, model.Soils[0])!;
        Assert.Equal(20, creep.Lane.WeightedLength, 1e-9);
        Assert.Equal(40, creep.Bligh.WeightedLength, 1e-9);
        Assert.Equal(5, creep.Lane.Ratio, 1e-9);
        Assert.Equal(15, creep.Bligh.Required);
        Assert.False(creep.Bligh.Pass); // 40/4 = 10 < 15 for fine sand
    }

    private static CreepResult Creep(string creepClass, double head, double depth)
    {
        var doc = SheetPile(depth, 20, 100, head) with
        {
            Soils = [new SoilDocument { Id = "sand", Kx = 1e-5, CreepClass = creepClass }],
        };
        var model = Valid(doc);
        return CreepCalculator.Compute(model, model.Soils[0])!;
    }
}
