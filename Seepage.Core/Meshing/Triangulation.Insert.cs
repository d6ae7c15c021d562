namespace Seepage.Core.Meshing;

/// <summary>Point location and vertex insertion (Bowyer–Watson cavity, Lawson flips as fallback).</summary>
internal sealed partial class Triangulation
{
    private int[] _triStamp = new int[16];
    private int[] _vertexStamp = new int[16];
    private int[] _vertexStart = new int[16];
    private int _stamp;
    private uint _random = 2463534242u;

    /// <summary>Triangles of the last cavity computed by <see cref="ComputeCavity"/>.</summary>
    public readonly List<int> Cavity = new();
    /// <summary>Half-edges on the boundary of the last cavity, each seen from inside the cavity.</summary>
    public readonly List<int> CavityBoundary = new();
    /// <summary>Triangles created by the last insertion.</summary>
    public readonly List<int> Created = new();
    private readonly Stack<int> _flips = new();
    private readonly List<int> _fan = new();
    private (int U, int V, int Outer, int Mark, int Zone)[] _ring = new (int, int, int, int, int)[64];

    private void GrowVertexScratch(int n)
    {
        Array.Resize(ref _vertexStamp, n);
        Array.Resize(ref _vertexStart, n);
    }

    private void GrowTriangleScratch(int n) => Array.Resize(ref _triStamp, n);

    private int NextRandom()
    {
        _random ^= _random << 13; _random ^= _random >> 17; _random ^= _random << 5;
        return (int)(_random % 3);
    }

    /// <summary>Visibility walk (ignores constraints) from triangle t to the triangle holding (px, py).
    /// Returns −1 when the point lies outside the triangulated region. <paramref name="onEdge"/> is a
    /// half-edge of the result that holds the point, or −1; <paramref name="onVertex"/> a coincident vertex.</summary>
    public int Locate(double px, double py, int t, out int onEdge, out int onVertex)
    {
        onEdge = -1; onVertex = -1;
        for (long steps = 0; steps <= 4L * TriangleSlots + 16; steps++)
        {
            int r = NextRandom();
            bool moved = false;
            for (int k = 0; k < 3; k++)
            {
                int h = 3 * t + (r + k) % 3;
                if (Orient(Org(h), Dst(h), px, py) < 0)
                {
                    if (N[h] < 0) return -1;
                    t = N[h] / 3;
                    moved = true;
                    break;
                }
            }
            if (moved) continue;
            ClassifyInside(t, px, py, out onEdge, out onVertex);
            return t;
        }
        throw new MeshingException("Point location did not terminate (internal error).");
    }

    private void ClassifyInside(int t, double px, double py, out int onEdge, out int onVertex)
    {
        onEdge = -1; onVertex = -1;
        for (int i = 0; i < 3; i++)
        {
            int h = 3 * t + i;
            if (Orient(Org(h), Dst(h), px, py) == 0)
            {
                if (onEdge >= 0)
                {
                    // On two edges: the shared vertex.
                    int a = Org(onEdge), b = Dst(onEdge);
                    onVertex = (a == Org(h) || a == Dst(h)) ? a : b;
                    onEdge = -1;
                    return;
                }
                onEdge = h;
            }
        }
    }

    /// <summary>Straight walk from (ox, oy) inside triangle t towards (px, py). Returns the triangle holding
    /// the point, or −1 when a constrained or boundary edge blocks the way (that half-edge in
    /// <paramref name="blocked"/>). A vertex exactly on the ray counts as left of it (a consistent
    /// symbolic shift of the ray), so the walk always moves forward.</summary>
    public int WalkToward(int t, double ox, double oy, double px, double py, out int blocked, out int onEdge, out int onVertex)
    {
        blocked = -1; onEdge = -1; onVertex = -1;
        for (long steps = 0; steps <= TriangleSlots + 16; steps++)
        {
            int exit = -1;
            bool inside = true;
            for (int i = 0; i < 3; i++)
            {
                int h = 3 * t + i;
                int u = Org(h), w = Dst(h);
                if (Orient(u, w, px, py) >= 0) continue;
                inside = false;
                bool uRight = RobustOrient(ox, oy, px, py, u) < 0;
                bool wLeft = RobustOrient(ox, oy, px, py, w) >= 0;
                if (uRight && wLeft) { exit = h; break; }
                if (exit < 0) exit = -2 - h; // fallback candidate
            }
            if (inside)
            {
                ClassifyInside(t, px, py, out onEdge, out onVertex);
                return t;
            }
            if (exit < -1) exit = -2 - exit;
            if (Mark[exit] != 0 || N[exit] < 0) { blocked = exit; return -1; }
            t = N[exit] / 3;
        }
        return -1; // no progress (cannot happen with exact predicates); the caller gives up on this point

    }

    private double RobustOrient(double ox, double oy, double px, double py, int v) =>
        Geometry.RobustPredicates.Orient(ox, oy, px, py, X[v], Y[v]);

    /// <summary>Finds the Bowyer–Watson cavity of (px, py): triangles reachable from t0 across unconstrained
    /// edges whose circumcircle strictly contains the point. With <paramref name="forced"/> ≥ 0 (a segment
    /// being split at the point) both triangles of that edge start the cavity. Returns false when the cavity
    /// is not a simple polygon star-shaped from the point (then insert with <see cref="InsertByFlips"/>).</summary>
    public bool ComputeCavity(double px, double py, int t0, int forced)
    {
        _stamp++;
        SetForced(forced);
        int inS = 2 * _stamp, outS = 2 * _stamp + 1;
        Cavity.Clear(); CavityBoundary.Clear();
        Cavity.Add(t0); _triStamp[t0] = inS;
        int twin = forced >= 0 ? N[forced] : -1;
        if (twin >= 0) { Cavity.Add(twin / 3); _triStamp[twin / 3] = inS; }
        for (int k = 0; k < Cavity.Count; k++)
        {
            int t = Cavity[k];
            for (int i = 0; i < 3; i++)
            {
                int h = 3 * t + i;
                int n = N[h];
                if (h == forced || (twin >= 0 && h == twin)) continue;
                if (n >= 0 && _triStamp[n / 3] == inS && Mark[h] == 0) continue;
                if (n < 0 || Mark[h] != 0) { CavityBoundary.Add(h); continue; }
                int tn = n / 3;
                if (_triStamp[tn] != outS && InCircle(tn, px, py) > 0)
                {
                    _triStamp[tn] = inS;
                    Cavity.Add(tn);
                }
                else
                {
                    _triStamp[tn] = outS;
                    CavityBoundary.Add(h);
                }
            }
        }
        bool simple = true;
        foreach (int h in CavityBoundary)
        {
            int n = N[h];
            if (n >= 0 && _triStamp[n / 3] == inS) simple = false;        // both faces of a segment
            int u = Org(h);
            if (_vertexStamp[u] == _stamp) simple = false;                 // a vertex met twice
            _vertexStamp[u] = _stamp;
            if (Orient(u, Dst(h), px, py) <= 0) simple = false;           // the fan would fold over
        }
        return simple;
    }

    /// <summary>Replaces the last computed cavity by the fan of triangles joining its boundary to vertex p.
    /// Each new triangle keeps the zone of the cavity triangle it replaces. Fills <see cref="Created"/>.</summary>
    public void CommitCavity(int p)
    {
        int m = CavityBoundary.Count;
        if (_ring.Length < m) Array.Resize(ref _ring, 2 * m);
        for (int k = 0; k < m; k++)
        {
            int h = CavityBoundary[k];
            _ring[k] = (Org(h), Dst(h), N[h], Mark[h], Zone[h / 3]);
        }
        foreach (int t in Cavity) Kill(t);
        Created.Clear();
        for (int k = 0; k < m; k++)
        {
            var (u, v, outer, mark, zone) = _ring[k];
            int t = NewTriangle(u, v, p, zone);
            Link(3 * t + 2, outer);
            Mark[3 * t + 2] = mark;
            _vertexStart[u] = t;
            Created.Add(t);
        }
        foreach (int t in Created)
        {
            int v = V[3 * t + 1];
            if (_vertexStamp[v] == _stamp) Link(3 * t, 3 * _vertexStart[v] + 1);
        }
        if (_forcedMark == 0) return;
        // The split segment continues as p–a and p–b.
        foreach (int t in Created)
        {
            int u = V[3 * t], v = V[3 * t + 1];
            if (u == _forcedA || u == _forcedB) Constrain(3 * t + 1, _forcedMark - 1);
            if (v == _forcedA || v == _forcedB) Constrain(3 * t, _forcedMark - 1);
        }
    }

    private int _forcedMark, _forcedA, _forcedB;

    private void SetForced(int h)
    {
        _forcedMark = h >= 0 ? Mark[h] : 0;
        _forcedA = h >= 0 ? Org(h) : -1;
        _forcedB = h >= 0 ? Dst(h) : -1;
    }

    /// <summary>Inserts vertex p lying in triangle t0 (or on its half-edge <paramref name="onEdge"/>) by
    /// splitting and then restoring the constrained Delaunay property with Lawson flips (never flipping a
    /// constrained edge). Fills <see cref="Created"/> with the triangles around p.</summary>
    public void InsertByFlips(int p, int t0, int onEdge)
    {
        _stamp++;
        SetForced(onEdge);
        Cavity.Clear(); CavityBoundary.Clear();
        Cavity.Add(t0);
        int twin = onEdge >= 0 ? N[onEdge] : -1;
        if (twin >= 0) Cavity.Add(twin / 3);
        foreach (int t in Cavity)
            for (int i = 0; i < 3; i++)
            {
                int h = 3 * t + i;
                if (h == onEdge || h == twin) continue;
                CavityBoundary.Add(h);
                _vertexStamp[Org(h)] = _stamp;
            }
        CommitCavity(p);
        foreach (int t in Created) _flips.Push(3 * t + 2);
        while (_flips.Count > 0)
        {
            int h = _flips.Pop();
            int t = h / 3;
            if (!IsAlive(t) || V[h] != p || Mark[h] != 0 || N[h] < 0) continue;
            int d = Apex(N[h]);
            if (InCircle(t, X[d], Y[d]) <= 0) continue;
            var (e1, e2) = Flip(h);
            _flips.Push(e1);
            _flips.Push(e2);
        }
        TrianglesAround(p, _fan);
        Created.Clear();
        Created.AddRange(_fan);
    }
}
