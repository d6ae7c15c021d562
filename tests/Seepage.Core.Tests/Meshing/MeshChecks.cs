using Seepage.Core.Geometry;
using Seepage.Core.Meshing;

namespace Seepage.Core.Tests.Meshing;

/// <summary>Invariant checks of a mesh against the graph it was built from. Each returns a list of
/// problems (empty when the invariant holds) so a failing test prints what went wrong.</summary>
internal static class MeshChecks
{
    public static List<string> CounterClockwise(Mesh m)
    {
        var bad = new List<string>();
        for (int t = 0; t < m.TriangleCount; t++)
        {
            int a = m.Triangles[3 * t], b = m.Triangles[3 * t + 1], c = m.Triangles[3 * t + 2];
            if (RobustPredicates.Orient(m.X[a], m.Y[a], m.X[b], m.Y[b], m.X[c], m.Y[c]) <= 0) bad.Add($"triangle {t} not CCW");
        }
        return bad;
    }

    public static double[] ZoneAreas(Mesh m, int zones)
    {
        var area = new double[zones];
        for (int t = 0; t < m.TriangleCount; t++)
        {
            int a = m.Triangles[3 * t], b = m.Triangles[3 * t + 1], c = m.Triangles[3 * t + 2];
            area[m.Zones[t]] += 0.5 * ((m.X[b] - m.X[a]) * (m.Y[c] - m.Y[a]) - (m.Y[b] - m.Y[a]) * (m.X[c] - m.X[a]));
        }
        return area;
    }

    /// <summary>Parameter range [s0, s1] of mesh edge (p, q) along segment a→b when the edge lies on it.</summary>
    private static bool OnSegment(Point2 a, Point2 b, Point2 p, Point2 q, double tol, out double s0, out double s1)
    {
        s0 = s1 = 0;
        var d = b - a;
        double len2 = d.X * d.X + d.Y * d.Y, len = Math.Sqrt(len2);
        double Dist(Point2 r) => Math.Abs(d.X * (r.Y - a.Y) - d.Y * (r.X - a.X)) / len;
        if (Dist(p) > tol || Dist(q) > tol) return false;
        double sp = ((p.X - a.X) * d.X + (p.Y - a.Y) * d.Y) / len2, sq = ((q.X - a.X) * d.X + (q.Y - a.Y) * d.Y) / len2;
        double e = tol / len;
        if (sp < -e || sp > 1 + e || sq < -e || sq > 1 + e) return false;
        s0 = Math.Min(sp, sq); s1 = Math.Max(sp, sq);
        return s1 - s0 > e;
    }

    public static IEnumerable<(int A, int B)> Edges(Mesh m)
    {
        var seen = new HashSet<(int, int)>();
        for (int t = 0; t < m.TriangleCount; t++)
            for (int i = 0; i < 3; i++)
            {
                int a = m.Triangles[3 * t + i], b = m.Triangles[3 * t + (i + 1) % 3];
                var key = (Math.Min(a, b), Math.Max(a, b));
                if (seen.Add(key)) yield return key;
            }
    }

    /// <summary>Every segment covered by mesh edges lying on it; returns the set of such edges.</summary>
    public static List<string> SegmentsCovered(Mesh m, PlanarGraph g, HashSet<(int, int)> constrained)
    {
        var bad = new List<string>();
        var edges = Edges(m).ToList();
        double tol = 1e-7;
        for (int s = 0; s < g.Segments.Count; s++)
        {
            var a = g.Vertices[g.Segments[s].A]; var b = g.Vertices[g.Segments[s].B];
            var pieces = new List<(double, double)>();
            foreach (var e in edges)
                if (OnSegment(a, b, new Point2(m.X[e.A], m.Y[e.A]), new Point2(m.X[e.B], m.Y[e.B]), tol, out double s0, out double s1))
                { pieces.Add((s0, s1)); constrained.Add(e); }
            pieces.Sort();
            double reach = 0;
            foreach (var (s0, s1) in pieces)
            {
                if (s0 > reach + 1e-9) { bad.Add($"segment {s} has a gap at {reach:G6}"); break; }
                reach = Math.Max(reach, s1);
            }
            if (reach < 1 - 1e-9) bad.Add($"segment {s} covered only to {reach:G6}");
        }
        return bad;
    }

    /// <summary>Unconstrained interior edges are locally Delaunay (exact in-circle test).</summary>
    public static List<string> LocallyDelaunay(Mesh m, HashSet<(int, int)> constrained)
    {
        var bad = new List<string>();
        var owner = new Dictionary<(int, int), (int T, int Apex)>();
        for (int t = 0; t < m.TriangleCount; t++)
            for (int i = 0; i < 3; i++)
            {
                int a = m.Triangles[3 * t + i], b = m.Triangles[3 * t + (i + 1) % 3], c = m.Triangles[3 * t + (i + 2) % 3];
                if (owner.TryGetValue((b, a), out var other))
                {
                    if (constrained.Contains((Math.Min(a, b), Math.Max(a, b)))) continue;
                    int p = m.Triangles[3 * t], q = m.Triangles[3 * t + 1], r = m.Triangles[3 * t + 2];
                    int d = other.Apex;
                    if (RobustPredicates.InCircle(m.X[p], m.Y[p], m.X[q], m.Y[q], m.X[r], m.Y[r], m.X[d], m.Y[d]) > 0)
                        bad.Add($"edge {a}-{b} not locally Delaunay");
                }
                else owner[(a, b)] = (t, c);
            }
        return bad;
    }

    /// <summary>No node strictly inside a triangle (bucketed brute force).</summary>
    public static List<string> NoNodeInside(Mesh m)
    {
        var bad = new List<string>();
        double minX = m.X.Min(), maxX = m.X.Max(), minY = m.Y.Min(), maxY = m.Y.Max();
        int g = Math.Max(1, (int)Math.Sqrt(m.NodeCount / 4.0));
        double sx = g / (maxX - minX + 1e-12), sy = g / (maxY - minY + 1e-12);
        var cells = new List<int>[g + 1, g + 1];
        for (int v = 0; v < m.NodeCount; v++)
        {
            int cx = (int)((m.X[v] - minX) * sx), cy = (int)((m.Y[v] - minY) * sy);
            (cells[cx, cy] ??= new List<int>()).Add(v);
        }
        for (int t = 0; t < m.TriangleCount && bad.Count < 5; t++)
        {
            int a = m.Triangles[3 * t], b = m.Triangles[3 * t + 1], c = m.Triangles[3 * t + 2];
            int x0 = (int)((Math.Min(m.X[a], Math.Min(m.X[b], m.X[c])) - minX) * sx), x1 = (int)((Math.Max(m.X[a], Math.Max(m.X[b], m.X[c])) - minX) * sx);
            int y0 = (int)((Math.Min(m.Y[a], Math.Min(m.Y[b], m.Y[c])) - minY) * sy), y1 = (int)((Math.Max(m.Y[a], Math.Max(m.Y[b], m.Y[c])) - minY) * sy);
            for (int i = x0; i <= x1; i++)
                for (int j = y0; j <= y1; j++)
                    foreach (int v in cells[i, j] ?? Enumerable.Empty<int>())
                    {
                        if (RobustPredicates.Orient(m.X[a], m.Y[a], m.X[b], m.Y[b], m.X[v], m.Y[v]) > 0
                            && RobustPredicates.Orient(m.X[b], m.Y[b], m.X[c], m.Y[c], m.X[v], m.Y[v]) > 0
                            && RobustPredicates.Orient(m.X[c], m.Y[c], m.X[a], m.Y[a], m.X[v], m.Y[v]) > 0)
                            bad.Add($"node {v} inside triangle {t}");
                    }
        }
        return bad;
    }

    /// <summary>Along a vertical cutoff at x from the ground (y = 0) to the tip: no mesh edge crosses it, and
    /// every node on it (except a tip inside the domain) is used by triangles of one side only.</summary>
    public static List<string> SlitOpen(Mesh m, double x, double tip, bool tipShared)
    {
        var bad = new List<string>();
        double tol = 1e-9 * (1 + Math.Abs(x));
        foreach (var (a, b) in Edges(m))
        {
            double xa = m.X[a] - x, xb = m.X[b] - x;
            if (xa * xb >= 0 || Math.Abs(xa) < tol || Math.Abs(xb) < tol) continue;
            double yc = m.Y[a] + (m.Y[b] - m.Y[a]) * (-xa / (xb - xa));
            if (yc < -tol && yc > tip + tol) bad.Add($"edge {a}-{b} crosses the cutoff at y={yc:G6}");
        }
        var side = new Dictionary<int, int>();
        for (int t = 0; t < m.TriangleCount; t++)
        {
            int a = m.Triangles[3 * t], b = m.Triangles[3 * t + 1], c = m.Triangles[3 * t + 2];
            int s = Math.Sign((m.X[a] + m.X[b] + m.X[c]) / 3 - x);
            foreach (int v in new[] { a, b, c })
            {
                if (Math.Abs(m.X[v] - x) > tol || m.Y[v] > tol || m.Y[v] < tip - tol) continue;
                if (tipShared && Math.Abs(m.Y[v] - tip) <= tol) continue;
                if (side.TryGetValue(v, out int prev) && prev != s) bad.Add($"node {v} at y={m.Y[v]:G6} is used on both faces");
                side[v] = s;
            }
        }
        return bad;
    }
}
