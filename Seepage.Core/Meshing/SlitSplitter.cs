namespace Seepage.Core.Meshing;

/// <summary>
/// Opens each slit (cutoff wall) into two faces: every node along the slit's chain of edges gets a twin
/// for the triangles on the left of the chain (walking from its top to its tip), and the chain edges stop
/// joining the triangles on either side, so both faces become boundary edges. An end node is split only
/// when it lies on the boundary of the meshed domain; an end strictly inside (the tip) stays shared.
/// </summary>
internal static class SlitSplitter
{
    public static void Split(Triangulation tri, CleanGraph g, List<string> warnings)
    {
        var segmentOf = new Dictionary<long, int>();
        for (int s = 0; s < g.Segments.Count; s++)
        {
            var (a, b) = g.Segments[s];
            segmentOf[Key(Math.Min(a, b), Math.Max(a, b))] = s;
        }
        var fan = new List<int>();
        for (int k = 0; k < g.Slits.Count; k++)
        {
            var chain = ExpandChain(tri, g.Slits[k], segmentOf, fan);
            if (chain.Count < 2) continue;
            var sectors = new List<(int Vertex, List<int> Triangles)>();
            bool topOnBoundary = false, tipOnBoundary = false;
            for (int i = 0; i < chain.Count; i++)
            {
                int x = chain[i];
                int prev = i > 0 ? chain[i - 1] : -1, next = i + 1 < chain.Count ? chain[i + 1] : -1;
                bool onBoundary = tri.TrianglesAround(x, fan);
                if (i == 0) topOnBoundary = onBoundary;
                if (i == chain.Count - 1) tipOnBoundary = onBoundary;
                bool end = prev < 0 || next < 0;
                if (end && !onBoundary) continue;
                sectors.Add((x, LeftSector(tri, x, prev, next, fan, onBoundary)));
            }
            if (topOnBoundary && tipOnBoundary)
                warnings.Add($"Slit {k} reaches the outer boundary at both ends: the cutoff closes the flow path, so no water can pass it.");
            for (int i = 0; i + 1 < chain.Count; i++)
            {
                int h = tri.FindEdge(chain[i], chain[i + 1]);
                int n = tri.N[h];
                tri.N[h] = -1;
                if (n >= 0) tri.N[n] = -1;
            }
            foreach (var (x, triangles) in sectors)
            {
                if (triangles.Count == 0) continue;
                int twin = tri.AddVertex(tri.X[x], tri.Y[x], tri.VertexSegment[x]);
                foreach (int t in triangles) tri.V[3 * t + tri.IndexOf(t, x)] = twin;
            }
            tri.RepairVertexTriangles();
        }
    }

    private static long Key(int a, int b) => ((long)a << 32) | (uint)b;

    // The mesh vertices along the slit, from its top to its tip, following the constrained edges of each
    // input segment of the chain.
    private static List<int> ExpandChain(Triangulation tri, int[] chain, Dictionary<long, int> segmentOf, List<int> fan)
    {
        var result = new List<int> { chain[0] + InitialTriangulation.Offset };
        for (int i = 0; i + 1 < chain.Length; i++)
        {
            int a = chain[i] + InitialTriangulation.Offset, b = chain[i + 1] + InitialTriangulation.Offset;
            int mark = segmentOf[Key(Math.Min(chain[i], chain[i + 1]), Math.Max(chain[i], chain[i + 1]))] + 1;
            int x = a, prev = -1;
            for (int guard = 0; x != b; guard++)
            {
                if (guard > tri.VertexCount) throw new MeshingException("Could not follow a slit through the mesh (internal error).");
                int y = NextAlong(tri, x, prev, mark, fan);
                if (y < 0) throw new MeshingException($"Slit edge lost at vertex {x} (internal error).");
                prev = x; x = y;
                result.Add(x);
            }
        }
        return result;
    }

    private static int NextAlong(Triangulation tri, int x, int prev, int mark, List<int> fan)
    {
        tri.TrianglesAround(x, fan);
        foreach (int t in fan)
        {
            int i = tri.IndexOf(t, x);
            int hOut = 3 * t + (i + 2) % 3, hIn = 3 * t + (i + 1) % 3;
            int u = tri.V[3 * t + (i + 1) % 3], w = tri.V[3 * t + (i + 2) % 3];
            if (tri.Mark[hOut] == mark && u != prev) return u;
            if (tri.Mark[hIn] == mark && w != prev) return w;
        }
        return -1;
    }

    // Triangles around x counter-clockwise from the edge x→next to the edge x→prev (the left side of the
    // chain); at an end, from or to the domain boundary.
    private static List<int> LeftSector(Triangulation tri, int x, int prev, int next, List<int> fan, bool onBoundary)
    {
        var sector = new List<int>();
        int start = 0;
        if (next >= 0)
        {
            start = -1;
            for (int k = 0; k < fan.Count; k++)
            {
                int t = fan[k];
                if (tri.V[3 * t + (tri.IndexOf(t, x) + 1) % 3] == next) { start = k; break; }
            }
            if (start < 0) throw new MeshingException($"Slit edge at vertex {x} not found (internal error).");
        }
        for (int step = 0; step < fan.Count; step++)
        {
            int k = start + step;
            if (k >= fan.Count)
            {
                if (onBoundary) break;
                k -= fan.Count;
            }
            int t = fan[k];
            sector.Add(t);
            if (prev >= 0 && tri.V[3 * t + (tri.IndexOf(t, x) + 2) % 3] == prev) break;
        }
        return sector;
    }
}
