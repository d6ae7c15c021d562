using NetTopologySuite.Geometries;
using Seepage.Core.Geometry;
using Seepage.Core.Sections;

namespace Seepage.Core.Meshing;

/// <summary>
/// Turns a validated section into the planar straight-line graph the mesher needs: every zone edge, structure
/// base, head and drain polyline, exit surface and cutoff becomes a constraint; segments are split wherever a
/// vertex lies on them or a cutoff crosses them; each zone gets a seed; singular points get size targets.
/// </summary>
public static class SectionGraphBuilder
{
    public static PlanarGraph Build(SectionModel section, MeshOptions options)
    {
        double tol = section.Tolerance;
        var pool = new VertexPool(tol);
        var raw = new List<(Point2 A, Point2 B)>();
        foreach (var zone in section.Zones)
            for (int i = 0; i < zone.Outline.Count; i++) raw.Add((zone.Outline[i], zone.Outline[(i + 1) % zone.Outline.Count]));
        var lines = section.Structures.Select(s => s.Base)
            .Concat(section.Heads.Select(h => h.Along))
            .Concat(section.Drains.Select(d => d.Along))
            .Concat(section.SeepageFaces.Select(f => f.Along))
            .Append(section.ExitCheck.Along).ToList();
        foreach (var line in lines)
            for (int i = 0; i + 1 < line.Count; i++) raw.Add((line[i], line[i + 1]));

        foreach (var (a, b) in raw) { pool.Add(a); pool.Add(b); }
        foreach (var c in section.Cutoffs)
        {
            pool.Add(c.Top); pool.Add(c.Tip);
            foreach (var (a, b) in raw)
                if (PolygonMath.ProperIntersection(c.Top, c.Tip, a, b, tol) is { } x) pool.Add(x);
        }
        foreach (var c in section.Cutoffs) raw.Add((c.Top, c.Tip));

        var segments = new HashSet<(int, int)>();
        foreach (var (a, b) in raw)
        {
            var chain = Chain(pool, a, b, tol);
            for (int i = 0; i + 1 < chain.Count; i++)
                segments.Add(chain[i] < chain[i + 1] ? (chain[i], chain[i + 1]) : (chain[i + 1], chain[i]));
        }
        var slits = section.Cutoffs.Select(c => new Slit(Chain(pool, c.Top, c.Tip, tol))).ToList();

        var seeds = new List<RegionSeed>();
        for (int z = 0; z < section.Zones.Count; z++)
            seeds.Add(new RegionSeed(SeedPoint(section.Zones[z].Outline, section.Cutoffs), z, section.Zones[z].Size));

        double singular = options.Size * options.SingularRefinement;
        var targets = new List<SizeTarget>();
        foreach (var c in section.Cutoffs) { targets.Add(new(c.Tip, singular)); targets.Add(new(c.Top, singular)); }
        foreach (var line in lines.Take(lines.Count - 1)) { targets.Add(new(line[0], singular)); targets.Add(new(line[^1], singular)); }

        var ordered = segments.OrderBy(s => s.Item1).ThenBy(s => s.Item2).Select(s => new GraphSegment(s.Item1, s.Item2)).ToList();
        var internalLines = section.Drains.Where(d => d.Internal).SelectMany(d => d.Along.Zip(d.Along.Skip(1)))
            .Select(p => new InternalLine(Chain(pool, p.First, p.Second, tol))).ToList();
        return new PlanarGraph(pool.Points, ordered, seeds, slits, targets) { InternalLines = internalLines };
    }

    // Vertex indices on segment ab, from a to b.
    private static List<int> Chain(VertexPool pool, Point2 a, Point2 b, double tol)
    {
        double minX = Math.Min(a.X, b.X) - tol, maxX = Math.Max(a.X, b.X) + tol;
        double minY = Math.Min(a.Y, b.Y) - tol, maxY = Math.Max(a.Y, b.Y) + tol;
        var on = new List<(double T, int Index)>();
        for (int i = 0; i < pool.Points.Count; i++)
        {
            var p = pool.Points[i];
            if (p.X < minX || p.X > maxX || p.Y < minY || p.Y > maxY) continue;
            if (PolygonMath.DistanceToSegment(p, a, b) <= tol) on.Add((PolygonMath.ProjectOnSegment(p, a, b), i));
        }
        return on.OrderBy(o => o.T).Select(o => o.Index).Distinct().ToList();
    }

    // A point well inside the zone and away from cutoffs: the best midpoint of horizontal chords.
    private static Point2 SeedPoint(IReadOnlyList<Point2> outline, IReadOnlyList<Cutoff> cutoffs)
    {
        var polygon = Domain.ToPolygon(outline);
        var env = polygon.EnvelopeInternal;
        var factory = polygon.Factory;
        Point2 best = new(polygon.InteriorPoint.X, polygon.InteriorPoint.Y);
        double bestClearance = Clearance(best, polygon, cutoffs);
        for (int k = 1; k < 16; k++)
        {
            double y = env.MinY + k / 16.0 * env.Height;
            var chord = factory.CreateLineString([new Coordinate(env.MinX - 1, y), new Coordinate(env.MaxX + 1, y)]);
            var inside = polygon.Intersection(chord);
            for (int g = 0; g < inside.NumGeometries; g++)
            {
                if (inside.GetGeometryN(g) is not LineString piece || piece.Length <= 0) continue;
                var mid = piece.Centroid.Coordinate;
                var p = new Point2(mid.X, mid.Y);
                double clearance = Clearance(p, polygon, cutoffs);
                if (clearance > bestClearance) { best = p; bestClearance = clearance; }
            }
        }
        return best;
    }

    private static double Clearance(Point2 p, Polygon polygon, IReadOnlyList<Cutoff> cutoffs)
    {
        double d = polygon.Boundary.Distance(polygon.Factory.CreatePoint(new Coordinate(p.X, p.Y)));
        foreach (var c in cutoffs) d = Math.Min(d, PolygonMath.DistanceToSegment(p, c.Top, c.Tip));
        return d;
    }
}
