using Seepage.Core.Geometry;
using Seepage.Core.Meshing;

namespace Seepage.Core.Tests.Meshing;

/// <summary>Builds the planar graph of a layered rectangular section for the mesher tests: horizontal
/// layer interfaces, floor ends as extra vertices on the ground line, and vertical cutoffs as slits from
/// the ground down to their tips. Invented geometry, for tests only.</summary>
internal sealed class LayeredSection
{
    public double Left = -40, Right = 40, Bottom = -20;
    public List<double> Interfaces = new();            // elevations strictly between Bottom and 0
    public List<double> FloorEnds = new();              // x on the ground line
    public List<(double X, double Tip)> Cutoffs = new(); // tip elevation, >= Bottom
    public double TipSize = 0;                           // 0: no size targets

    public List<double> Levels() => new[] { 0.0 }.Concat(Interfaces.OrderByDescending(v => v)).Append(Bottom).ToList();

    public PlanarGraph Build()
    {
        var vertices = new List<Point2>();
        var index = new Dictionary<(double, double), int>();
        int V(double x, double y)
        {
            if (!index.TryGetValue((x, y), out int i)) { i = vertices.Count; vertices.Add(new Point2(x, y)); index[(x, y)] = i; }
            return i;
        }
        var segments = new List<GraphSegment>();
        var levels = Levels();
        List<double> XsAt(double level)
        {
            var xs = new List<double> { Left, Right };
            if (level == 0) xs.AddRange(FloorEnds);
            foreach (var (x, tip) in Cutoffs) if (level == 0 || tip <= level) xs.Add(x);
            return xs.Distinct().OrderBy(v => v).ToList();
        }
        foreach (double level in levels)
        {
            var xs = XsAt(level);
            for (int i = 0; i + 1 < xs.Count; i++) segments.Add(new GraphSegment(V(xs[i], level), V(xs[i + 1], level)));
        }
        var regions = new List<RegionSeed>();
        for (int k = 0; k + 1 < levels.Count; k++)
        {
            segments.Add(new GraphSegment(V(Left, levels[k]), V(Left, levels[k + 1])));
            segments.Add(new GraphSegment(V(Right, levels[k]), V(Right, levels[k + 1])));
            double seedX = Left + 1e-3 * (Right - Left);
            regions.Add(new RegionSeed(new Point2(seedX, 0.5 * (levels[k] + levels[k + 1])), k, null));
        }
        var slits = new List<Slit>();
        var targets = new List<SizeTarget>();
        foreach (var (x, tip) in Cutoffs)
        {
            var chain = new List<int> { V(x, 0) };
            foreach (double level in levels.Skip(1)) if (level > tip) chain.Add(V(x, level));
            chain.Add(V(x, tip));
            chain = chain.Distinct().ToList();
            for (int i = 0; i + 1 < chain.Count; i++) segments.Add(new GraphSegment(chain[i], chain[i + 1]));
            slits.Add(new Slit(chain));
            if (TipSize > 0) targets.Add(new SizeTarget(new Point2(x, tip), TipSize));
        }
        if (TipSize > 0) foreach (double x in FloorEnds) targets.Add(new SizeTarget(new Point2(x, 0), TipSize));
        return new PlanarGraph(vertices, segments, regions, slits, targets);
    }
}
