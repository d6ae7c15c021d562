using System.Globalization;

namespace Seepage.Core.Meshing;

/// <summary>
/// The planar graph after merging near-duplicate vertices and repeated segments. Vertices closer than
/// <see cref="Tolerance"/> (1e-9 × the larger side of the bounding box, metres) in both x and y are merged
/// into the one with the lowest index, with a warning.
/// </summary>
internal sealed class CleanGraph
{
    public const double RelativeTolerance = 1e-9;

    public double[] X = Array.Empty<double>(), Y = Array.Empty<double>();
    /// <summary>Clean vertex of every input vertex.</summary>
    public int[] Map = Array.Empty<int>();
    /// <summary>Lowest input index of each clean vertex (for messages).</summary>
    public int[] InputIndex = Array.Empty<int>();
    public readonly List<(int A, int B)> Segments = new();
    /// <summary>Input segment index of each clean segment (−1 when added for a slit).</summary>
    public readonly List<int> InputSegment = new();
    /// <summary>True for segments that only carry a slit (not a zone boundary).</summary>
    public readonly List<bool> SlitOnly = new();
    public readonly List<int[]> Slits = new();
    public readonly List<string> Warnings = new();
    public double Tolerance;
    public double MinX, MinY, MaxX, MaxY;

    public string DescribeSegment(int s)
    {
        var (a, b) = Segments[s];
        string which = InputSegment[s] >= 0 ? $"segment {InputSegment[s]}" : "slit segment";
        return $"{which} (vertices {InputIndex[a]}–{InputIndex[b]})";
    }

    public static CleanGraph From(PlanarGraph graph)
    {
        var g = new CleanGraph();
        int n = graph.Vertices.Count;
        if (n < 3) throw new MeshingException($"The graph has {n} vertices; at least 3 are needed.");
        g.MinX = g.MinY = double.PositiveInfinity; g.MaxX = g.MaxY = double.NegativeInfinity;
        for (int i = 0; i < n; i++)
        {
            var p = graph.Vertices[i];
            if (!double.IsFinite(p.X) || !double.IsFinite(p.Y)) throw new MeshingException($"Vertex {i} has a coordinate that is not a finite number.");
            g.MinX = Math.Min(g.MinX, p.X); g.MaxX = Math.Max(g.MaxX, p.X);
            g.MinY = Math.Min(g.MinY, p.Y); g.MaxY = Math.Max(g.MaxY, p.Y);
        }
        double extent = Math.Max(g.MaxX - g.MinX, g.MaxY - g.MinY);
        if (!(extent > 0)) throw new MeshingException("All vertices coincide; the domain has no extent.");
        g.Tolerance = RelativeTolerance * extent;
        g.MergeVertices(graph);
        g.AddSegments(graph);
        return g;
    }

    private void MergeVertices(PlanarGraph graph)
    {
        int n = graph.Vertices.Count;
        var parent = new int[n];
        for (int i = 0; i < n; i++) parent[i] = i;
        var order = new int[n];
        for (int i = 0; i < n; i++) order[i] = i;
        Array.Sort(order, (i, j) => graph.Vertices[i].X != graph.Vertices[j].X ? graph.Vertices[i].X.CompareTo(graph.Vertices[j].X) : i.CompareTo(j));
        int merged = 0;
        for (int k = 0; k < n; k++)
        {
            var p = graph.Vertices[order[k]];
            for (int m = k + 1; m < n && graph.Vertices[order[m]].X - p.X <= Tolerance; m++)
            {
                if (Math.Abs(graph.Vertices[order[m]].Y - p.Y) > Tolerance) continue;
                int ra = Find(parent, order[k]), rb = Find(parent, order[m]);
                if (ra == rb) continue;
                int lo = Math.Min(ra, rb), hi = Math.Max(ra, rb);
                parent[hi] = lo;
                if (++merged <= 20)
                    Warnings.Add(string.Format(CultureInfo.InvariantCulture,
                        "Vertices {0} and {1} lie within {2:G3} m of each other and were merged into vertex {0}.",
                        Math.Min(order[k], order[m]), Math.Max(order[k], order[m]), Tolerance));
            }
        }
        if (merged > 20) Warnings.Add($"{merged - 20} further near-duplicate vertex pairs were merged.");
        Map = new int[n];
        var xs = new List<double>(); var ys = new List<double>(); var input = new List<int>();
        for (int i = 0; i < n; i++)
        {
            int r = Find(parent, i);
            if (r == i) { Map[i] = xs.Count; xs.Add(graph.Vertices[i].X); ys.Add(graph.Vertices[i].Y); input.Add(i); }
            else Map[i] = Map[r];
        }
        X = xs.ToArray(); Y = ys.ToArray(); InputIndex = input.ToArray();
    }

    private static int Find(int[] parent, int i)
    {
        while (parent[i] != i) { parent[i] = parent[parent[i]]; i = parent[i]; }
        return i;
    }

    private void AddSegments(PlanarGraph graph)
    {
        int n = graph.Vertices.Count;
        var index = new Dictionary<long, int>();
        var multiplicity = new List<int>();
        for (int s = 0; s < graph.Segments.Count; s++)
        {
            var seg = graph.Segments[s];
            if (seg.A < 0 || seg.A >= n || seg.B < 0 || seg.B >= n)
                throw new MeshingException($"Segment {s} refers to vertex {(seg.A < 0 || seg.A >= n ? seg.A : seg.B)}, which does not exist.");
            int a = Map[seg.A], b = Map[seg.B];
            if (a == b)
            {
                Warnings.Add($"Segment {s} (vertices {seg.A}–{seg.B}) has zero length after merging and was dropped.");
                continue;
            }
            long key = ((long)Math.Min(a, b) << 32) | (uint)Math.Max(a, b);
            if (index.TryGetValue(key, out int existing)) { multiplicity[existing]++; continue; }
            index[key] = Segments.Count;
            Segments.Add((a, b)); InputSegment.Add(s); multiplicity.Add(1); SlitOnly.Add(false);
        }
        for (int k = 0; k < graph.Slits.Count; k++)
        {
            var chain = graph.Slits[k].Chain;
            if (chain.Count < 2) throw new MeshingException($"Slit {k} has fewer than two vertices.");
            var clean = new List<int>();
            foreach (int v in chain)
            {
                if (v < 0 || v >= n) throw new MeshingException($"Slit {k} refers to vertex {v}, which does not exist.");
                if (clean.Count == 0 || clean[^1] != Map[v]) clean.Add(Map[v]);
            }
            if (clean.Count < 2) { Warnings.Add($"Slit {k} has zero length after merging and was ignored."); continue; }
            for (int i = 0; i + 1 < clean.Count; i++)
            {
                int a = clean[i], b = clean[i + 1];
                long key = ((long)Math.Min(a, b) << 32) | (uint)Math.Max(a, b);
                if (!index.TryGetValue(key, out int s))
                {
                    s = Segments.Count; index[key] = s;
                    Segments.Add((a, b)); InputSegment.Add(-1); multiplicity.Add(0); SlitOnly.Add(false);
                }
                SlitOnly[s] = multiplicity[s] <= 1;
            }
            Slits.Add(clean.ToArray());
        }
        // Internal lines are crossed when zones are flooded, like slits, where nothing else but the line itself
        // put the segment there (a zone edge under it still parts the zones).
        foreach (var line in graph.InternalLines)
            for (int i = 0; i + 1 < line.Chain.Count; i++)
            {
                int a = Map[line.Chain[i]], b = Map[line.Chain[i + 1]];
                if (a == b) continue;
                long key = ((long)Math.Min(a, b) << 32) | (uint)Math.Max(a, b);
                if (index.TryGetValue(key, out int s) && multiplicity[s] <= 1) SlitOnly[s] = true;
            }
    }
}
