using Seepage.Core.Sections;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Analytic;

public class InterferenceTests(Xunit.Abstractions.ITestOutputHelper output)
{
    // Khosla, Bose & Taylor, "Design of Weirs on Permeable Foundations", 1936 (method and interference correction
    // from memory): a level floor b = 30 m on deep sand with piles of 5, 6 and 6 m at its ends and its middle,
    // H = 5 m. Each key point next to a neighbouring pile gets C = 19·√(D/b′)·(d + D)/b per cent. Check: at all
    // four such points (C1, E2, C2, E3) the corrected value is closer to the FE head than the basic closed form and
    // within 1.2 percentage points of it (measured 0.1–1.0 points; the basic forms are 3.2–5.3 points off).
    [Fact]
    public void Analysis_ThreePiles_InterferenceMovesKeyPointsTowardFe()
    {
        var doc = new SectionDocument
        {
            Soils = [new() { Id = "sand", Kx = 1e-4 }],
            Zones = [new() { Soil = "sand", Outline = Rect(-15, -20, 45, 0), Size = 0.4 },
                     new() { Soil = "sand", Outline = [P(-250, 0), P(-15, 0), P(-15, -20), P(45, -20), P(45, 0), P(280, 0), P(280, -250), P(-250, -250)], Size = 10 }],
            Structures = [new() { Name = "floor", Base = [P(0, 0), P(30, 0)] }],
            Cutoffs = [new() { Name = "p1", Top = P(0, 0), Tip = P(0, -5) }, new() { Name = "p2", Top = P(15, 0), Tip = P(15, -6) }, new() { Name = "p3", Top = P(30, 0), Tip = P(30, -6) }],
            Heads = [new() { Name = "up", Along = [P(-250, 0), P(0, 0)], Total = 5 }, new() { Name = "down", Along = [P(30, 0), P(280, 0)], Total = 0 }],
            Mesh = new() { Size = 10 },
            TruncationCheck = false,
        };
        var iv = Seepage.Core.Analysis.Run(Valid(doc)).IndependentVariables!;
        Assert.Equal(["upstream", "intermediate", "downstream"], iv.Piles.Select(p => p.Position));
        foreach (var p in iv.Piles)
            output.WriteLine($"{p.Cutoff}: E {p.E.Basic:F2}{p.E.Correction:+0.00;-0.00}={p.E.Corrected:F2} FE {p.E.Fe:F2}; D {p.D.Basic:F2} FE {p.D.Fe:F2}; C {p.C.Basic:F2}{p.C.Correction:+0.00;-0.00}={p.C.Corrected:F2} FE {p.C.Fe:F2}");
        var corrected = new[] { ("C1", iv.Piles[0].C), ("E2", iv.Piles[1].E), ("C2", iv.Piles[1].C), ("E3", iv.Piles[2].E) };
        // The interference term itself, e.g. at C1 from pile 2: D = 6, b′ = 15, d = 5.
        Assert.Equal(19 * Math.Sqrt(6.0 / 15) * (5 + 6) / 30, iv.Piles[0].C.Correction, 1e-9);
        foreach (var (name, k) in corrected)
        {
            Assert.True(Math.Abs(k.Difference!.Value) < Math.Abs(k.Fe!.Value - k.Basic), $"{name}: corrected {k.Corrected:F2}, basic {k.Basic:F2}, FE {k.Fe:F2}");
            Assert.True(Math.Abs(k.Difference.Value) < 1.2, $"{name}: corrected {k.Corrected:F2}, FE {k.Fe:F2}");
        }
    }
}
