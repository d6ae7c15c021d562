using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Results;

public class GaugeTests(Xunit.Abstractions.ITestOutputHelper output)
{
    // Continuity (common practice): every polyline that parts the section carries the whole discharge. Such gauges
    // are read from the boundary fluxes of one side, so they balance with the boundary flows to the solver's
    // residual, whatever their shape, even one running straight down from the cutoff tip where the velocity is
    // singular (there the element-velocity integral beside it reads low). Gauges that end inside the soil are
    // read from element velocities: split in two parts they add up exactly, and a gauge from the pile face to a
    // point 2 m above the base carries less than the whole flow.
    [Fact]
    public void Compute_GaugesAcrossLayer_CarryTheDischarge()
    {
        var doc = SheetPile(5, 10, 80, 4) with
        {
            Mesh = new() { Size = 0.5, Order = 2 },
            // Each parting gauge runs from a face of the pile (or its tip) to the impervious base.
            Gauges = [new() { Name = "downstream", Along = [P(0, -2.5), P(6, -10)] },
                      new() { Name = "upstream", Along = [P(0, -2.5), P(-6, -10)] },
                      new() { Name = "bent", Along = [P(0, -1), P(3, -6), P(3, -10)] },
                      new() { Name = "from the tip", Along = [P(0, -5), P(0, -10)] },
                      new() { Name = "short", Along = [P(0, -1), P(3, -6), P(3, -8)] },
                      new() { Name = "short, first part", Along = [P(0, -1), P(3, -6)] },
                      new() { Name = "short, second part", Along = [P(3, -6), P(3, -8)] }],
            TruncationCheck = false,
        };
        var result = Seepage.Core.Analysis.Run(Valid(doc));
        double q = result.Flow.PerMetre;
        var g = result.Gauges.ToDictionary(x => x.Name);
        foreach (var name in new[] { "upstream", "downstream", "bent", "from the tip" })
        {
            Assert.Equal(Seepage.Core.Results.GaugeCalculator.Conservative, g[name].Method);
            Assert.True(Math.Abs(Math.Abs(g[name].Flow) / q - 1) < 1e-6, $"{name}: {g[name].Flow:E8}, discharge {q:E8}");
        }
        Assert.True(Math.Abs(g["from the tip"].LineIntegral / q - 1) > 1e-3, "the velocity integral through the tip is visibly off; the conservative reading is not");
        foreach (var name in new[] { "short", "short, first part", "short, second part" })
            Assert.Equal(Seepage.Core.Results.GaugeCalculator.AlongLine, g[name].Method);
        Assert.Equal(g["short"].Flow, g["short, first part"].Flow + g["short, second part"].Flow, 1e-9 * q);
        // Part of the discharge passes between the end of the short gauge and the base.
        Assert.True(g["short"].Flow > 0.5 * q && g["short"].Flow < 0.99 * g["bent"].Flow, $"short: {g["short"].Flow:E5}, bent {g["bent"].Flow:E5}");
        Assert.Equal(Math.Sqrt(6 * 6 + 7.5 * 7.5), g["downstream"].Length, 1e-9);
        // Both gauges walk down from the pile; their normals point toward the downstream surface and toward the tip.
        Assert.True(g["downstream"].Flow > 0 && g["upstream"].Flow > 0, "sign: positive along the normal 90° counter-clockwise from the walking direction");
        Assert.True(g["from the tip"].Flow > 0, "walking down, the left normal points +x, downstream");
        foreach (var x in result.Gauges) output.WriteLine($"{x.Name}: {x.Flow / q:F8} of the discharge ({x.Method}); line integral {x.LineIntegral / q:F6}");
    }

    // The same check with linear elements and a layered section: a gauge across both layers balances with the
    // boundary flows (continuity, common practice).
    [Fact]
    public void Compute_LinearElements_PartingGaugeBalances()
    {
        var doc = SheetPile(4, 10, 40, 3) with
        {
            // From the pile tip, bent, to the base: it parts the upstream surface from the downstream one.
            Gauges = [new() { Name = "across", Along = [P(0, -4), P(5, -7), P(5, -11)] }],
            TruncationCheck = false,
        };
        var result = Seepage.Core.Analysis.Run(Valid(doc));
        var g = result.Gauges.Single();
        Assert.Equal(Seepage.Core.Results.GaugeCalculator.Conservative, g.Method);
        // Walking down and away from the pile the left normal points downstream (+x): the whole discharge, positive.
        Assert.Equal(result.Flow.PerMetre, g.Flow, 1e-6 * result.Flow.PerMetre);
        Assert.Equal(Math.Sqrt(34) + 3, g.Length, 1e-9);
    }
}
