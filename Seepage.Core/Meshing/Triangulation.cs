using Seepage.Core.Geometry;

namespace Seepage.Core.Meshing;

/// <summary>
/// Index-based triangulation used while meshing: no object per triangle. Triangle t owns slots 3t..3t+2 of
/// <see cref="V"/> (its vertices, counter-clockwise), of <see cref="N"/> and of <see cref="Mark"/>. Slot 3t+i
/// also names the half-edge of t opposite its vertex i, running from vertex i+1 to vertex i+2.
/// </summary>
/// <remarks>
/// N[h] is the twin half-edge in the neighbouring triangle, or −1 on the boundary of the triangulated
/// region. Mark[h] is 1 + the index of the input segment the edge lies on, or 0 for an unconstrained edge.
/// A dead triangle has V[3t] = −1 and its slot sits on a free list for reuse.
/// </remarks>
internal sealed partial class Triangulation
{
    public double[] X = new double[16], Y = new double[16];
    public int[] VertexTri = new int[16];
    /// <summary>Index of the input segment a Steiner vertex was inserted on, −1 otherwise.</summary>
    public int[] VertexSegment = new int[16];
    public int VertexCount;

    public int[] V = new int[48], N = new int[48], Mark = new int[48];
    public int[] Zone = new int[16];
    public int TriangleSlots;
    public int AliveTriangles;
    private int[] _free = new int[16];
    private int _freeCount;

    /// <summary>Grows the arrays once to hold about <paramref name="triangles"/> triangles and half as many
    /// vertices, so that refinement does not reallocate (and leave garbage) as it goes.</summary>
    public void Reserve(int triangles)
    {
        int nt = Math.Max(triangles, Zone.Length);
        if (nt > Zone.Length)
        {
            Array.Resize(ref V, 3 * nt); Array.Resize(ref N, 3 * nt); Array.Resize(ref Mark, 3 * nt);
            Array.Resize(ref Zone, nt);
            GrowTriangleScratch(nt);
        }
        int nv = Math.Max(triangles / 2 + 16, X.Length);
        if (nv > X.Length)
        {
            Array.Resize(ref X, nv); Array.Resize(ref Y, nv);
            Array.Resize(ref VertexTri, nv); Array.Resize(ref VertexSegment, nv);
            GrowVertexScratch(nv);
        }
    }

    public int AddVertex(double x, double y, int segment = -1)
    {
        if (VertexCount == X.Length)
        {
            int n = X.Length * 2;
            Array.Resize(ref X, n); Array.Resize(ref Y, n);
            Array.Resize(ref VertexTri, n); Array.Resize(ref VertexSegment, n);
            GrowVertexScratch(n);
        }
        X[VertexCount] = x; Y[VertexCount] = y; VertexTri[VertexCount] = -1; VertexSegment[VertexCount] = segment;
        return VertexCount++;
    }

    public int NewTriangle(int a, int b, int c, int zone)
    {
        int t;
        if (_freeCount > 0) t = _free[--_freeCount];
        else
        {
            if (TriangleSlots == Zone.Length)
            {
                int n = Zone.Length * 2;
                Array.Resize(ref V, 3 * n); Array.Resize(ref N, 3 * n); Array.Resize(ref Mark, 3 * n);
                Array.Resize(ref Zone, n);
                GrowTriangleScratch(n);
            }
            t = TriangleSlots++;
        }
        int h = 3 * t;
        V[h] = a; V[h + 1] = b; V[h + 2] = c;
        N[h] = N[h + 1] = N[h + 2] = -1;
        Mark[h] = Mark[h + 1] = Mark[h + 2] = 0;
        Zone[t] = zone;
        VertexTri[a] = t; VertexTri[b] = t; VertexTri[c] = t;
        AliveTriangles++;
        return t;
    }

    public void Kill(int t)
    {
        if (V[3 * t] < 0) return;
        V[3 * t] = -1;
        if (_freeCount == _free.Length) Array.Resize(ref _free, _free.Length * 2);
        _free[_freeCount++] = t;
        AliveTriangles--;
    }

    public bool IsAlive(int t) => V[3 * t] >= 0;

    /// <summary>Points every vertex at one of its live triangles again (after triangles were removed
    /// without replacement or vertices were renamed).</summary>
    public void RepairVertexTriangles()
    {
        for (int t = 0; t < TriangleSlots; t++)
        {
            if (!IsAlive(t)) continue;
            VertexTri[V[3 * t]] = t; VertexTri[V[3 * t + 1]] = t; VertexTri[V[3 * t + 2]] = t;
        }
    }

    /// <summary>Makes h1 and h2 twins (h2 may be −1: boundary).</summary>
    public void Link(int h1, int h2)
    {
        N[h1] = h2;
        if (h2 >= 0) N[h2] = h1;
    }

    public static int Next(int h) => h % 3 == 2 ? h - 2 : h + 1;
    public static int Prev(int h) => h % 3 == 0 ? h + 2 : h - 1;

    /// <summary>Origin vertex of half-edge h.</summary>
    public int Org(int h) => V[Next(h)];
    /// <summary>Destination vertex of half-edge h.</summary>
    public int Dst(int h) => V[Prev(h)];
    /// <summary>The vertex of h's triangle opposite h.</summary>
    public int Apex(int h) => V[h];

    public double Orient(int a, int b, int c) => RobustPredicates.Orient(X[a], Y[a], X[b], Y[b], X[c], Y[c]);

    public double Orient(int a, int b, double px, double py) => RobustPredicates.Orient(X[a], Y[a], X[b], Y[b], px, py);

    /// <summary>In-circle test of point (px, py) against triangle t (positive: strictly inside).</summary>
    public double InCircle(int t, double px, double py)
    {
        int a = V[3 * t], b = V[3 * t + 1], c = V[3 * t + 2];
        return RobustPredicates.InCircle(X[a], Y[a], X[b], Y[b], X[c], Y[c], px, py);
    }

    /// <summary>Local index (0–2) of vertex v in triangle t, or −1.</summary>
    public int IndexOf(int t, int v)
    {
        int h = 3 * t;
        if (V[h] == v) return 0;
        if (V[h + 1] == v) return 1;
        return V[h + 2] == v ? 2 : -1;
    }

    /// <summary>A half-edge joining a and b (either direction; prefers a→b), or −1 when a–b is not an edge.</summary>
    public int FindEdge(int a, int b)
    {
        int t0 = VertexTri[a];
        if (t0 < 0 || !IsAlive(t0)) return -1;
        int t = t0;
        int guard = 0;
        while (true)
        {
            if (++guard > 200000) throw new MeshingException($"Corrupt adjacency around vertex {a} (internal error).");
            int n = N[3 * t + (IndexOf(t, a) + 2) % 3];
            if (n < 0) break;
            t = n / 3;
            if (t == t0) break;
        }
        int start = t;
        while (true)
        {
            int i = IndexOf(t, a);
            if (V[3 * t + (i + 1) % 3] == b) return 3 * t + (i + 2) % 3;
            if (V[3 * t + (i + 2) % 3] == b) return N[3 * t + (i + 1) % 3] >= 0 ? N[3 * t + (i + 1) % 3] : 3 * t + (i + 1) % 3;
            int n = N[3 * t + (i + 1) % 3];
            if (n < 0) return -1;
            t = n / 3;
            if (t == start) return -1;
        }
    }

    /// <summary>Fills <paramref name="fan"/> with the triangles around v in counter-clockwise order; when v
    /// lies on the boundary the list starts just after a boundary edge. Returns true when v is on the boundary.</summary>
    public bool TrianglesAround(int v, List<int> fan)
    {
        fan.Clear();
        int t0 = VertexTri[v];
        int t = t0;
        int guard = 0;
        // Turn clockwise to a boundary edge (or all the way round).
        while (true)
        {
            if (++guard > 100000) throw new MeshingException($"Corrupt adjacency around vertex {v} (internal error).");
            int i = IndexOf(t, v);
            int n = N[3 * t + (i + 2) % 3];         // edge v -> V[i+1]; the clockwise neighbour
            if (n < 0) break;
            t = n / 3;
            if (t == t0) break;
        }
        int start = t;
        bool boundary = N[3 * start + (IndexOf(start, v) + 2) % 3] < 0;
        t = start;
        while (true)
        {
            if (++guard > 200000) throw new MeshingException($"Corrupt adjacency around vertex {v} (internal error).");
            fan.Add(t);
            int n = N[3 * t + (IndexOf(t, v) + 1) % 3]; // edge V[i+2] -> v; the counter-clockwise neighbour
            if (n < 0) break;
            t = n / 3;
            if (t == start) break;
        }
        return boundary;
    }

    /// <summary>Swaps the diagonal of the quadrilateral formed by the two triangles sharing half-edge h.
    /// With h opposite vertex a in (a, b, c) and its twin opposite d, the result is (a, b, d) and (a, d, c),
    /// both kept in the old slots; returns the half-edges b→d and d→c (opposite a) for further checks.</summary>
    public (int, int) Flip(int h)
    {
        int t1 = h / 3, i1 = h % 3;
        int h2 = N[h];
        int t2 = h2 / 3, i2 = h2 % 3;
        int a = V[h], b = V[3 * t1 + (i1 + 1) % 3], c = V[3 * t1 + (i1 + 2) % 3];
        int d = V[h2];
        int hCa = 3 * t1 + (i1 + 1) % 3, hAb = 3 * t1 + (i1 + 2) % 3;  // in t1: opposite b, opposite c
        int hBd = 3 * t2 + (i2 + 1) % 3, hDc = 3 * t2 + (i2 + 2) % 3;  // in t2 = (d, c, b): opposite c, opposite b
        int nCa = N[hCa], nAb = N[hAb], nBd = N[hBd], nDc = N[hDc];
        int mCa = Mark[hCa], mAb = Mark[hAb], mBd = Mark[hBd], mDc = Mark[hDc];
        int p = 3 * t1, q = 3 * t2;
        V[p] = a; V[p + 1] = b; V[p + 2] = d;
        V[q] = a; V[q + 1] = d; V[q + 2] = c;
        Link(p, nBd); Mark[p] = mBd;
        Link(p + 2, nAb); Mark[p + 2] = mAb;
        Link(q, nDc); Mark[q] = mDc;
        Link(q + 1, nCa); Mark[q + 1] = mCa;
        Link(p + 1, q + 2); Mark[p + 1] = 0; Mark[q + 2] = 0;
        VertexTri[a] = t1; VertexTri[b] = t1; VertexTri[d] = t1; VertexTri[c] = t2;
        return (p, q);
    }

    /// <summary>Marks the edge a–b (both half-edges) as lying on input segment <paramref name="segment"/>.</summary>
    public void Constrain(int h, int segment)
    {
        Mark[h] = segment + 1;
        if (N[h] >= 0) Mark[N[h]] = segment + 1;
    }

    public Point2 Point(int v) => new(X[v], Y[v]);
}
