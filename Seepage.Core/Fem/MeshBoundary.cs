using Seepage.Core.Geometry;
using Seepage.Core.Meshing;

namespace Seepage.Core.Fem;

/// <summary>A boundary edge of the mesh, from node A to node B with the domain on its left (the triangle's
/// counter-clockwise order), so the outward normal is (dy, −dx)/L.</summary>
public readonly record struct BoundaryEdge(int A, int B, int Triangle);

/// <summary>The edges of a mesh used by one triangle only: the outer boundary and both faces of every cutoff.</summary>
public sealed class MeshBoundary
{
    private readonly Mesh _mesh;

    public MeshBoundary(Mesh mesh)
    {
        _mesh = mesh;
        var tri = mesh.Triangles;
        int nt = mesh.TriangleCount;
        // Sort directed edges by their undirected key; an edge that appears once is on the boundary.
        var keys = new long[3 * nt];
        var owner = new int[3 * nt];
        for (int t = 0; t < nt; t++)
            for (int a = 0; a < 3; a++)
            {
                int i = tri[3 * t + a], j = tri[3 * t + (a + 1) % 3];
                keys[3 * t + a] = ((long)Math.Min(i, j) << 32) | (uint)Math.Max(i, j);
                owner[3 * t + a] = 3 * t + a;
            }
        Array.Sort(keys, owner);
        var edges = new List<BoundaryEdge>();
        for (int k = 0; k < keys.Length; k++)
        {
            bool single = (k == 0 || keys[k - 1] != keys[k]) && (k + 1 == keys.Length || keys[k + 1] != keys[k]);
            if (!single) continue;
            int slot = owner[k], t = slot / 3, a = slot % 3;
            edges.Add(new BoundaryEdge(tri[3 * t + a], tri[3 * t + (a + 1) % 3], t));
        }
        Edges = edges;
    }

    public IReadOnlyList<BoundaryEdge> Edges { get; }

    /// <summary>The mesh whose boundary this is.</summary>
    public Mesh Mesh => _mesh;

    public Point2 Node(int i) => new(_mesh.X[i], _mesh.Y[i]);

    /// <summary>The boundary edges lying on a polyline (both ends and the midpoint within tolerance, m).</summary>
    public List<BoundaryEdge> On(IReadOnlyList<Point2> polyline, double tolerance)
    {
        var result = new List<BoundaryEdge>();
        foreach (var e in Edges)
        {
            Point2 a = Node(e.A), b = Node(e.B);
            if (PolygonMath.DistanceToPolyline(a, polyline) <= tolerance && PolygonMath.DistanceToPolyline(b, polyline) <= tolerance
                && PolygonMath.DistanceToPolyline(0.5 * (a + b), polyline) <= tolerance)
                result.Add(e);
        }
        return result;
    }

    /// <summary>Distinct nodes of a set of edges.</summary>
    public static IEnumerable<int> NodesOf(IEnumerable<BoundaryEdge> edges) => edges.SelectMany(e => new[] { e.A, e.B }).Distinct();

    /// <summary>Distinct unknowns of a set of edges: the end nodes and, with quadratic elements, the mid nodes.</summary>
    public static IEnumerable<int> NodesOf(IEnumerable<BoundaryEdge> edges, QuadraticDofs? quadratic) => quadratic is null
        ? NodesOf(edges)
        : edges.SelectMany(e => new[] { e.A, e.B, quadratic.Mid(e.A, e.B) }).Distinct();
}
