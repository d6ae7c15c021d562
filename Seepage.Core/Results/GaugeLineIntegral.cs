using Seepage.Core.Geometry;
using Seepage.Core.Meshing;

namespace Seepage.Core.Results;

/// <summary>
/// Flow across a gauge polyline from the element velocities: Q = Σ ∫ v·n ds over the pieces of the polyline inside
/// each triangle, n the unit normal 90° counter-clockwise from the walking direction. Each segment is cut at every
/// triangle edge it crosses; on each piece the velocity of the triangle holding its midpoint is integrated by
/// two-point Gauss (exact for the linear velocity of quadratic elements, and for the constant one of linear
/// elements). A gauge across the whole domain carries the full discharge up to the discretisation error, since the
/// element velocities of a conforming solution are not exactly conservative across an arbitrary line (and are
/// singular at cutoff tips), which is why <see cref="GaugeCalculator"/> prefers <see cref="GaugeRegions"/>.
/// </summary>
public static class GaugeLineIntegral
{
    /// <summary>Flow (m³/s per m) along the left normal and the length of the polyline inside the soil (m).</summary>
    public static (double Flow, double Length) Compute(FieldSampler sampler, IReadOnlyList<Point2> along)
    {
        double flow = 0, length = 0;
        for (int i = 0; i + 1 < along.Count; i++)
        {
            var (q, l) = Segment(sampler, along[i], along[i + 1]);
            flow += q; length += l;
        }
        return (flow, length);
    }

    private static (double Flow, double Length) Segment(FieldSampler sampler, Point2 p, Point2 q)
    {
        var field = sampler.Field;
        var dir = q - p;
        double len = dir.Length;
        var normal = new Point2(-dir.Y / len, dir.X / len);
        var cuts = new List<double> { 0, 1 };
        foreach (var (_, t0, t1) in Clipped(field.Mesh, p, q)) { cuts.Add(t0); cuts.Add(t1); }
        cuts.Sort();
        double flow = 0, inside = 0;
        double g = 0.5 / Math.Sqrt(3);
        for (int k = 0; k + 1 < cuts.Count; k++)
        {
            double t0 = cuts[k], t1 = cuts[k + 1];
            if (t1 - t0 <= 1e-12) continue;
            int t = sampler.Locate(p + (0.5 * (t0 + t1)) * dir);
            if (t < 0) continue;
            var (l0, l1, l2) = field.Barycentric(t, p + (0.5 * (t0 + t1)) * dir);
            if (Math.Min(l0, Math.Min(l1, l2)) < -1e-6) continue; // the midpoint lies outside the soil
            double piece = (t1 - t0) * len, sum = 0;
            foreach (double s in new[] { 0.5 - g, 0.5 + g })
            {
                var (vx, vy) = field.VelocityAt(t, p + (t0 + s * (t1 - t0)) * dir);
                sum += 0.5 * (vx * normal.X + vy * normal.Y);
            }
            flow += sum * piece;
            inside += piece;
        }
        return (flow, inside);
    }

    /// <summary>Every triangle the segment pq meets, with the parameter range [T0, T1] of p + t·(q − p) inside it
    /// (boxes are compared first, so only triangles near the segment are clipped).</summary>
    internal static IEnumerable<(int Triangle, double T0, double T1)> Clipped(Mesh mesh, Point2 p, Point2 q)
    {
        var tri = mesh.Triangles; var x = mesh.X; var y = mesh.Y;
        var dir = q - p;
        double minX = Math.Min(p.X, q.X), maxX = Math.Max(p.X, q.X), minY = Math.Min(p.Y, q.Y), maxY = Math.Max(p.Y, q.Y);
        for (int t = 0; t < mesh.TriangleCount; t++)
        {
            int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
            if (Math.Max(x[a], Math.Max(x[b], x[c])) < minX || Math.Min(x[a], Math.Min(x[b], x[c])) > maxX
                || Math.Max(y[a], Math.Max(y[b], y[c])) < minY || Math.Min(y[a], Math.Min(y[b], y[c])) > maxY)
                continue;
            if (Clip(p, dir, new Point2(x[a], y[a]), new Point2(x[b], y[b]), new Point2(x[c], y[c])) is { } range)
                yield return (t, range.T0, range.T1);
        }
    }

    // The parameter range [T0, T1] of p + t·dir (0 ≤ t ≤ 1) inside triangle abc (Cyrus–Beck clipping), or null.
    private static (double T0, double T1)? Clip(Point2 p, Point2 dir, Point2 a, Point2 b, Point2 c)
    {
        if (Cross(b - a, c - a) < 0) (b, c) = (c, b);
        double t0 = 0, t1 = 1;
        foreach (var (u, v) in new[] { (a, b), (b, c), (c, a) })
        {
            var e = v - u;
            double f0 = Cross(e, p - u), df = Cross(e, dir); // inside: f0 + t·df ≥ 0
            if (Math.Abs(df) < 1e-300) { if (f0 < 0) return null; continue; }
            double t = -f0 / df;
            if (df > 0) t0 = Math.Max(t0, t); else t1 = Math.Min(t1, t);
            if (t0 > t1) return null;
        }
        return (t0, t1);
    }

    private static double Cross(Point2 u, Point2 v) => u.X * v.Y - u.Y * v.X;
}
