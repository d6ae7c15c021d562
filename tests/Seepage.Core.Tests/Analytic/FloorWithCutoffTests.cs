using Seepage.Core.Sections;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Analytic;

public class FloorWithCutoffTests
{
    // Floor of length b with a cutoff of depth d at its downstream end on deep soil (Khosla, Bose & Taylor,
    // "Design of Weirs on Permeable Foundations", CBI Publication 12, 1936): α = b/d, λ = (1 + √(1 + α²))/2;
    // at the junction of the floor's underside and the pile's upstream face φE = arccos((λ − 2)/λ)/π of H, at the
    // tip φD = arccos((λ − 1)/λ)/π; exit gradient G_E = H/(d·π·√λ). "Deep" is modelled by a domain 20b wide
    // each side and 20b deep, meshed finely near the floor and coarsely far from it.
    private const double B = 10, D = 5, H = 6;

    private static SectionModel Section(double exitDepth) => Valid(new SectionDocument
    {
        Soils = [new() { Id = "sand", Kx = 1e-4, SpecificGravity = 2.65, VoidRatio = 0.7, CreepClass = "fine-sand" }],
        Zones = [new() { Soil = "sand", Outline = Rect(-15, -15, 25, 0), Size = 0.4 },
                 new() { Soil = "sand", Outline = [P(-200, 0), P(-15, 0), P(-15, -15), P(25, -15), P(25, 0), P(210, 0), P(210, -200), P(-200, -200)], Size = 8 }],
        Structures = [new() { Name = "floor", Base = [P(0, 0), P(B, 0)] }],
        Cutoffs = [new() { Name = "pile", Top = P(B, 0), Tip = P(B, -D) }],
        Heads = [new() { Name = "up", Along = [P(-200, 0), P(0, 0)], Total = H }, new() { Name = "down", Along = [P(B, 0), P(210, 0)], Total = 0 }],
        ExitCheck = new() { Along = [P(B, 0), P(210, 0)], Depth = exitDepth },
        Mesh = new() { Size = 8 },
    });

    [Fact]
    public void Analysis_KeyPoints_WithinOnePercentOfH()
    {
        var result = Seepage.Core.Analysis.Run(Section(0.1));
        double lambda = (1 + Math.Sqrt(1 + (B / D) * (B / D))) / 2;
        double phiE = Math.Acos((lambda - 2) / lambda) / Math.PI, phiD = Math.Acos((lambda - 1) / lambda) / Math.PI;
        var sampler = new Seepage.Core.Results.FieldSampler(result.Field);
        double eps = 1e-4;
        double atE = sampler.Head(new(B - eps, -eps))!.Value; // under the floor, upstream face of the pile
        double atD = sampler.Head(new(B, -D - eps))!.Value;   // just below the tip
        Assert.True(Math.Abs(atE / H - phiE) < 0.01, $"φE FE {atE / H:F4}, closed form {phiE:F4}");
        Assert.True(Math.Abs(atD / H - phiD) < 0.01, $"φD FE {atD / H:F4}, closed form {phiD:F4}");
        var floor = Assert.Single(result.Uplift);
        Assert.Equal(atE, floor.Stations.Where(s => Math.Abs(s.X - B) < 1e-9).Max(s => s.Head), 1e-3 * H);
    }

    [Fact]
    public void Analysis_ExitGradient_WithinFivePercent()
    {
        var result = Seepage.Core.Analysis.Run(Section(0.1));
        double lambda = (1 + Math.Sqrt(1 + (B / D) * (B / D))) / 2;
        double exact = H / (D * Math.PI * Math.Sqrt(lambda));
        Assert.True(Math.Abs(result.Exit!.MaxGradient / exact - 1) < 0.05, $"G_E FE {result.Exit.MaxGradient:F5}, closed form {exact:F5}");
    }
}
