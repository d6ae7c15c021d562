using Seepage.Core.Sections;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Results;

public class CofferdamHeaveTests
{
    // Double-wall cofferdam (Terzaghi, "Theoretical Soil Mechanics", 1943; the prism rule as in HeaveCalculator):
    // two walls 10 m apart driven 6 m into a 20 m sand layer, the water inside pumped down to 2 m below the ground.
    // For each wall the prism lies on the excavation side (lower heads), D = 6 m from the ground to the tip, width 3 m.
    // (A lowered excavation floor with the walls starting at its corners stalled the interim mesher; not tested here.)
    [Fact]
    public void Compute_DoubleWallCofferdam_PrismsOnExcavationSide()
    {
        var doc = new SectionDocument
        {
            Soils = [new() { Id = "sand", Kx = 1e-5, SpecificGravity = 2.65, VoidRatio = 0.6 }],
            Zones = [new() { Soil = "sand", Outline = Rect(-40, -20, 40, 0) }],
            Cutoffs = [new() { Name = "left wall", Top = P(-5, 0), Tip = P(-5, -6) }, new() { Name = "right wall", Top = P(5, 0), Tip = P(5, -6) }],
            Heads = [new() { Name = "river left", Along = [P(-40, 0), P(-5, 0)], Total = 4 },
                     new() { Name = "river right", Along = [P(5, 0), P(40, 0)], Total = 4 },
                     new() { Name = "excavation", Along = [P(-5, 0), P(5, 0)], Total = -2 }],
            ExitCheck = new() { Along = [P(-5, 0), P(5, 0)] },
            Mesh = new() { Size = 0.5 },
            TruncationCheck = false,
        };
        var result = Seepage.Core.Analysis.Run(Valid(doc));
        Assert.Equal(2, result.Heave.Count);
        var left = result.Heave.Single(h => h.Cutoff == "left wall");
        var right = result.Heave.Single(h => h.Cutoff == "right wall");
        Assert.Equal(6, left.Depth, 1e-6);
        Assert.Equal(0, left.SurfaceY, 1e-6);
        Assert.Equal(-5, left.PrismFromX, 1e-9);
        Assert.Equal(-2, left.PrismToX, 1e-9);
        Assert.Equal(2, right.PrismFromX, 1e-9);
        Assert.Equal(5, right.PrismToX, 1e-9);
        Assert.True(left.AverageExcessHead > 0 && Math.Abs(left.AverageExcessHead / right.AverageExcessHead - 1) < 1e-3, "symmetric section, equal prisms");
        // W′ = γw·(Gs − 1)/(1 + e)·D·D/2 = 9.81·1.65/1.6·18 kN/m.
        Assert.Equal(9.81 * 1.65 / 1.6 * 18, left.EffectiveWeight!.Value, 1e-9);
        Assert.Equal(left.EffectiveWeight.Value / left.UpliftForce, left.Factor!.Value, 1e-12);
    }
}
