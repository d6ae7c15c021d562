using Seepage.Core.Geometry;

namespace Seepage.Core.Fem;

/// <summary>The unknowns lying on a polyline of the section: on the boundary, the ends (and mid nodes) of the
/// boundary edges on it; inside the domain (an internal drain), those of every mesh edge on it, whichever
/// triangles share the edge.</summary>
public static class PolylineNodes
{
    public static IEnumerable<int> Of(MeshBoundary boundary, IReadOnlyList<Point2> line, bool inside, double tolerance,
        QuadraticDofs? quadratic = null)
    {
        if (!inside) return MeshBoundary.NodesOf(boundary.On(line, tolerance), quadratic);
        var mesh = boundary.Mesh;
        double minX = line.Min(p => p.X) - tolerance, maxX = line.Max(p => p.X) + tolerance;
        double minY = line.Min(p => p.Y) - tolerance, maxY = line.Max(p => p.Y) + tolerance;
        var on = new bool[mesh.NodeCount];
        for (int i = 0; i < mesh.NodeCount; i++)
        {
            double x = mesh.X[i], y = mesh.Y[i];
            on[i] = x >= minX && x <= maxX && y >= minY && y <= maxY
                && PolygonMath.DistanceToPolyline(new Point2(x, y), line) <= tolerance;
        }
        var result = new SortedSet<int>();
        var tri = mesh.Triangles;
        for (int t = 0; t < mesh.TriangleCount; t++)
            for (int a = 0; a < 3; a++)
            {
                int i = tri[3 * t + a], j = tri[3 * t + (a + 1) % 3];
                if (!on[i] || !on[j]) continue;
                var mid = new Point2(0.5 * (mesh.X[i] + mesh.X[j]), 0.5 * (mesh.Y[i] + mesh.Y[j]));
                if (PolygonMath.DistanceToPolyline(mid, line) > tolerance) continue;
                result.Add(i); result.Add(j);
                if (quadratic is not null) result.Add(quadratic.Mid(i, j));
            }
        return result;
    }
}
