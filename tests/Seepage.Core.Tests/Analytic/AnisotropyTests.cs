using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Analytic;

public class AnisotropyTests
{
    // Transformed section (Samsioe 1931; Harr, "Groundwater and Seepage", 1962, ch. 2): flow in a soil with
    // kx ≠ ky equals the flow in the section whose x is scaled by √(ky/kx), with isotropic k′ = √(kx·ky).
    [Fact]
    public void Analysis_KxNineKy_MatchesTransformedSection()
    {
        double kx = 9e-5, ky = 1e-5, scale = Math.Sqrt(ky / kx);
        var aniso = SheetPile(4, 8, 45, 3) with { Soils = [new() { Id = "sand", Kx = kx, Ky = ky }], Mesh = new() { Size = 0.5 } };
        var iso = SheetPile(4, 8, 45 * scale, 3, Math.Sqrt(kx * ky), size: 0.5 * scale) with { Mesh = new() { Size = 0.5 * scale } };
        double qa = Seepage.Core.Analysis.Run(Valid(aniso)).Flow.PerMetre;
        double qi = Seepage.Core.Analysis.Run(Valid(iso)).Flow.PerMetre;
        Assert.True(Math.Abs(qa / qi - 1) < 0.005, $"anisotropic {qa:E5}, transformed {qi:E5}");
    }
}
