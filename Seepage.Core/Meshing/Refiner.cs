namespace Seepage.Core.Meshing;

/// <summary>
/// Delaunay refinement of a constrained Delaunay triangulation (Ruppert, "A Delaunay refinement algorithm
/// for quality 2-dimensional mesh generation", J. Algorithms 18, 1995; Shewchuk, "Delaunay refinement
/// algorithms for triangular mesh generation", Comput. Geom. 22, 2002).
/// </summary>
/// <remarks>
/// Encroached subsegments (a vertex inside the diametral circle, seen from an adjacent triangle) are split
/// first. A bad triangle (see <see cref="TriangleRules"/>) gets its off-centre or circumcentre; when that
/// point lies beyond a segment, or would encroach a subsegment on the boundary of its cavity, the
/// subsegment is split instead and the triangle waits. A subsegment with exactly one end at an input vertex
/// is split at the power-of-two distance from that vertex nearest to its middle (Ruppert's concentric
/// shells), so that segments meeting at small angles stop encroaching each other.
/// </remarks>
internal sealed class Refiner
{
    private readonly Triangulation _tri;
    private readonly TriangleRules _rules;
    private readonly MeshOptions _options;
    private readonly CancellationToken _cancellation;
    private readonly double _minSegment2;
    private readonly Queue<(int U, int V, bool Force)> _segments = new();
    private readonly BadTriangleQueue _bad = new();

    public Refiner(Triangulation tri, TriangleRules rules, CleanGraph graph, MeshOptions options, CancellationToken cancellation)
    {
        _tri = tri; _rules = rules; _options = options; _cancellation = cancellation;
        double floor = 2e3 * graph.Tolerance;
        _minSegment2 = floor * floor;
    }

    public void Run()
    {
        var tri = _tri;
        for (int t = 0; t < tri.TriangleSlots; t++)
            if (tri.IsAlive(t)) QueueEncroachedEdges(t);
        SplitSegments();
        for (int t = 0; t < tri.TriangleSlots; t++)
            if (tri.IsAlive(t) && _rules.IsBad(t)) _bad.Add(tri, t);
        long steps = 0;
        while (_bad.TryTake(tri, out int bad))
        {
            if ((++steps & 1023) == 0) _cancellation.ThrowIfCancellationRequested();
            var (px, py) = _rules.SteinerPoint(bad);
            if (!double.IsFinite(px) || !double.IsFinite(py)) continue;
            int a = tri.V[3 * bad], b = tri.V[3 * bad + 1], c = tri.V[3 * bad + 2];
            double ox = (tri.X[a] + tri.X[b] + tri.X[c]) / 3, oy = (tri.Y[a] + tri.Y[b] + tri.Y[c]) / 3;
            int at = tri.WalkToward(bad, ox, oy, px, py, out int blocked, out int onEdge, out int onVertex);
            if (at < 0 || (onEdge >= 0 && tri.Mark[onEdge] != 0))
            {
                int h = at < 0 ? blocked : onEdge;
                if (h >= 0) _segments.Enqueue((tri.Org(h), tri.Dst(h), true));
                if (SplitSegments() > 0) Requeue(bad);
                continue;
            }
            if (onVertex >= 0) continue;
            bool simple = tri.ComputeCavity(px, py, at, -1);
            bool encroaches = false;
            foreach (int h in tri.CavityBoundary)
            {
                if (tri.Mark[h] == 0 || !Encroaches(px, py, tri.Org(h), tri.Dst(h))) continue;
                _segments.Enqueue((tri.Org(h), tri.Dst(h), true));
                encroaches = true;
            }
            if (encroaches)
            {
                if (SplitSegments() > 0) Requeue(bad);
                continue;
            }
            int p = tri.AddVertex(px, py);
            if (simple) tri.CommitCavity(p);
            else tri.InsertByFlips(p, at, onEdge);
            AfterInsertion();
            if (_segments.Count > 0) SplitSegments();
        }
    }

    private void Requeue(int t)
    {
        if (_tri.IsAlive(t) && _rules.IsBad(t)) _bad.Add(_tri, t);
    }

    private void AfterInsertion()
    {
        var tri = _tri;
        if (tri.AliveTriangles > _options.MaxTriangles)
            throw new MeshingException($"The mesh would exceed MaxTriangles = {_options.MaxTriangles}; use a larger Size or raise the cap.");
        foreach (int t in tri.Created)
        {
            if (_rules.IsBad(t)) _bad.Add(tri, t);
            QueueEncroachedEdges(t);
        }
    }

    private void QueueEncroachedEdges(int t)
    {
        var tri = _tri;
        for (int i = 0; i < 3; i++)
        {
            int h = 3 * t + i;
            if (tri.Mark[h] == 0) continue;
            int apex = tri.V[h];
            if (Encroaches(tri.X[apex], tri.Y[apex], tri.Org(h), tri.Dst(h)))
                _segments.Enqueue((tri.Org(h), tri.Dst(h), false));
        }
    }

    private bool Encroaches(double px, double py, int a, int b) =>
        (_tri.X[a] - px) * (_tri.X[b] - px) + (_tri.Y[a] - py) * (_tri.Y[b] - py) < 0;

    private long _splitSteps;

    private int SplitSegments()
    {
        int split = 0;
        while (_segments.TryDequeue(out var s))
        {
            if ((++_splitSteps & 1023) == 0) _cancellation.ThrowIfCancellationRequested();
            int h = _tri.FindEdge(s.U, s.V);
            if (h < 0 || _tri.Mark[h] == 0) continue;
            if (!s.Force && !IsEncroached(h)) continue;
            if (SplitAt(h)) split++;
        }
        return split;
    }

    private bool IsEncroached(int h)
    {
        var tri = _tri;
        int a = tri.Org(h), b = tri.Dst(h);
        int apex = tri.V[h];
        if (Encroaches(tri.X[apex], tri.Y[apex], a, b)) return true;
        int n = tri.N[h];
        if (n < 0) return false;
        apex = tri.V[n];
        return Encroaches(tri.X[apex], tri.Y[apex], a, b);
    }

    private bool SplitAt(int h)
    {
        var tri = _tri;
        int u = tri.Org(h), w = tri.Dst(h);
        double dx = tri.X[w] - tri.X[u], dy = tri.Y[w] - tri.Y[u];
        double len2 = dx * dx + dy * dy;
        if (len2 < _minSegment2) return false;
        int segment = tri.Mark[h] - 1;
        bool inputU = tri.VertexSegment[u] < 0, inputW = tri.VertexSegment[w] < 0;
        double f = 0.5;
        if (inputU != inputW)
        {
            double len = Math.Sqrt(len2);
            double d = Math.Pow(2, Math.Round(Math.Log2(0.5 * len)));
            f = inputU ? d / len : 1 - d / len;
        }
        double px = tri.X[u] + f * dx, py = tri.Y[u] + f * dy;
        int p = tri.AddVertex(px, py, segment);
        if (tri.ComputeCavity(px, py, h / 3, h)) tri.CommitCavity(p);
        else tri.InsertByFlips(p, h / 3, h);
        AfterInsertion();
        return true;
    }
}
