using Seepage.Core.Sections;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Analytic;

public class IndependentVariableFeTests
{
    // Khosla, Bose & Taylor, "Design of Weirs on Permeable Foundations", 1936 (closed forms from memory): floor
    // b = 10 m with a downstream pile d = 5 m, H = 6 m, on deep soil (the set-up of FloorWithCutoffTests).
    // α = 2, λ = (1 + √5)/2 = 1.618: φE = arccos((λ − 2)/λ)/π = 54.1 %, φD = arccos((λ − 1)/λ)/π = 37.4 %,
    // G_E = H/(d·π·√λ) = 0.300. The reported method values must equal the closed forms and lie within one
    // percentage point (φ) and 5 % (G_E, exit depth 0.1 m) of the FE values reported beside them.
    private const double B = 10, D = 5, H = 6;

    [Fact]
    public void Analysis_FloorWithDownstreamPile_MethodMatchesClosedFormsAndFe()
    {
        var doc = new SectionDocument
        {
            Soils = [new() { Id = "sand", Kx = 1e-4, SpecificGravity = 2.65, VoidRatio = 0.7 }],
            Zones = [new() { Soil = "sand", Outline = Rect(-15, -15, 25, 0), Size = 0.4 },
                     new() { Soil = "sand", Outline = [P(-200, 0), P(-15, 0), P(-15, -15), P(25, -15), P(25, 0), P(210, 0), P(210, -200), P(-200, -200)], Size = 8 }],
            Structures = [new() { Name = "floor", Base = [P(0, 0), P(B, 0)] }],
            Cutoffs = [new() { Name = "pile", Top = P(B, 0), Tip = P(B, -D) }],
            Heads = [new() { Name = "up", Along = [P(-200, 0), P(0, 0)], Total = H }, new() { Name = "down", Along = [P(B, 0), P(210, 0)], Total = 0 }],
            ExitCheck = new() { Along = [P(B, 0), P(210, 0)], Depth = 0.1 },
            Mesh = new() { Size = 8 },
            TruncationCheck = false,
        };
        var result = Seepage.Core.Analysis.Run(Valid(doc));
        var iv = result.IndependentVariables;
        Assert.NotNull(iv);
        var pile = Assert.Single(iv!.Piles);
        Assert.Equal("downstream", pile.Position);
        double lambda = (1 + Math.Sqrt(1 + B * B / (D * D))) / 2;
        Assert.Equal(100 * Math.Acos((lambda - 2) / lambda) / Math.PI, pile.E.Corrected, 1e-9);
        Assert.Equal(100 * Math.Acos((lambda - 1) / lambda) / Math.PI, pile.D.Corrected, 1e-9);
        Assert.Equal(H / (D * Math.PI * Math.Sqrt(lambda)), iv.ExitGradient!.Value, 1e-9);
        Assert.True(Math.Abs(pile.E.Difference!.Value) < 1, $"φE method {pile.E.Corrected:F2} %, FE {pile.E.Fe:F2} %");
        Assert.True(Math.Abs(pile.D.Difference!.Value) < 1, $"φD method {pile.D.Corrected:F2} %, FE {pile.D.Fe:F2} %");
        Assert.True(Math.Abs(iv.FeExitGradient!.Value / iv.ExitGradient.Value - 1) < 0.05, $"G_E {iv.ExitGradient:F4}, FE {iv.FeExitGradient:F4}");
        var junction = Assert.Single(Assert.Single(result.Uplift).Junctions);
        Assert.Equal(pile.E.Fe!.Value, junction.UpstreamFacePercent, 0.05);
    }
}
