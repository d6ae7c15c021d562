using Seepage.Core.Meshing;

namespace Seepage.Core.Fem;

/// <summary>
/// The unknowns of quadratic (P2) triangles on a mesh: the mesh nodes first (same numbers), then one mid-edge
/// node per edge. An edge is keyed by its two end nodes, so the two faces of a cutoff slit, whose nodes are
/// distinct, get distinct mid nodes without any special case. Element nodes are ordered v0, v1, v2, m01, m12, m20.
/// </summary>
public sealed class QuadraticDofs
{
    private readonly Dictionary<long, int> _mid;

    public QuadraticDofs(Mesh mesh)
    {
        int n = mesh.NodeCount, nt = mesh.TriangleCount;
        var tri = mesh.Triangles;
        _mid = new Dictionary<long, int>(3 * nt / 2 + 16, EdgeKey.Comparer);
        Elements = new int[6 * nt];
        var x = new List<double>(mesh.X); var y = new List<double>(mesh.Y);
        for (int t = 0; t < nt; t++)
            for (int a = 0; a < 3; a++)
            {
                int i = tri[3 * t + a], j = tri[3 * t + (a + 1) % 3];
                Elements[6 * t + a] = i;
                long key = EdgeKey.Of(i, j);
                if (!_mid.TryGetValue(key, out int m))
                {
                    m = x.Count; _mid[key] = m;
                    x.Add(0.5 * (mesh.X[i] + mesh.X[j])); y.Add(0.5 * (mesh.Y[i] + mesh.Y[j]));
                }
                Elements[6 * t + 3 + a] = m;
            }
        VertexCount = n; X = x.ToArray(); Y = y.ToArray();
    }

    /// <summary>Number of mesh nodes (the first unknowns).</summary>
    public int VertexCount { get; }
    /// <summary>Number of unknowns: nodes plus edges.</summary>
    public int Count => X.Length;
    /// <summary>Six unknowns per triangle: v0, v1, v2, m01, m12, m20.</summary>
    public int[] Elements { get; }
    /// <summary>Coordinates of every unknown, metres (mid nodes at the edge midpoints).</summary>
    public double[] X { get; }
    public double[] Y { get; }

    /// <summary>The mid node of the edge between mesh nodes a and b; −1 when there is no such edge.</summary>
    public int Mid(int a, int b) => _mid.TryGetValue(EdgeKey.Of(a, b), out int m) ? m : -1;
}
