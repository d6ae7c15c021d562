using Seepage.Core.Fem;
using Seepage.Core.Geometry;
using Seepage.Core.Meshing;

namespace Seepage.Core.Results;

/// <summary>
/// Conservative flow across a gauge that parts the section in two. The triangles the polyline passes through are
/// "crossed"; the others are grouped into pieces joined across shared edges (the two faces of a cutoff slit share no
/// edge), and each piece takes the side of the gauge (right or left of the walking direction) of its triangles
/// next to the crossed ones. The unknowns of crossed triangles take their own side. The flow crossing the gauge
/// toward its left normal is then the flow entering the soil through the fixed-head boundaries of the right side,
/// Q = Σ_right R_i with the consistent nodal fluxes R = K h. This is the weak-form flux ∫ K∇h·∇w dA with w the finite
/// element indicator of the right side, so it balances with the boundary flows to the solver's residual and is not
/// spoiled by the singular velocity at a cutoff tip (continuity; common practice in finite element post-processing).
/// When a piece lies on both sides the gauge does not part the section (it ends inside the soil): null.
/// </summary>
public sealed class GaugeRegions
{
    private readonly HeadField _field;
    private readonly Mesh _mesh;
    private readonly int[] _neighbours; // three per triangle, −1 on the boundary

    public GaugeRegions(HeadField field)
    {
        _field = field;
        var mesh = _mesh = field.Mesh;
        var tri = mesh.Triangles;
        _neighbours = new int[3 * mesh.TriangleCount];
        Array.Fill(_neighbours, -1);
        var open = new Dictionary<long, int>(3 * mesh.TriangleCount / 2 + 16, EdgeKey.Comparer);
        for (int t = 0; t < mesh.TriangleCount; t++)
            for (int k = 0; k < 3; k++)
            {
                int i = tri[3 * t + k], j = tri[3 * t + (k + 1) % 3];
                long key = EdgeKey.Of(i, j);
                if (open.Remove(key, out int other))
                {
                    _neighbours[3 * t + k] = other / 3 == t ? -1 : other / 3;
                    _neighbours[other] = t;
                }
                else open[key] = 3 * t + k;
            }
    }

    /// <summary>The flow (m³/s per m) toward the left normal of the walking direction, or null when the polyline does
    /// not part the section. <paramref name="reactions"/> holds K h at fixed unknowns and zero elsewhere.</summary>
    public double? Flow(IReadOnlyList<Point2> along, double[] reactions, bool[] isFixed)
    {
        var mesh = _mesh; var tri = mesh.Triangles; var quadratic = _field.Quadratic;
        int nt = mesh.TriangleCount;
        var crossed = Crossed(along);
        if (!crossed.Contains(true)) return null;

        // Pieces of the uncrossed triangles, each labelled by the side of its triangles that share an edge with a
        // crossed one (a vertex is not enough: past the start at a cutoff tip the line's extension is not the wall).
        var piece = new int[nt];
        Array.Fill(piece, -1);
        var sides = new List<int>(); // per piece: bit 1 right, bit 2 left
        var stack = new Stack<int>();
        for (int s = 0; s < nt; s++)
        {
            if (crossed[s] || piece[s] >= 0) continue;
            int id = sides.Count, side = 0;
            piece[s] = id; stack.Push(s);
            while (stack.Count > 0)
            {
                int t = stack.Pop();
                if (NextToCrossed(t, crossed)) side |= SideOf(along, Centroid(t)) ? 1 : 2;
                for (int k = 0; k < 3; k++)
                {
                    int u = _neighbours[3 * t + k];
                    if (u >= 0 && !crossed[u] && piece[u] < 0) { piece[u] = id; stack.Push(u); }
                }
            }
            if (side == 3) return null;
            sides.Add(side);
        }

        // The side of every unknown: its own where a crossed triangle holds it, else its piece's.
        int count = quadratic?.Count ?? mesh.NodeCount;
        var right = new sbyte[count]; // 0 unknown, 1 right, 2 left
        int perTriangle = quadratic is null ? 3 : 6;
        for (int t = 0; t < nt; t++)
            if (!crossed[t] && sides[piece[t]] != 0)
                for (int k = 0; k < perTriangle; k++)
                {
                    int dof = quadratic is null ? tri[3 * t + k] : quadratic.Elements[6 * t + k];
                    if (right[dof] == 0) right[dof] = (sbyte)(sides[piece[t]] == 1 ? 1 : 2);
                }
        // Crossed triangles win over pieces: set last.
        for (int t = 0; t < nt; t++)
            if (crossed[t])
                for (int k = 0; k < perTriangle; k++)
                {
                    int dof = quadratic is null ? tri[3 * t + k] : quadratic.Elements[6 * t + k];
                    right[dof] = SideOf(along, Position(dof, quadratic)) ? (sbyte)1 : (sbyte)2;
                }
        double flow = 0;
        for (int i = 0; i < count; i++)
            if (isFixed[i] && right[i] == 1) flow += reactions[i];
        return flow;
    }

    private bool NextToCrossed(int t, bool[] crossed)
    {
        for (int k = 0; k < 3; k++)
            if (_neighbours[3 * t + k] is var u && u >= 0 && crossed[u]) return true;
        return false;
    }

    private bool[] Crossed(IReadOnlyList<Point2> along)
    {
        var crossed = new bool[_mesh.TriangleCount];
        for (int s = 0; s + 1 < along.Count; s++)
        {
            Point2 p = along[s], dir = along[s + 1] - p;
            foreach (var (t, t0, t1) in GaugeLineIntegral.Clipped(_mesh, p, along[s + 1]))
                // Crossed only when the polyline runs through the inside, not when it touches a vertex or an edge end.
                if (!crossed[t] && t1 - t0 > 1e-9 && StrictlyInside(t, p + (0.5 * (t0 + t1)) * dir)) crossed[t] = true;
        }
        return crossed;
    }

    // Whether p lies strictly inside triangle t (not on an edge).
    private bool StrictlyInside(int t, Point2 p)
    {
        var (l0, l1, l2) = _field.Barycentric(t, p);
        const double eps = 1e-12;
        return l0 > eps && l1 > eps && l2 > eps;
    }

    private Point2 Centroid(int t)
    {
        var tri = _mesh.Triangles;
        int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
        return new Point2((_mesh.X[a] + _mesh.X[b] + _mesh.X[c]) / 3, (_mesh.Y[a] + _mesh.Y[b] + _mesh.Y[c]) / 3);
    }

    private Point2 Position(int dof, QuadraticDofs? quadratic) =>
        quadratic is null ? new Point2(_mesh.X[dof], _mesh.Y[dof]) : new Point2(quadratic.X[dof], quadratic.Y[dof]);

    /// <summary>Whether p lies right of the polyline (walking direction), judged at its nearest point; at an inner
    /// vertex the two segments decide together. A point on the line counts as left.</summary>
    internal static bool SideOf(IReadOnlyList<Point2> along, Point2 p)
    {
        double best = double.MaxValue; int seg = 0; double at = 0;
        for (int s = 0; s + 1 < along.Count; s++)
        {
            Point2 a = along[s], d = along[s + 1] - a;
            double u = Math.Clamp(((p.X - a.X) * d.X + (p.Y - a.Y) * d.Y) / (d.X * d.X + d.Y * d.Y), 0, 1);
            double dist = (p - (a + u * d)).Length;
            if (dist < best - 1e-15) { best = dist; seg = s; at = u; }
        }
        bool RightOfSegment(int s) => Cross(along[s + 1] - along[s], p - along[s]) < 0;
        // At an inner vertex: on a left turn the left side is the wedge left of both segments; on a right turn the
        // right side is the wedge right of both.
        int other = at >= 1 && seg + 2 < along.Count ? seg + 1 : at <= 0 && seg > 0 ? seg - 1 : -1;
        if (other < 0) return RightOfSegment(seg);
        int first = Math.Min(seg, other), second = Math.Max(seg, other);
        double turn = Cross(along[first + 1] - along[first], along[second + 1] - along[second]);
        return turn >= 0 ? RightOfSegment(first) || RightOfSegment(second) : RightOfSegment(first) && RightOfSegment(second);
    }

    private static double Cross(Point2 u, Point2 v) => u.X * v.Y - u.Y * v.X;
}
