using Seepage.Core.Sections;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Results;

public class CofferdamHeaveTests
{
    // Double-wall cofferdam (Terzaghi, "Theoretical Soil Mechanics", 1943; the prism rule as in HeaveCalculator):
    // two walls 10 m apart driven 6 m into a 20 m sand layer, the water inside pumped down to 2 m below the ground.
    // For each wall the prism lies on the excavation side (lower heads), D = 6 m from the ground to the tip, width 3 m.
    [Trait("Category", "Slow")] // fine cofferdam mesh
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
        var (left, right) = ExcavationSidePrisms(result, surfaceY: 0);
        Assert.True(left.AverageExcessHead > 0 && Math.Abs(left.AverageExcessHead / right.AverageExcessHead - 1) < 1e-3, "symmetric section, equal prisms");
        // W′ = γw·(Gs − 1)/(1 + e)·D·D/2 = 9.81·1.65/1.6·18 kN/m.
        Assert.Equal(9.81 * 1.65 / 1.6 * 18, left.EffectiveWeight!.Value, 1e-9);
        Assert.Equal(left.EffectiveWeight.Value / left.PrismUpliftForce, left.Factor!.Value, 1e-12);
    }

    // The same cofferdam with the excavation dug 3 m below the river bed and kept pumped to its floor; the walls
    // run 9 m from the bed (6 m below the excavation floor). Terzaghi's prism lies on the excavation side with
    // D = 6 m from the excavation floor to the tip and width D/2; the soil is given by its saturated unit weight
    // 20 kN/m³, so γ′ = 20 − 9.81 kN/m³ and W′ = γ′·D·D/2 (Terzaghi 1943; γ′ = γsat − γw, common practice).
    // The excavation floor is also the exit: its upward gradient is the critical one for piping.
    [Trait("Category", "Slow")] // fine cofferdam mesh
    [Fact]
    public void Compute_LoweredExcavation_PrismFromExcavationFloorWithSaturatedUnitWeight()
    {
        var doc = new SectionDocument
        {
            Soils = [new() { Id = "sand", Kx = 1e-5, SaturatedUnitWeight = 20 }],
            Zones = [new() { Soil = "sand", Outline = [P(-40, 0), P(-5, 0), P(-5, -3), P(5, -3), P(5, 0), P(40, 0), P(40, -20), P(-40, -20)] }],
            Cutoffs = [new() { Name = "left wall", Top = P(-5, -3), Tip = P(-5, -9) }, new() { Name = "right wall", Top = P(5, -3), Tip = P(5, -9) }],
            Heads = [new() { Name = "river left", Along = [P(-40, 0), P(-5, 0)], Total = 4 },
                     new() { Name = "river right", Along = [P(5, 0), P(40, 0)], Total = 4 },
                     new() { Name = "excavation", Along = [P(-5, -3), P(5, -3)], Total = -3 }],
            ExitCheck = new() { Along = [P(-5, -3), P(5, -3)] },
            Mesh = new() { Size = 0.5 },
            TruncationCheck = false,
        };
        var result = Seepage.Core.Analysis.Run(Valid(doc));
        var (left, right) = ExcavationSidePrisms(result, surfaceY: -3);
        Assert.True(left.AverageExcessHead > 0 && left.AverageExcessHead < 7 && Math.Abs(left.AverageExcessHead / right.AverageExcessHead - 1) < 1e-3,
            $"excess head {left.AverageExcessHead:F4} m of the 7 m difference; right {right.AverageExcessHead:F4} m");
        Assert.Equal((20 - 9.81) * 18, left.EffectiveWeight!.Value, 1e-9);
        Assert.Equal(left.EffectiveWeight.Value / left.PrismUpliftForce, left.Factor!.Value, 1e-12);
        var exit = result.Exit!;
        Assert.Equal(-3, exit.AtY, 1e-6);
        Assert.Equal((20 - 9.81) / 9.81, exit.CriticalGradient!.Value, 1e-12);
        Assert.True(Math.Abs(result.Flow.Balance) < 1e-6);
    }

    // Both walls at x = ±5 m reach 6 m below the surface inside the cofferdam: each prism is D = 6 m deep, D/2 = 3 m
    // wide, on the excavation side of its wall, topped by that surface.
    private static (Seepage.Core.Results.HeaveResult Left, Seepage.Core.Results.HeaveResult Right) ExcavationSidePrisms(AnalysisResult result, double surfaceY)
    {
        Assert.Equal(2, result.Heave.Count);
        var left = result.Heave.Single(h => h.Cutoff == "left wall");
        var right = result.Heave.Single(h => h.Cutoff == "right wall");
        Assert.Equal(6, left.Depth, 1e-6);
        Assert.Equal(surfaceY, left.SurfaceY, 1e-6);
        Assert.Equal(-5, left.PrismFromX, 1e-9);
        Assert.Equal(-2, left.PrismToX, 1e-9);
        Assert.Equal(2, right.PrismFromX, 1e-9);
        Assert.Equal(5, right.PrismToX, 1e-9);
        return (left, right);
    }
}
