using Seepage.Core.Geometry;

namespace Seepage.Core.Meshing;

/// <summary>
/// Builds the constrained Delaunay triangulation of the cleaned graph and tags zones: vertices are inserted
/// in Hilbert order into a large enclosing triangle (Bowyer–Watson), segments are then inserted, seeds
/// flood their regions, and everything no seed reaches is removed.
/// </summary>
internal static class InitialTriangulation
{
    /// <summary>Vertices 0–2 of the triangulation are the enclosing triangle; clean vertex i is vertex i + 3.</summary>
    public const int Offset = 3;

    public static Triangulation Build(CleanGraph g, PlanarGraph graph, List<string> warnings)
    {
        var tri = new Triangulation();
        double cx = 0.5 * (g.MinX + g.MaxX), cy = 0.5 * (g.MinY + g.MaxY);
        double d = Math.Max(g.MaxX - g.MinX, g.MaxY - g.MinY);
        tri.AddVertex(cx - 40 * d, cy - 30 * d);
        tri.AddVertex(cx + 40 * d, cy - 30 * d);
        tri.AddVertex(cx, cy + 40 * d);
        tri.NewTriangle(0, 1, 2, -1);
        for (int i = 0; i < g.X.Length; i++) tri.AddVertex(g.X[i], g.Y[i]);
        int last = 0;
        foreach (int i in HilbertOrder.Sort(g.X, g.Y, g.X.Length))
        {
            int v = i + Offset;
            int t = tri.Locate(g.X[i], g.Y[i], last, out int onEdge, out int onVertex);
            if (t < 0 || onVertex >= 0) throw new MeshingException($"Vertex {g.InputIndex[i]} could not be inserted (internal error).");
            if (tri.ComputeCavity(g.X[i], g.Y[i], t, -1)) tri.CommitCavity(v);
            else tri.InsertByFlips(v, t, onEdge);
            last = tri.VertexTri[v];
        }
        for (int s = 0; s < g.Segments.Count; s++)
            tri.InsertSegment(g.Segments[s].A + Offset, g.Segments[s].B + Offset, s, g.DescribeSegment);
        foreach (var (s, v) in tri.VerticesOnSegments)
            warnings.Add($"Vertex {g.InputIndex[v - Offset]} lies on {g.DescribeSegment(s)}; the segment was split there.");
        TagZones(tri, g, graph, warnings);
        return tri;
    }

    private static void TagZones(Triangulation tri, CleanGraph g, PlanarGraph graph, List<string> warnings)
    {
        var seedOf = new int[tri.TriangleSlots];
        Array.Fill(seedOf, -1);
        var queue = new Queue<int>();
        int start = tri.VertexTri[Offset];
        for (int k = 0; k < graph.Regions.Count; k++)
        {
            var seed = graph.Regions[k];
            if (seed.Zone < 0) throw new MeshingException($"Region seed {k} has a negative zone index ({seed.Zone}).");
            int t = tri.Locate(seed.Point.X, seed.Point.Y, start, out _, out _);
            if (t < 0 || TouchesOutside(tri, t))
                throw new MeshingException($"Region seed {k} at {seed.Point} lies outside every closed outline of segments.");
            if (seedOf[t] >= 0)
            {
                if (tri.Zone[t] != seed.Zone)
                    warnings.Add($"Region seed {k} (zone {seed.Zone}) lies in the region of seed {seedOf[t]} (zone {tri.Zone[t]}); it was ignored.");
                continue;
            }
            Flood(tri, t, k, seed.Zone, seedOf, queue, crossSlits: false, g);
        }
        // Slit walls sit inside zones: a region cut off only by a slit takes the zone across it.
        for (int t = 0; t < tri.TriangleSlots; t++)
            if (tri.IsAlive(t) && seedOf[t] >= 0) queue.Enqueue(t);
        while (queue.Count > 0)
        {
            int t = queue.Dequeue();
            for (int i = 0; i < 3; i++)
            {
                int h = 3 * t + i, n = tri.N[h];
                if (n < 0 || seedOf[n / 3] >= 0) continue;
                if (tri.Mark[h] != 0 && !g.SlitOnly[tri.Mark[h] - 1]) continue;
                Flood(tri, n / 3, seedOf[t], tri.Zone[t], seedOf, queue, crossSlits: true, g);
            }
        }
        int kept = 0;
        for (int t = 0; t < tri.TriangleSlots; t++)
        {
            if (!tri.IsAlive(t)) continue;
            if (seedOf[t] >= 0) { kept++; continue; }
            for (int i = 0; i < 3; i++)
            {
                int n = tri.N[3 * t + i];
                if (n >= 0) tri.N[n] = -1;
            }
            tri.Kill(t);
        }
        tri.RepairVertexTriangles();
        if (kept == 0) throw new MeshingException("No triangle is reachable from a region seed; give at least one seed inside a closed outline.");
    }

    private static void Flood(Triangulation tri, int t0, int seed, int zone, int[] seedOf, Queue<int> visitOrder, bool crossSlits, CleanGraph g)
    {
        var stack = new Stack<int>();
        stack.Push(t0);
        seedOf[t0] = seed; tri.Zone[t0] = zone;
        while (stack.Count > 0)
        {
            int t = stack.Pop();
            if (TouchesOutside(tri, t))
                throw new MeshingException($"The region of seed {seed} is not closed by segments: it reaches the outside of the graph.");
            if (crossSlits) visitOrder.Enqueue(t);
            for (int i = 0; i < 3; i++)
            {
                int h = 3 * t + i, n = tri.N[h];
                if (n < 0 || tri.Mark[h] != 0 || seedOf[n / 3] >= 0) continue;
                seedOf[n / 3] = seed; tri.Zone[n / 3] = zone;
                stack.Push(n / 3);
            }
        }
    }

    private static bool TouchesOutside(Triangulation tri, int t) =>
        tri.V[3 * t] < Offset || tri.V[3 * t + 1] < Offset || tri.V[3 * t + 2] < Offset;

    /// <summary>Position of triangulation vertex v.</summary>
    public static Point2 At(Triangulation tri, int v) => new(tri.X[v], tri.Y[v]);
}
