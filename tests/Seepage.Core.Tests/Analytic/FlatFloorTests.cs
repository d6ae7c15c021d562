using Seepage.Core.Sections;
using Seepage.Core.Tests.Support;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Analytic;

public class FlatFloorTests
{
    // Flat impervious floor of width B on a layer of thickness T (Harr, "Groundwater and Seepage", 1962, ch. 5;
    // Pavlovsky's solution): q/(kH) = K(m′)/(2K(m)), m = tanh(πB/4T), m′ = √(1 − m²). The domain extends 8T beyond
    // each end of the floor.
    [Theory]
    [InlineData(10, 10)]
    [InlineData(20, 5)]
    public void Analysis_FloorOnLayer_FlowWithinOnePercent(double b, double t)
    {
        double h = 5, k = 1e-5, w = b / 2 + 8 * t;
        var doc = new SectionDocument
        {
            Soils = [new() { Id = "sand", Kx = k }],
            Zones = [new() { Soil = "sand", Outline = Rect(-w, -t, w, 0) }],
            Structures = [new() { Name = "floor", Base = [P(-b / 2, 0), P(b / 2, 0)] }],
            Heads = [new() { Name = "up", Along = [P(-w, 0), P(-b / 2, 0)], Total = h }, new() { Name = "down", Along = [P(b / 2, 0), P(w, 0)], Total = 0 }],
            TruncationCheck = false,
        };
        var result = Seepage.Core.Analysis.Run(Valid(doc));
        double m = Math.Tanh(Math.PI * b / (4 * t));
        double exact = k * h * Elliptic.K(Elliptic.Complement(m)) / (2 * Elliptic.K(m));
        Assert.True(Math.Abs(result.Flow.PerMetre / exact - 1) < 0.01, $"q = {result.Flow.PerMetre:E6}, exact {exact:E6}");
    }

    // On deep soil the uplift head under the floor is h(x) = (H/π)·arccos(2x/B), x from the centre, positive
    // downstream (Harr 1962, ch. 5). Deep soil: a domain 20B wide each side and 20B deep, fine near the floor.
    [Fact]
    public void Analysis_FloorOnDeepSoil_UpliftHeadWithinOnePercentOfH()
    {
        double b = 10, h = 6;
        var doc = new SectionDocument
        {
            Soils = [new() { Id = "sand", Kx = 1e-4 }],
            Zones = [new() { Soil = "sand", Outline = Rect(-15, -15, 15, 0), Size = 0.4 },
                     new() { Soil = "sand", Outline = [P(-200, 0), P(-15, 0), P(-15, -15), P(15, -15), P(15, 0), P(200, 0), P(200, -200), P(-200, -200)], Size = 8 }],
            Structures = [new() { Name = "floor", Base = [P(-b / 2, 0), P(b / 2, 0)] }],
            Heads = [new() { Name = "up", Along = [P(-200, 0), P(-b / 2, 0)], Total = h }, new() { Name = "down", Along = [P(b / 2, 0), P(200, 0)], Total = 0 }],
            Mesh = new() { Size = 8 },
            TruncationCheck = false,
        };
        var floor = Assert.Single(Seepage.Core.Analysis.Run(Valid(doc)).Uplift);
        double worst = 0;
        foreach (var s in floor.Stations.Where(s => Math.Abs(s.X) <= 0.45 * b))
            worst = Math.Max(worst, Math.Abs(s.Head - h / Math.PI * Math.Acos(2 * s.X / b)) / h);
        Assert.True(worst < 0.01, $"worst uplift head error {worst:P3} of H");
    }
}
