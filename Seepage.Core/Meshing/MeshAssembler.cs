using Seepage.Core.Geometry;

namespace Seepage.Core.Meshing;

/// <summary>Turns the working triangulation into the immutable <see cref="Mesh"/>: live triangles only,
/// nodes renumbered along a Hilbert curve, triangles sorted by their lowest node.</summary>
internal static class MeshAssembler
{
    public static Mesh Assemble(Triangulation tri, List<string> warnings, double startSeconds, System.Diagnostics.Stopwatch clock)
    {
        var used = new int[tri.VertexCount];
        Array.Fill(used, -1);
        int nodes = 0, triangles = 0;
        for (int t = 0; t < tri.TriangleSlots; t++)
        {
            if (!tri.IsAlive(t)) continue;
            triangles++;
            for (int i = 0; i < 3; i++)
            {
                int v = tri.V[3 * t + i];
                if (used[v] < 0) used[v] = nodes++;
            }
        }
        var px = new double[nodes]; var py = new double[nodes];
        for (int v = 0; v < tri.VertexCount; v++)
            if (used[v] >= 0) { px[used[v]] = tri.X[v]; py[used[v]] = tri.Y[v]; }
        int[] order = HilbertOrder.Sort(px, py, nodes);
        var rank = new int[nodes];
        var x = new double[nodes]; var y = new double[nodes];
        for (int k = 0; k < nodes; k++) { rank[order[k]] = k; x[k] = px[order[k]]; y[k] = py[order[k]]; }
        for (int v = 0; v < tri.VertexCount; v++) if (used[v] >= 0) used[v] = rank[used[v]]; // vertex → output node
        // Counting sort of triangles by their lowest node: stable, so deterministic.
        var count = new int[nodes + 1];
        var lowest = new int[triangles];
        var slot = new int[triangles];
        int m = 0;
        for (int t = 0; t < tri.TriangleSlots; t++)
        {
            if (!tri.IsAlive(t)) continue;
            int lo = Math.Min(used[tri.V[3 * t]], Math.Min(used[tri.V[3 * t + 1]], used[tri.V[3 * t + 2]]));
            lowest[m] = lo; slot[m] = t; count[lo + 1]++; m++;
        }
        for (int k = 0; k < nodes; k++) count[k + 1] += count[k];
        var connectivity = new int[3 * triangles];
        var zones = new int[triangles];
        for (int j = 0; j < triangles; j++)
        {
            int at = count[lowest[j]]++;
            int t = slot[j];
            int a = used[tri.V[3 * t]], b = used[tri.V[3 * t + 1]], c = used[tri.V[3 * t + 2]];
            if (RobustPredicates.Orient(x[a], y[a], x[b], y[b], x[c], y[c]) <= 0)
                throw new MeshingException($"Internal error: triangle at ({x[a]:G6}, {y[a]:G6}) is not counter-clockwise.");
            connectivity[3 * at] = a; connectivity[3 * at + 1] = b; connectivity[3 * at + 2] = c;
            zones[at] = tri.Zone[t];
        }
        double seconds = clock.Elapsed.TotalSeconds - startSeconds;
        var quality = MeshQuality.Measure(x, y, connectivity, seconds);
        return new Mesh(x, y, connectivity, zones, quality, warnings.ToArray());
    }
}
