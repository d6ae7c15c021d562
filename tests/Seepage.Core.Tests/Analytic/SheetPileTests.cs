using Seepage.Core.Tests.Support;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Analytic;

public class SheetPileTests
{
    // Single sheet pile of penetration s in a layer of thickness T on an impervious base (Harr, "Groundwater and
    // Seepage", 1962, ch. 5; Polubarinova-Kochina, "Theory of Ground Water Movement", 1962):
    // q/(kH) = K(m′)/(2K(m)), m = sin(πs/2T), m′ = √(1 − m²); exit gradient at the downstream face of the pile
    // i_E = πH/(4T·K(m)·m). The domain extends 8T on each side: the disturbance of a lateral boundary decays like
    // exp(−π·W/2T) ≈ 4e-6 there.
    private const double T = 10, H = 4, Width = 80;

    [Theory]
    [InlineData(0.25)]
    [InlineData(0.5)]
    [InlineData(0.75)]
    public void Analysis_DefaultMesh_FlowWithinOnePercent(double ratio)
    {
        double s = ratio * T, k = 1e-5;
        var doc = SheetPile(s, T, Width, H, k) with { Mesh = null };
        var result = Seepage.Core.Analysis.Run(Valid(doc));
        double m = Math.Sin(Math.PI * s / (2 * T));
        double exact = k * H * Elliptic.K(Elliptic.Complement(m)) / (2 * Elliptic.K(m));
        Assert.True(Math.Abs(result.Flow.PerMetre / exact - 1) < 0.01, $"q = {result.Flow.PerMetre:E6}, exact {exact:E6}");
        Assert.True(Math.Abs(result.Flow.Balance) < 1e-8);
    }

    [Theory]
    [InlineData(0.25)]
    [InlineData(0.5)]
    [InlineData(0.75)]
    public void Analysis_ExitGradientAtPileFace_WithinFivePercent(double ratio)
    {
        double s = ratio * T;
        var doc = SheetPile(s, T, Width, H) with
        {
            Mesh = null,
            ExitCheck = new() { Along = [P(0, 0), P(Width, 0)], Depth = 0.1 },
        };
        var result = Seepage.Core.Analysis.Run(Valid(doc));
        double m = Math.Sin(Math.PI * s / (2 * T));
        double exact = Math.PI * H / (4 * T * Elliptic.K(m) * m);
        Assert.NotNull(result.Exit);
        Assert.True(Math.Abs(result.Exit!.MaxGradient / exact - 1) < 0.05, $"iE = {result.Exit.MaxGradient:F5}, exact {exact:F5}");
        Assert.True(result.Exit.AtX < 0.5, $"maximum at x = {result.Exit.AtX}");
    }
}
