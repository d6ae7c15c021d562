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

    /// <summary>Kozeny's dam (Kozeny 1931): a horizontal drain 0 ≤ x ≤ 10 m on the base with its upstream end (the focus)
    /// at the origin, and an upstream face on the equipotential parabola x = y²/(2c) − c/2, c = H²/y0, up to a crest at
    /// 1.2·H. The exact solution has q = k·y0 and the phreatic line x = (y0² − y²)/(2·y0).</summary>
    public static SectionDocument Kozeny(double h, double y0, double k = 1e-5, double size = 0.4)
    {
        double c = h * h / y0, top = 1.2 * h;
        var face = Enumerable.Range(0, 41).Select(i => top * i / 40).Select(y => P(y * y / (2 * c) - c / 2, y)).ToList();
        var outline = new List<double[]>(face) { P(10, top), P(10, 0) };
        return new SectionDocument
        {
            Title = "Kozeny dam test",
            Unconfined = true,
            Soils = [new SoilDocument { Id = "fill", Kx = k }],
            Zones = [new ZoneDocument { Soil = "fill", Outline = outline }],
            Heads = [new HeadDocument { Name = "reservoir", Along = face, Total = h }],
            Drains = [new DrainDocument { Name = "drain", Along = [P(0, 0), P(10, 0)] }],
            Mesh = new MeshDocument { Size = size },
        };
    }

    /// <summary>A trapezoidal homogeneous dam: base y = 0, height 12 m, upstream slope 1:3, crest 6 m, downstream slope
    /// 1:2.5 (21.8°), reservoir 10 m; with a toe drain 58 ≤ x ≤ 72 m or a seepage face on the downstream slope only.</summary>
    public static SectionDocument Trapezoid(bool toeDrain, double k = 2e-6, double size = 0.6) => new()
    {
        Title = "trapezoidal dam test",
        Unconfined = true,
        Soils = [new SoilDocument { Id = "fill", Kx = k, SpecificGravity = 2.68, VoidRatio = 0.6 }],
        Zones = [new ZoneDocument { Soil = "fill", Outline = [P(0, 0), P(72, 0), P(42, 12), P(36, 12)] }],
        Heads = [new HeadDocument { Name = "reservoir", Along = [P(0, 0), P(36, 12)], Total = 10 }],
        Drains = toeDrain ? [new DrainDocument { Name = "toe drain", Along = [P(58, 0), P(72, 0)] }] : [],
        SeepageFaces = [new SeepageFaceDocument { Name = "downstream slope", Along = [P(72, 0), P(42, 12)] }],
        Mesh = new MeshDocument { Size = size },
    };
}
