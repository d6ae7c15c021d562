using Seepage.Core.Sections;
using Xunit.Abstractions;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Unconfined;

[Trait("Category", "Slow")] // unconfined iterations on fine meshes
public class ExactDamTests(ITestOutputHelper output)
{
    // Rectangular dam on an impervious base: Dupuit's discharge q = k(h1² − h2²)/(2L) is exact (Charny 1951;
    // Polubarinova-Kochina, "Theory of Ground Water Movement", 1962), although the Dupuit free surface is not: the
    // true one leaves the downstream face above the tailwater on a seepage face of non-zero length.
    [Theory]
    [InlineData(10, 2, 10)]
    [InlineData(8, 0, 12)]
    public void Analysis_RectangularDam_DupuitDischargeExact(double h1, double h2, double length)
    {
        double k = 1e-5;
        var r = Seepage.Core.Analysis.Run(Valid(Dams.Rectangular(h1, h2, length, k, size: 0.25)));
        double exact = k * (h1 * h1 - h2 * h2) / (2 * length);
        double error = r.Flow.PerMetre / exact - 1;
        var face = Assert.Single(r.SeepageFaces);
        output.WriteLine($"q FE {r.Flow.PerMetre:E6}, Dupuit {exact:E6}, error {error:P3}; iterations {r.Unconfined!.Iterations}; "
            + $"seepage face wetted {face.WettedLength:F3} m, exit point {face.ExitPoint}");
        Assert.True(Math.Abs(error) < 0.005, $"FE {r.Flow.PerMetre:E6} against Dupuit {exact:E6}: {error:P3}");
        Assert.True(face.WettedLength > 0.05 * h1, $"seepage face above the tailwater {face.WettedLength} m");
        Assert.True(face.ExitPoint!.Value.Y > h2 + 0.05 * h1);
        var dupuit = Assert.Single(r.HandMethods!.Estimates, e => e.Method == "Dupuit");
        Assert.True(dupuit.Applies);
        Assert.Equal(exact, dupuit.Flow!.Value, 12);
        Assert.True(Math.Abs(r.Flow.Balance) < 1e-6);
    }

    // Kozeny's dam (Kozeny 1931, exact): with the upstream face on the equipotential parabola and a horizontal drain
    // whose upstream end is the focus, q = k·y0 and the phreatic line is the parabola x = (y0² − y²)/(2·y0).
    [Fact]
    public void Analysis_KozenyDam_DischargeAndPhreaticLineExact()
    {
        double k = 1e-5, h = 10, y0 = 2, top = 1.2 * h;
        var r = Seepage.Core.Analysis.Run(Valid(Dams.Kozeny(h, y0, k, size: 0.4)));
        double error = r.Flow.PerMetre / (k * y0) - 1;
        double worst = 0;
        foreach (var p in r.PhreaticSurface.SelectMany(l => l.Points).Where(p => p.X > -23 && p.X < 0.9))
            worst = Math.Max(worst, Math.Abs(p.Y - Math.Sqrt(y0 * y0 - 2 * y0 * p.X)));
        output.WriteLine($"q FE {r.Flow.PerMetre:E6}, Kozeny {k * y0:E6}, error {error:P3}; phreatic line within {worst:F4} m "
            + $"({worst / top:P2} of the height); iterations {r.Unconfined!.Iterations}");
        Assert.True(Math.Abs(error) < 0.01, $"{error:P3}");
        Assert.True(worst < 0.01 * top, $"{worst} m");
        Assert.NotEmpty(r.PhreaticSurface);
    }

    // Transformed section (Samsioe 1931; Harr, "Groundwater and Seepage", 1962, ch. 2): kx = 9 ky equals the section with
    // x scaled by 1/3 and k′ = √(kx·ky); the rectangular dam then also meets Dupuit's exact discharge.
    [Fact]
    public void Analysis_AnisotropicDam_MatchesTransformedSection()
    {
        double kx = 9e-5, ky = 1e-5;
        var aniso = Dams.Rectangular(10, 2, 30, size: 0.25) with { Soils = [new SoilDocument { Id = "fill", Kx = kx, Ky = ky }] };
        var iso = Dams.Rectangular(10, 2, 10, Math.Sqrt(kx * ky), size: 0.25);
        double qa = Seepage.Core.Analysis.Run(Valid(aniso)).Flow.PerMetre, qi = Seepage.Core.Analysis.Run(Valid(iso)).Flow.PerMetre;
        double dupuit = Math.Sqrt(kx * ky) * 96 / 20;
        output.WriteLine($"anisotropic {qa:E6}, transformed {qi:E6} ({qa / qi - 1:P3}), Dupuit {dupuit:E6} ({qa / dupuit - 1:P3})");
        Assert.True(Math.Abs(qa / qi - 1) < 0.005, $"{qa:E6} against {qi:E6}");
        Assert.True(Math.Abs(qa / dupuit - 1) < 0.005);
    }

    // A section whose soil lies everywhere below the lowest head is saturated throughout: the unconfined analysis must
    // give the confined answer (the same linear problem, k_r = 1 everywhere).
    [Fact]
    public void Analysis_SubmergedSection_GivesConfinedAnswer()
    {
        var doc = SheetPile(4, 8, 30, 3);
        var confined = Seepage.Core.Analysis.Run(Valid(doc));
        var unconfined = Seepage.Core.Analysis.Run(Valid(doc with { Unconfined = true }));
        Assert.True(Math.Abs(unconfined.Flow.PerMetre / confined.Flow.PerMetre - 1) < 1e-6,
            $"{unconfined.Flow.PerMetre:E8} against {confined.Flow.PerMetre:E8}");
        Assert.All(unconfined.Field.ElementFactors!, f => Assert.Equal(1, f));
        // Nothing switches and k_r stays 1: only the inexact-solve schedule (1e-6 down to 1e-10) takes a few iterations.
        Assert.True(unconfined.Unconfined!.Iterations <= 10, $"{unconfined.Unconfined.Iterations} iterations");
    }
}
