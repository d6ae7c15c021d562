namespace Seepage.Core.Meshing;

/// <summary>
/// Wanted edge length (metres) over the domain: the smallest of the zone's size (its seed's size, capped by
/// <see cref="MeshOptions.Size"/>) and of every size target grown linearly with distance,
/// h(x) = min(h_zone, min_i (s_i + (G − 1)·|x − x_i|)), G = <see cref="MeshOptions.Grading"/>. Two
/// elements of size h one element apart then differ in size by at most the factor G. Interfaces between
/// zones of different sizes act as line targets of the smaller size (see <see cref="AddZoneInterfaces"/>).
/// </summary>
internal sealed class SizeField
{
    private readonly double[] _zoneSize;
    private readonly double _defaultSize;
    private readonly double[] _tx, _ty, _ts;
    private readonly double _slope;

    public SizeField(PlanarGraph graph, MeshOptions options)
    {
        _defaultSize = options.Size;
        int maxZone = graph.Regions.Count == 0 ? 0 : graph.Regions.Max(r => r.Zone);
        _zoneSize = new double[maxZone + 1];
        Array.Fill(_zoneSize, options.Size);
        foreach (var r in graph.Regions)
            if (r.Size is double s && s > 0) _zoneSize[r.Zone] = Math.Min(_zoneSize[r.Zone], s);
        var targets = graph.RefineNear.Where(t => t.Size > 0 && double.IsFinite(t.Point.X) && double.IsFinite(t.Point.Y)).ToArray();
        _tx = targets.Select(t => t.Point.X).ToArray();
        _ty = targets.Select(t => t.Point.Y).ToArray();
        _ts = targets.Select(t => t.Size).ToArray();
        _slope = Math.Max(options.Grading - 1, 0.05);
        Smallest = Math.Min(_zoneSize.Min(), _ts.Length > 0 ? _ts.Min() : double.PositiveInfinity);
    }

    /// <summary>The smallest size anywhere, metres.</summary>
    public double Smallest { get; }

    /// <summary>Rough number of triangles refinement will make in triangle t of <paramref name="tri"/>:
    /// about 4.2 per h² of area (measured on the benchmark section: edges end up shorter than h).</summary>
    public double EstimateTriangles(Triangulation tri, int t)
    {
        int a = tri.V[3 * t], b = tri.V[3 * t + 1], c = tri.V[3 * t + 2];
        double area = 0.5 * Math.Abs((tri.X[b] - tri.X[a]) * (tri.Y[c] - tri.Y[a]) - (tri.Y[b] - tri.Y[a]) * (tri.X[c] - tri.X[a]));
        double gx = (tri.X[a] + tri.X[b] + tri.X[c]) / 3, gy = (tri.Y[a] + tri.Y[b] + tri.Y[c]) / 3;
        double sum = 0;
        foreach (var (px, py) in new[] { (gx, gy), (tri.X[a], tri.Y[a]), (tri.X[b], tri.Y[b]), (tri.X[c], tri.Y[c]) })
        {
            double h = At(0.5 * (px + gx), 0.5 * (py + gy), tri.Zone[t]);
            sum += 1 / (h * h);
        }
        return 4.2 * area * sum / 4;
    }

    private readonly List<(double Ax, double Ay, double Bx, double By, double Size)> _lines = new();

    /// <summary>Grades sizes across zone interfaces too: every segment between a zone of smaller size and
    /// one of larger size becomes a line target with the smaller size, so the coarser zone coarsens by the
    /// grading factor away from the interface instead of jumping.</summary>
    public void AddZoneInterfaces(Triangulation tri, CleanGraph graph)
    {
        var best = new Dictionary<int, double>();
        for (int t = 0; t < tri.TriangleSlots; t++)
        {
            if (!tri.IsAlive(t)) continue;
            for (int i = 0; i < 3; i++)
            {
                int h = 3 * t + i, n = tri.N[h];
                if (tri.Mark[h] == 0 || n < 0) continue;
                double here = ZoneSize(tri.Zone[t]), there = ZoneSize(tri.Zone[n / 3]);
                if (!(here < there)) continue;
                int seg = tri.Mark[h] - 1;
                if (!best.TryGetValue(seg, out double old) || here < old) best[seg] = here;
            }
        }
        foreach (int seg in best.Keys.OrderBy(k => k)) // segment order: deterministic
        {
            var (a, b) = graph.Segments[seg];
            _lines.Add((graph.X[a], graph.Y[a], graph.X[b], graph.Y[b], best[seg]));
        }
    }

    private double ZoneSize(int zone) => zone >= 0 && zone < _zoneSize.Length ? _zoneSize[zone] : _defaultSize;

    public double At(double x, double y, int zone)
    {
        double h = ZoneSize(zone);
        foreach (var (ax, ay, bx, by, size) in _lines)
        {
            if (size >= h) continue;
            double dx = bx - ax, dy = by - ay;
            double f = Math.Clamp(((x - ax) * dx + (y - ay) * dy) / (dx * dx + dy * dy), 0, 1);
            double ex = x - ax - f * dx, ey = y - ay - f * dy;
            double lower = size + _slope * Math.Sqrt(ex * ex + ey * ey);
            if (lower < h) h = lower;
        }
        for (int i = 0; i < _tx.Length; i++)
        {
            double dx = x - _tx[i], dy = y - _ty[i];
            double lower = _ts[i] + _slope * Math.Sqrt(dx * dx + dy * dy);
            if (lower < h) h = lower;
        }
        return h;
    }
}
