using Seepage.Core.Sections;

namespace Seepage.Core.Tests.Support;

/// <summary>Builds section documents for tests; every test makes its own.</summary>
internal static class Sections
{
    public static double[] P(double x, double y) => [x, y];

    public static List<double[]> Rect(double x0, double y0, double x1, double y1) => [P(x0, y1), P(x1, y1), P(x1, y0), P(x0, y0)];

    /// <summary>A sheet pile at x = 0 of penetration s in a layer of thickness T, half-width W each side; heads H and 0.</summary>
    public static SectionDocument SheetPile(double s, double t, double w, double h, double k = 1e-5, double size = 0.5) => new()
    {
        Title = "sheet pile test",
        Soils = [new SoilDocument { Id = "sand", Kx = k, SpecificGravity = 2.65, VoidRatio = 0.65, CreepClass = "fine-sand" }],
        Zones = [new ZoneDocument { Soil = "sand", Outline = Rect(-w, -t, w, 0) }],
        Cutoffs = [new CutoffDocument { Name = "pile", Top = P(0, 0), Tip = P(0, -s) }],
        Heads = [new HeadDocument { Name = "upstream", Along = [P(-w, 0), P(0, 0)], Total = h },
                 new HeadDocument { Name = "downstream", Along = [P(0, 0), P(w, 0)], Total = 0 }],
        Mesh = new MeshDocument { Size = size },
    };

    public static SectionModel Valid(SectionDocument doc)
    {
        var outcome = SectionValidator.Validate(doc);
        Assert.True(outcome.IsValid, string.Join("\n", outcome.Problems.Select(p => $"{p.Pointer}: {p.Message}")));
        return outcome.Model!;
    }
}
