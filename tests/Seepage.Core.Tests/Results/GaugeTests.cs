using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Results;

public class GaugeTests
{
    // Continuity (common practice): every polyline that cuts the section in two carries the whole discharge, and a
    // gauge split in two parts carries the sum of the parts. Element velocities are not exactly conservative across
    // an arbitrary line, so quadratic elements are used and 1 % is allowed. A gauge from a cutoff tip straight down
    // is 1.8 % low on this mesh (the velocity is singular at the tip, like r^(−1/2)); gauges should keep clear of tips.
    [Fact]
    public void Compute_GaugesAcrossLayer_CarryTheDischarge()
    {
        var doc = SheetPile(5, 10, 80, 4) with
        {
            Mesh = new() { Size = 0.5, Order = 2 },
            // Each gauge runs from a face of the pile to the impervious base, so it parts the inflow surface from the outflow one.
            Gauges = [new() { Name = "downstream", Along = [P(0, -2.5), P(6, -10)] },
                      new() { Name = "upstream", Along = [P(0, -2.5), P(-6, -10)] },
                      new() { Name = "bent", Along = [P(0, -1), P(3, -6), P(3, -10)] },
                      new() { Name = "bent, first part", Along = [P(0, -1), P(3, -6)] },
                      new() { Name = "bent, second part", Along = [P(3, -6), P(3, -10)] }],
            TruncationCheck = false,
        };
        var result = Seepage.Core.Analysis.Run(Valid(doc));
        double q = result.Flow.PerMetre;
        var g = result.Gauges.ToDictionary(x => x.Name);
        foreach (var name in new[] { "upstream", "downstream", "bent" })
            Assert.True(Math.Abs(Math.Abs(g[name].Flow) / q - 1) < 0.01, $"{name}: {g[name].Flow:E5}, discharge {q:E5}");
        Assert.Equal(g["bent"].Flow, g["bent, first part"].Flow + g["bent, second part"].Flow, 1e-9 * q);
        Assert.Equal(Math.Sqrt(6 * 6 + 7.5 * 7.5), g["downstream"].Length, 1e-9);
        // Both gauges walk down from the pile; their normals point toward the downstream surface and toward the tip.
        Assert.True(g["downstream"].Flow > 0 && g["upstream"].Flow > 0, "sign: positive along the normal 90° counter-clockwise from the walking direction");
    }
}
