using System.Numerics;
using Seepage.Core.Sections;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Analytic;

public class HeavePrismTests
{
    // Terzaghi's prism beside a sheet pile of penetration s on deep soil (Terzaghi, "Theoretical Soil Mechanics",
    // 1943). The closed-form head (Harr, "Groundwater and Seepage", 1962, ch. 5): with t = √(z² + s²), z = x + iy,
    // the slit half-plane maps onto the half-plane and h = (H/π)·Re arccos(t/s), H upstream (x < 0), 0 downstream.
    // The FE average excess head at the prism base (y = −s, 0 < x < s/2) must match its integral within 2 %.
    private const double S = 5, H = 6;

    public static double ExactHead(double x, double y)
    {
        var z = new Complex(x, y);
        var t = Complex.Sqrt(z * z + S * S);
        if (t.Imaginary > 0) t = -t; // the branch that keeps the lower half-plane
        return H / Math.PI * Complex.Acos(t / S).Real;
    }

    [Fact]
    public void Analysis_SheetPileOnDeepSoil_PrismExcessHeadWithinTwoPercent()
    {
        var doc = new SectionDocument
        {
            Soils = [new() { Id = "sand", Kx = 1e-4, SpecificGravity = 2.65, VoidRatio = 0.65 }],
            Zones = [new() { Soil = "sand", Outline = Rect(-15, -15, 15, 0), Size = 0.4 },
                     new() { Soil = "sand", Outline = [P(-200, 0), P(-15, 0), P(-15, -15), P(15, -15), P(15, 0), P(200, 0), P(200, -200), P(-200, -200)], Size = 8 }],
            Cutoffs = [new() { Name = "pile", Top = P(0, 0), Tip = P(0, -S) }],
            Heads = [new() { Name = "up", Along = [P(-200, 0), P(0, 0)], Total = H }, new() { Name = "down", Along = [P(0, 0), P(200, 0)], Total = 0 }],
            Mesh = new() { Size = 8 },
            TruncationCheck = false,
        };
        var heave = Assert.Single(Seepage.Core.Analysis.Run(Valid(doc)).Heave);
        const int n = 2000;
        double sum = 0;
        for (int k = 0; k < n; k++) sum += ExactHead((k + 0.5) / n * S / 2, -S);
        double exact = sum / n;
        Assert.Equal(S, heave.Depth, 1e-6);
        Assert.True(Math.Abs(heave.AverageExcessHead / exact - 1) < 0.02, $"FE h_a = {heave.AverageExcessHead:F4} m, closed form {exact:F4} m");
        // γ′ = γw(Gs − 1)/(1 + e): W′ = γ′·D·D/2.
        Assert.Equal(9.81 * 1.65 / 1.65 * S * S / 2, heave.EffectiveWeight!.Value, 1e-9);
    }

    [Fact]
    public void ExactHead_OnBoundaries_TakesFixedHeads()
    {
        Assert.Equal(H, ExactHead(-3, -1e-12), 1e-6);
        Assert.Equal(0, ExactHead(3, -1e-12), 1e-6);
        Assert.Equal(H / 2, ExactHead(0, -S - 1e-9), 1e-6); // the tip by symmetry
    }
}
