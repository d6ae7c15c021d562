using Seepage.Core.Sections;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Unconfined;

/// <summary>Unconfined test sections; every test makes its own.</summary>
internal static class Dams
{
    /// <summary>A rectangular homogeneous dam 0 ≤ x ≤ L on an impervious base, crest at 1.25·h1: reservoir h1 on the
    /// upstream face, tailwater h2 on the downstream face, a seepage face above the tailwater.</summary>
    public static SectionDocument Rectangular(double h1, double h2, double length, double k = 1e-5, double size = 0.25)
    {
        double top = 1.25 * h1;
        var heads = new List<HeadDocument> { new() { Name = "reservoir", Along = [P(0, top), P(0, 0)], Total = h1 } };
        if (h2 > 0) heads.Add(new() { Name = "tailwater", Along = [P(length, 0), P(length, h2)], Total = h2 });
        return new SectionDocument
        {
            Title = "rectangular dam test",
            Unconfined = true,
            Soils = [new SoilDocument { Id = "fill", Kx = k, SpecificGravity = 2.65, VoidRatio = 0.6 }],
            Zones = [new ZoneDocument { Soil = "fill", Outline = Rect(0, 0, length, top) }],
            Heads = heads,
            SeepageFaces = [new SeepageFaceDocument { Name = "downstream face", Along = [P(length, h2), P(length, top)] }],
            Mesh = new MeshDocument { Size = size },
        };
    }
}
