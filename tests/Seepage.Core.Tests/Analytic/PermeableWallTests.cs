using Seepage.Core.Sections;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Analytic;

public class PermeableWallTests(Xunit.Abstractions.ITestOutputHelper output)
{
    // Darcy's law for media in series (Harr, "Groundwater and Seepage", 1962, ch. 1; common practice): a layer of
    // thickness T and length L between two fixed heads H and 0, crossed over its full depth by a wall of thickness
    // t and conductivity k_w, carries q = H·T / ((L − t)/k + t/k_w). The head is piecewise linear in x, which
    // linear elements reproduce exactly, so the flow must match to the solver's tolerance (1e-8 relative here).
    [Theory]
    [InlineData(1.0, 0.1)]
    [InlineData(0.3, 0.01)]
    [InlineData(2.0, 10)]
    public void Analysis_FullDepthWall_SeriesFlow(double thickness, double ratio)
    {
        double k = 1e-5, h = 5, t = 10, l = 20;
        var doc = new SectionDocument
        {
            Soils = [new() { Id = "sand", Kx = k }],
            Zones = [new() { Soil = "sand", Outline = Rect(0, -t, l, 0) }],
            Cutoffs = [new() { Name = "slurry wall", Top = P(8, 0), Tip = P(8, -t), Thickness = thickness, Kx = ratio * k }],
            Heads = [new() { Name = "left", Along = [P(0, 0), P(0, -t)], Total = h }, new() { Name = "right", Along = [P(l, -t), P(l, 0)], Total = 0 }],
            Mesh = new() { Size = 1 },
            TruncationCheck = false,
        };
        var model = Valid(doc);
        Assert.Empty(model.Cutoffs);
        Assert.Equal(3, model.Zones.Count); // the layer left of the wall, right of it, and the wall
        var result = Seepage.Core.Analysis.Run(model);
        double exact = h * t / ((l - thickness) / k + thickness / (ratio * k));
        output.WriteLine($"q = {result.Flow.PerMetre:E8}, exact {exact:E8}");
        Assert.Equal(exact, result.Flow.PerMetre, 1e-8 * exact);
    }

    // A wall a million times less pervious than the soil acts nearly as an impervious sheet pile: for a
    // penetration of half the layer the flow tends to the exact k·H/2 of the thin pile (Harr 1962, s/T = 1/2). A
    // 0.1 m strip in a 10 m layer lengthens the path a little and leaks about 5·10⁻⁵ of the flow; within 2 % of kH/2, and below
    // the zero-thickness pile on the same mesh size.
    [Fact]
    public void Analysis_NearlyImperviousWall_ApproachesSheetPile()
    {
        var pile = SheetPile(5, 10, 80, 4) with { TruncationCheck = false };
        var wall = pile with
        {
            Cutoffs = [new() { Name = "wall", Top = P(0, 0), Tip = P(0, -5), Thickness = 0.1, Kx = 1e-11 }],
            Heads = [new() { Name = "upstream", Along = [P(-80, 0), P(-0.05, 0)], Total = 4 }, new() { Name = "downstream", Along = [P(0.05, 0), P(80, 0)], Total = 0 }],
        };
        double qPile = Seepage.Core.Analysis.Run(Valid(pile)).Flow.PerMetre;
        double qWall = Seepage.Core.Analysis.Run(Valid(wall)).Flow.PerMetre;
        double exact = 1e-5 * 4 / 2;
        output.WriteLine($"wall {qWall / exact:F5}, pile {qPile / exact:F5} of kH/2");
        Assert.True(Math.Abs(qWall / exact - 1) < 0.02, $"wall {qWall:E5}, exact {exact:E5}");
        Assert.True(qWall < qPile);
    }

    // A wall from the end of a floor through a sand layer into the silt below: the strip is cut out of both layers
    // and meshed as one zone. Flow is conserved, and a wall more pervious than an impervious cutoff and less than
    // the sand lets through more than the cutoff and less than no wall at all (monotonicity; common practice).
    [Trait("Category", "Slow")] // fine wall mesh
    [Fact]
    public void Analysis_WallAcrossLayers_FlowBetweenCutoffAndNone()
    {
        SectionDocument With(CutoffDocument? wall) => new()
        {
            Soils = [new() { Id = "sand", Kx = 1e-4 }, new() { Id = "silt", Kx = 1e-6 }],
            Zones = [new() { Soil = "sand", Outline = Rect(-40, -6, 40, 0) }, new() { Soil = "silt", Outline = Rect(-40, -16, 40, -6) }],
            Structures = [new() { Name = "floor", Base = [P(-5, 0), P(5, 0)] }],
            Cutoffs = wall is null ? [] : [wall],
            Heads = [new() { Name = "up", Along = [P(-40, 0), P(-5, 0)], Total = 4 }, new() { Name = "down", Along = [P(5, 0), P(40, 0)], Total = 0 }],
            Mesh = new() { Size = 0.5 },
            TruncationCheck = false,
        };
        var wallModel = Valid(With(new() { Name = "wall", Top = P(5, 0), Tip = P(5, -9), Thickness = 0.6, Kx = 1e-6 }));
        Assert.Equal(4, wallModel.Zones.Count); // sand and silt keep their indices; the sand is split in two, the silt notched; the wall is last
        Assert.Equal("wall (wall)", wallModel.Soils[wallModel.Zones[^1].Soil].Id);
        var withWall = Seepage.Core.Analysis.Run(wallModel);
        double qCutoff = Seepage.Core.Analysis.Run(Valid(With(new() { Name = "pile", Top = P(5, 0), Tip = P(5, -9) }))).Flow.PerMetre;
        double qNone = Seepage.Core.Analysis.Run(Valid(With(null))).Flow.PerMetre;
        output.WriteLine($"cutoff {qCutoff:E4}, wall {withWall.Flow.PerMetre:E4}, none {qNone:E4}");
        Assert.True(Math.Abs(withWall.Flow.Balance) < 1e-6);
        Assert.InRange(withWall.Flow.PerMetre, qCutoff, qNone);
    }

    [Fact]
    public void Validate_WallData_ProblemsNameTheField()
    {
        var doc = SheetPile(5, 10, 80, 4);
        var noK = doc with { Cutoffs = [new() { Name = "w", Top = P(0, 0), Tip = P(0, -5), Thickness = 0.5 }] };
        Assert.Contains(SectionValidator.Validate(noK).Problems, p => p.Pointer == "/cutoffs/0/kx");
        var noT = doc with { Cutoffs = [new() { Name = "w", Top = P(0, 0), Tip = P(0, -5), Kx = 1e-7 }] };
        Assert.Contains(SectionValidator.Validate(noT).Problems, p => p.Pointer == "/cutoffs/0/thickness");
        var outside = doc with { Cutoffs = [new() { Name = "w", Top = P(-80, 0), Tip = P(-80, -5), Thickness = 0.5, Kx = 1e-7 }] };
        Assert.Contains(SectionValidator.Validate(outside).Problems, p => p.Pointer == "/cutoffs/0/thickness");
        var negative = doc with { Cutoffs = [new() { Name = "w", Top = P(0, 0), Tip = P(0, -5), Thickness = -1, Kx = 1e-7 }] };
        Assert.Contains(SectionValidator.Validate(negative).Problems, p => p.Pointer == "/cutoffs/0/thickness");
    }
}
