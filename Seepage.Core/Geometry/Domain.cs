using NetTopologySuite.Geometries;
using NetTopologySuite.Operation.Union;
using NtsGeometry = NetTopologySuite.Geometries.Geometry;

namespace Seepage.Core.Geometry;

/// <summary>
/// The flow domain as the union of the zone polygons (NetTopologySuite geometry), with the queries the
/// validator and the post-processing need: is a point or segment on the outer boundary, inside, and so on.
/// </summary>
public sealed class Domain
{
    private static readonly GeometryFactory Factory = new();
    private readonly NtsGeometry _union;
    private readonly NtsGeometry _boundary;

    public Domain(IEnumerable<IReadOnlyList<Point2>> rings)
    {
        Polygons = rings.Select(ToPolygon).ToList();
        _union = CascadedPolygonUnion.Union(Polygons.Cast<NtsGeometry>().ToList()) ?? Factory.CreatePolygon();
        _boundary = _union.Boundary;
    }

    /// <summary>The zone polygons, in input order.</summary>
    public IReadOnlyList<Polygon> Polygons { get; }

    /// <summary>The union of all zones.</summary>
    public NtsGeometry Union => _union;

    /// <summary>Area of the union in m².</summary>
    public double Area => _union.Area;

    /// <summary>Distance in m from p to the outer boundary of the domain (including hole boundaries).</summary>
    public double DistanceToBoundary(Point2 p) => _boundary.Distance(Factory.CreatePoint(new Coordinate(p.X, p.Y)));

    /// <summary>True when every point of the polyline lies within tolerance of the domain boundary
    /// (checked at the vertices and at 8 points on each segment).</summary>
    public bool PolylineOnBoundary(IReadOnlyList<Point2> line, double tolerance)
    {
        for (int i = 0; i + 1 < line.Count; i++)
            for (int k = 0; k <= 8; k++)
            {
                double t = k / 8.0;
                var p = new Point2(line[i].X + t * (line[i + 1].X - line[i].X), line[i].Y + t * (line[i + 1].Y - line[i].Y));
                if (DistanceToBoundary(p) > tolerance) return false;
            }
        return true;
    }

    /// <summary>True when the segment lies inside the closed domain (within tolerance).</summary>
    public bool SegmentInside(Point2 a, Point2 b, double tolerance)
    {
        var line = Factory.CreateLineString([new Coordinate(a.X, a.Y), new Coordinate(b.X, b.Y)]);
        return _union.Buffer(tolerance).Covers(line);
    }

    /// <summary>True when p is strictly inside the domain, more than tolerance from its boundary.</summary>
    public bool StrictlyInside(Point2 p, double tolerance) =>
        _union.Contains(Factory.CreatePoint(new Coordinate(p.X, p.Y))) && DistanceToBoundary(p) > tolerance;

    internal static Polygon ToPolygon(IReadOnlyList<Point2> ring)
    {
        var coords = ring.Select(p => new Coordinate(p.X, p.Y)).Append(new Coordinate(ring[0].X, ring[0].Y)).ToArray();
        return Factory.CreatePolygon(coords);
    }
}
