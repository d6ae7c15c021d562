namespace Seepage.Core.Meshing;

/// <summary>
/// When a triangle needs refining and where its new vertex goes: the quality test (smallest angle), the
/// size test, the exemptions near small input angles, and the off-centre Steiner point.
/// </summary>
/// <remarks>
/// Quality: a triangle is bad when its smallest angle θ_min &lt; θ, tested as area2² &lt; sin²θ · l_mid² · l_max²
/// (sin θ_min = 2A / (l_mid · l_max), the smallest angle lies opposite the shortest edge).
/// Size: bad when √3 · R &gt; h at the centroid (R the circumradius: an equilateral triangle of edge h has
/// R = h/√3). The off-centre of Üngör ("Off-centers: a new type of Steiner points for computing
/// size-optimal quality-guaranteed Delaunay triangulations", LATIN 2004) is used when it lies nearer to the
/// shortest edge than the circumcentre; the factor 0.475·cot(θ/2) follows Shewchuk's Triangle (from memory).
/// Exempt (never split for quality, per the treatment of small input angles in Shewchuk, "Delaunay
/// refinement algorithms for triangular mesh generation", Comput. Geom. 22, 2002): triangles whose smallest
/// angle is enclosed by two constrained edges at one vertex (the angle is the input angle), and triangles
/// whose shortest edge joins two points on different segments at the same distance from the input vertex
/// the segments share, when they meet there at an angle φ under 60° (such an edge would be split for ever)
/// and the triangle's smallest angle is at least φ.
/// </remarks>
internal sealed class TriangleRules
{
    private readonly Triangulation _tri;
    private readonly CleanGraph _graph;
    private readonly SizeField _size;
    private readonly double _sin2;
    private readonly double _offConstant;
    private readonly double _minEdge2;

    public TriangleRules(Triangulation tri, CleanGraph graph, SizeField size, MeshOptions options)
    {
        _tri = tri; _graph = graph; _size = size;
        double theta = options.MinAngle * Math.PI / 180;
        _sin2 = Math.Sin(theta) * Math.Sin(theta);
        _offConstant = 0.475 / Math.Tan(theta / 2);
        double floor = 1e3 * graph.Tolerance;
        _minEdge2 = floor * floor;
    }

    /// <summary>True when triangle t must be refined.</summary>
    public bool IsBad(int t)
    {
        var v = _tri.V; var x = _tri.X; var y = _tri.Y;
        int a = v[3 * t], b = v[3 * t + 1], c = v[3 * t + 2];
        double abx = x[b] - x[a], aby = y[b] - y[a], acx = x[c] - x[a], acy = y[c] - y[a];
        double bcx = x[c] - x[b], bcy = y[c] - y[b];
        double lab = abx * abx + aby * aby, lac = acx * acx + acy * acy, lbc = bcx * bcx + bcy * bcy;
        double area2 = abx * acy - aby * acx;
        double lmin, lmid, lmax;
        int opposite; // local index of the vertex opposite the shortest edge
        if (lab <= lac && lab <= lbc) { lmin = lab; opposite = 2; (lmid, lmax) = lac < lbc ? (lac, lbc) : (lbc, lac); }
        else if (lac <= lbc) { lmin = lac; opposite = 1; (lmid, lmax) = lab < lbc ? (lab, lbc) : (lbc, lab); }
        else { lmin = lbc; opposite = 0; (lmid, lmax) = lab < lac ? (lab, lac) : (lac, lab); }
        if (lmin < _minEdge2) return false;
        double h = _size.At((x[a] + x[b] + x[c]) / 3, (y[a] + y[b] + y[c]) / 3, _tri.Zone[t]);
        // √3·R > h  ⇔  3·lab·lac·lbc > h²·area2²·... with R² = lab·lac·lbc / (4·area2²) ⇒ 3·lab·lac·lbc > 4·h²·area2²
        if (3 * lab * lac * lbc > 4 * h * h * area2 * area2) return true;
        if (area2 * area2 >= _sin2 * lmid * lmax) return false;
        return !IsExempt(t, opposite, area2 * area2 / (lmid * lmax));
    }

    private bool IsExempt(int t, int opposite, double sinMin2)
    {
        var tri = _tri;
        // The smallest angle sits at the vertex opposite the shortest edge; it is an input angle when both
        // edges there are constrained.
        int hNext = 3 * t + (opposite + 1) % 3, hPrev = 3 * t + (opposite + 2) % 3;
        if (tri.Mark[hNext] != 0 && tri.Mark[hPrev] != 0) return true;
        int hShort = 3 * t + opposite;
        int u = tri.Org(hShort), w = tri.Dst(hShort);
        int su = tri.VertexSegment[u], sw = tri.VertexSegment[w];
        if (su < 0 || sw < 0 || su == sw) return false;
        int apex = SharedEndpoint(su, sw);
        if (apex < 0) return false;
        double du = Dist(u, apex), dw = Dist(w, apex);
        if (Math.Abs(du - dw) > 1e-3 * Math.Max(du, dw)) return false;
        // Segments meeting at less than 60°, and the triangle no worse than that input angle φ
        // (sin² of its smallest angle ≥ sin² φ); a worse one is refined like any other.
        double cos = CosAt(apex, su, sw);
        return cos > 0.5 && sinMin2 >= (1 - cos * cos) * (1 - 1e-12);
    }

    private int SharedEndpoint(int s1, int s2)
    {
        var (a1, b1) = _graph.Segments[s1];
        var (a2, b2) = _graph.Segments[s2];
        if (a1 == a2 || a1 == b2) return a1 + InitialTriangulation.Offset;
        if (b1 == a2 || b1 == b2) return b1 + InitialTriangulation.Offset;
        return -1;
    }

    private double CosAt(int apex, int s1, int s2)
    {
        int o1 = Other(s1, apex), o2 = Other(s2, apex);
        double x1 = _tri.X[o1] - _tri.X[apex], y1 = _tri.Y[o1] - _tri.Y[apex];
        double x2 = _tri.X[o2] - _tri.X[apex], y2 = _tri.Y[o2] - _tri.Y[apex];
        return (x1 * x2 + y1 * y2) / Math.Sqrt((x1 * x1 + y1 * y1) * (x2 * x2 + y2 * y2));
    }

    private int Other(int s, int apex)
    {
        var (a, b) = _graph.Segments[s];
        return a + InitialTriangulation.Offset == apex ? b + InitialTriangulation.Offset : a + InitialTriangulation.Offset;
    }

    private double Dist(int p, int q) => Math.Sqrt((_tri.X[p] - _tri.X[q]) * (_tri.X[p] - _tri.X[q]) + (_tri.Y[p] - _tri.Y[q]) * (_tri.Y[p] - _tri.Y[q]));

    /// <summary>The new vertex for bad triangle t: its circumcentre, or the off-centre when nearer to the
    /// shortest edge.</summary>
    public (double X, double Y) SteinerPoint(int t)
    {
        var v = _tri.V; var x = _tri.X; var y = _tri.Y;
        int a = v[3 * t], b = v[3 * t + 1], c = v[3 * t + 2];
        // Rotate so that a→b is the shortest edge.
        double lab = Sq(a, b), lbc = Sq(b, c), lca = Sq(c, a);
        if (lbc < lab && lbc <= lca) (a, b, c) = (b, c, a);
        else if (lca < lab && lca < lbc) (a, b, c) = (c, a, b);
        double bx = x[b] - x[a], by = y[b] - y[a], cx = x[c] - x[a], cy = y[c] - y[a];
        double lb = bx * bx + by * by, lc = cx * cx + cy * cy;
        double d = 2 * (bx * cy - by * cx);
        double ux = (cy * lb - by * lc) / d, uy = (bx * lc - cx * lb) / d;
        // Circumcentre relative to the midpoint of the shortest edge, along its bisector.
        double mx = 0.5 * bx, my = 0.5 * by;
        double ex = ux - mx, ey = uy - my;
        double dist = Math.Sqrt(ex * ex + ey * ey);
        double off = _offConstant * Math.Sqrt(lb);
        if (dist > off && dist > 0)
        {
            ux = mx + ex * (off / dist);
            uy = my + ey * (off / dist);
        }
        return (x[a] + ux, y[a] + uy);
    }

    private double Sq(int p, int q) => (_tri.X[p] - _tri.X[q]) * (_tri.X[p] - _tri.X[q]) + (_tri.Y[p] - _tri.Y[q]) * (_tri.Y[p] - _tri.Y[q]);
}
