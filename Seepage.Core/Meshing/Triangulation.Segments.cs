namespace Seepage.Core.Meshing;

/// <summary>Insertion of constraint segments into a Delaunay triangulation.</summary>
/// <remarks>
/// The triangles crossed by a segment are removed and the two pseudo-polygons on either side are
/// re-triangulated by choosing, for each base edge, the polygon vertex whose circle through the base is
/// empty of the others (the cavity method described by Shewchuk, "Lecture notes on Delaunay mesh
/// generation", 1999, and by Anglada, "An improved incremental algorithm for constructing restricted
/// Delaunay triangulations", Computers &amp; Graphics 21, 1997 — from memory).
/// </remarks>
internal sealed partial class Triangulation
{
    private readonly List<int> _left = new(), _right = new(), _dead = new(), _newTris = new();

    /// <summary>Vertices found exactly on a segment's interior while inserting it (segment, vertex).</summary>
    public readonly List<(int Segment, int Vertex)> VerticesOnSegments = new();

    /// <summary>Makes segment a–b a union of edges marked with <paramref name="segment"/>. Throws when it
    /// crosses an already inserted segment.</summary>
    public void InsertSegment(int a, int b, int segment, Func<int, string> describeSegment)
    {
        int guard = 0;
        while (a != b)
        {
            if (++guard > VertexCount + 8) throw new MeshingException($"Could not insert {describeSegment(segment)} (internal error).");
            int h = FindEdge(a, b);
            if (h >= 0) { Constrain(h, segment); return; }
            int end = InsertCrossing(a, b, segment, describeSegment);
            if (end != b) VerticesOnSegments.Add((segment, end));
            a = end;
        }
    }

    // Removes the triangles crossed by a→b up to b or the first vertex exactly on the segment, re-triangulates,
    // constrains the new edge and returns its far end.
    private int InsertCrossing(int a, int b, int segment, Func<int, string> describeSegment)
    {
        _left.Clear(); _right.Clear(); _dead.Clear();
        TrianglesAround(a, _fan);
        int start = -1;
        foreach (int t in _fan)
        {
            int i = IndexOf(t, a);
            int u = V[3 * t + (i + 1) % 3], w = V[3 * t + (i + 2) % 3];
            double ou = Orient(a, u, b), ow = Orient(a, w, b);
            if (ou == 0 && Dot(a, u, b) > 0) { ConstrainExisting(a, u, segment); return u; }
            if (ow == 0 && Dot(a, w, b) > 0) { ConstrainExisting(a, w, segment); return w; }
            if (ou > 0 && ow < 0) { start = 3 * t + i; break; }
        }
        if (start < 0) throw new MeshingException($"Could not find where {describeSegment(segment)} leaves vertex {a} (internal error).");
        int hCross = start;
        _right.Add(Org(hCross)); _left.Add(Dst(hCross));
        _dead.Add(hCross / 3);
        int end;
        while (true)
        {
            if (Mark[hCross] != 0)
                throw new MeshingException($"{describeSegment(segment)} crosses {describeSegment(Mark[hCross] - 1)}.");
            int n = N[hCross];
            if (n < 0) throw new MeshingException($"{describeSegment(segment)} leaves the triangulated region (internal error).");
            int t = n / 3;
            _dead.Add(t);
            int d = Apex(n);
            if (d == b) { end = b; break; }
            double o = Orient(a, b, d);
            if (o == 0) { end = d; break; }
            int right = Dst(n), left = Org(n); // n runs left → right seen from t
            if (o > 0) { _left.Add(d); hCross = EdgeOf(t, right, d); }
            else { _right.Add(d); hCross = EdgeOf(t, d, left); }
        }
        Retriangulate(a, end, segment);
        return end;
    }

    private int EdgeOf(int t, int from, int to)
    {
        for (int i = 0; i < 3; i++)
        {
            int h = 3 * t + i;
            if (Org(h) == from && Dst(h) == to) return h;
        }
        throw new MeshingException("Edge lookup failed (internal error).");
    }

    private void ConstrainExisting(int a, int u, int segment) => Constrain(FindEdge(a, u), segment);

    private double Dot(int a, int u, int b) => (X[u] - X[a]) * (X[b] - X[a]) + (Y[u] - Y[a]) * (Y[b] - Y[a]);

    private void Retriangulate(int a, int end, int segment)
    {
        // Record the outer edges of the removed region, then fill both sides.
        _stamp++;
        foreach (int t in _dead) _triStamp[t] = 2 * _stamp;
        var outer = new Dictionary<long, (int Twin, int Mark)>();
        foreach (int t in _dead)
            for (int i = 0; i < 3; i++)
            {
                int h = 3 * t + i;
                int n = N[h];
                if (n >= 0 && _triStamp[n / 3] == 2 * _stamp) continue;
                outer[Key(Org(h), Dst(h))] = (n, Mark[h]);
            }
        foreach (int t in _dead) Kill(t);
        _newTris.Clear();
        FillPolygon(a, end, _left, 0, _left.Count);
        _right.Reverse();
        FillPolygon(end, a, _right, 0, _right.Count);
        var inner = new Dictionary<long, int>();
        foreach (int t in _newTris)
            for (int i = 0; i < 3; i++) inner[Key(Org(3 * t + i), Dst(3 * t + i))] = 3 * t + i;
        foreach (int t in _newTris)
            for (int i = 0; i < 3; i++)
            {
                int h = 3 * t + i;
                int u = Org(h), v = Dst(h);
                if (inner.TryGetValue(Key(v, u), out int twin)) { N[h] = twin; continue; }
                if (outer.TryGetValue(Key(u, v), out var o)) { Link(h, o.Twin); Mark[h] = o.Mark; }
            }
        Constrain(FindEdge(a, end), segment);
    }

    private static long Key(int u, int v) => ((long)u << 32) | (uint)v;

    // Triangulates the pseudo-polygon with base p→q and chain[from..to) on its left, ordered from p to q.
    private void FillPolygon(int p, int q, List<int> chain, int from, int to)
    {
        if (from >= to) return;
        int best = from;
        for (int k = from + 1; k < to; k++)
        {
            int c = chain[best], d = chain[k];
            double inside = Geometry.RobustPredicates.InCircle(X[p], Y[p], X[q], Y[q], X[c], Y[c], X[d], Y[d]);
            if (inside > 0) best = k;
        }
        int apex = chain[best];
        _newTris.Add(NewTriangle(p, q, apex, -1));
        FillPolygon(p, apex, chain, from, best);
        FillPolygon(apex, q, chain, best + 1, to);
    }
}
