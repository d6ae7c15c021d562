using Seepage.Core.Tests.Support;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Analytic;

public class ExitProfileTests
{
    // Exit gradient along the downstream surface of a single sheet pile of penetration s in a layer of thickness T
    // (Harr, "Groundwater and Seepage", 1962, ch. 5): i(x) = πH / [4T·K(m)·√(sinh²(πx/2T) + m²)], m = sin(πs/2T),
    // x from the pile. The FE point value is the element-row gradient of quadratic elements at each station; the
    // default linear mesh is not accurate enough for a 3 % point check, so order 2 is used.
    private const double T = 10, S = 5, H = 4, Width = 80;

    [Trait("Category", "Slow")]
    [Fact]
    public void Analysis_QuadraticElements_ExitProfileWithinThreePercent()
    {
        var doc = SheetPile(S, T, Width, H) with
        {
            Mesh = new() { Size = 0.5, Order = 2 },
            ExitCheck = new() { Along = [P(0, 0), P(Width, 0)], Depth = 0.1 },
            TruncationCheck = false,
        };
        var result = Seepage.Core.Analysis.Run(Valid(doc));
        double m = Math.Sin(Math.PI * S / (2 * T)), k = Elliptic.K(m);
        double worst = 0; string at = "";
        foreach (var p in result.Exit!.Profile.Where(p => p.X >= 0.1 * S && p.X <= 2 * T))
        {
            double sh = Math.Sinh(Math.PI * p.X / (2 * T));
            double exact = Math.PI * H / (4 * T * k * Math.Sqrt(sh * sh + m * m));
            double error = Math.Abs(p.RowGradient / exact - 1);
            if (error > worst) { worst = error; at = FormattableString.Invariant($"x = {p.X:F3}: FE {p.RowGradient:F5}, exact {exact:F5}"); }
        }
        Assert.True(worst < 0.03, $"worst {worst:P2} at {at}");
    }
}
