using Seepage.Core.Fem;

namespace Seepage.Core.Results;

/// <summary>
/// The stream function of a linear-element head field without a second solve. In each triangle the Darcy velocity v
/// is constant, so ψ is linear there with ∇ψ = (−v_y, v_x). The P1 equation of a free node says that the flux of v out of
/// the polygon joining the midpoints of its edges is zero (the P1 stiffness is the median-dual box scheme: Hackbusch,
/// "On first and second order box schemes", Computing 41, 1989), so walking from triangle to triangle through edge
/// midpoints gives every midpoint one value (the non-conforming P1 stream function; the loop around each free node
/// closes to the solver tolerance). For contouring, a boundary node takes the mean of the linear ψ at the node of the
/// triangles on its boundary edges (so a cutoff tip takes its faces' value), any other node the mean over its triangles.
/// </summary>
public static class StreamFunctionWalk
{
    /// <summary>ψ per mesh node (m³/s per m), or null when the field is quadratic or the mesh is not one connected
    /// piece of triangles (then the walk cannot fix one constant).</summary>
    public static double[]? Solve(HeadField field, MeshBoundary boundary, CancellationToken cancellation)
    {
        if (field.Order != 1) return null;
        var mesh = field.Mesh;
        var tri = mesh.Triangles; var x = mesh.X; var y = mesh.Y;
        int nt = mesh.TriangleCount;
        if (nt == 0) return null;
        // Edge numbers and the (at most two) triangles on each edge.
        var edgeOf = new int[3 * nt];
        var ids = new Dictionary<long, int>(3 * nt / 2 + 16, EdgeKey.Comparer);
        var first = new List<int>(3 * nt / 2 + 16); var second = new List<int>(3 * nt / 2 + 16);
        for (int c = 0; c < 3 * nt; c++)
        {
            int t = c / 3, k = c % 3;
            long key = EdgeKey.Of(tri[c], tri[3 * t + (k + 1) % 3]);
            if (ids.TryGetValue(key, out int e)) { second[e] = t; }
            else { e = first.Count; ids[key] = e; first.Add(t); second.Add(-1); }
            edgeOf[c] = e;
        }
        var mid = new double[first.Count];
        var known = new bool[first.Count];
        var visited = new bool[nt];
        var stack = new Stack<int>();
        known[edgeOf[0]] = true;
        visited[0] = true;
        stack.Push(0);
        int reached = 0;
        while (stack.Count > 0)
        {
            int t = stack.Pop();
            if (++reached % 65_536 == 0) cancellation.ThrowIfCancellationRequested();
            var (vx, vy) = field.Velocity(t);
            int from = -1;
            for (int k = 0; k < 3 && from < 0; k++) if (known[edgeOf[3 * t + k]]) from = k;
            var (fx, fy) = Midpoint(tri, x, y, t, from);
            double start = mid[edgeOf[3 * t + from]];
            for (int k = 0; k < 3; k++)
            {
                int e = edgeOf[3 * t + k];
                if (!known[e])
                {
                    var (mx, my) = Midpoint(tri, x, y, t, k);
                    mid[e] = start - vy * (mx - fx) + vx * (my - fy);
                    known[e] = true;
                }
                int other = first[e] == t ? second[e] : first[e];
                if (other >= 0 && !visited[other]) { visited[other] = true; stack.Push(other); }
            }
        }
        if (reached != nt) return null;

        var psi = new double[mesh.NodeCount];
        var count = new int[mesh.NodeCount];
        var onBoundary = new bool[mesh.NodeCount];
        foreach (var edge in boundary.Edges)
        {
            onBoundary[edge.A] = onBoundary[edge.B] = true;
            Add(edge.Triangle, edge.A);
            Add(edge.Triangle, edge.B);
        }
        for (int t = 0; t < nt; t++)
            for (int k = 0; k < 3; k++)
                if (!onBoundary[tri[3 * t + k]]) Add(t, tri[3 * t + k]);
        for (int n = 0; n < psi.Length; n++) if (count[n] > 0) psi[n] /= count[n];
        return psi;

        void Add(int t, int n)
        {
            var (vx, vy) = field.Velocity(t);
            var (fx, fy) = Midpoint(tri, x, y, t, 0);
            psi[n] += mid[edgeOf[3 * t]] - vy * (x[n] - fx) + vx * (y[n] - fy);
            count[n]++;
        }
    }

    private static (double X, double Y) Midpoint(int[] tri, double[] x, double[] y, int t, int k)
    {
        int a = tri[3 * t + k], b = tri[3 * t + (k + 1) % 3];
        return (0.5 * (x[a] + x[b]), 0.5 * (y[a] + y[b]));
    }
}
