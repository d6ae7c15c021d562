namespace Seepage.Core.Geometry;

/// <summary>Small polygon and segment formulas used across the stages.</summary>
public static class PolygonMath
{
    /// <summary>Signed area in m² (positive for counter-clockwise).</summary>
    public static double SignedArea(IReadOnlyList<Point2> ring)
    {
        double s = 0;
        for (int i = 0; i < ring.Count; i++)
        {
            var a = ring[i]; var b = ring[(i + 1) % ring.Count];
            s += a.X * b.Y - b.X * a.Y;
        }
        return s / 2;
    }

    /// <summary>Distance in m from <paramref name="p"/> to the segment ab.</summary>
    public static double DistanceToSegment(Point2 p, Point2 a, Point2 b)
    {
        double dx = b.X - a.X, dy = b.Y - a.Y;
        double len2 = dx * dx + dy * dy;
        double t = len2 == 0 ? 0 : Math.Clamp(((p.X - a.X) * dx + (p.Y - a.Y) * dy) / len2, 0, 1);
        return p.DistanceTo(new Point2(a.X + t * dx, a.Y + t * dy));
    }

    /// <summary>Parameter t in [0, 1] of the projection of p on ab.</summary>
    public static double ProjectOnSegment(Point2 p, Point2 a, Point2 b)
    {
        double dx = b.X - a.X, dy = b.Y - a.Y;
        double len2 = dx * dx + dy * dy;
        return len2 == 0 ? 0 : Math.Clamp(((p.X - a.X) * dx + (p.Y - a.Y) * dy) / len2, 0, 1);
    }

    /// <summary>Distance in m from p to a polyline.</summary>
    public static double DistanceToPolyline(Point2 p, IReadOnlyList<Point2> line)
    {
        double d = double.PositiveInfinity;
        for (int i = 0; i + 1 < line.Count; i++) d = Math.Min(d, DistanceToSegment(p, line[i], line[i + 1]));
        return d;
    }

    /// <summary>Length of a polyline in m.</summary>
    public static double Length(IReadOnlyList<Point2> line)
    {
        double s = 0;
        for (int i = 0; i + 1 < line.Count; i++) s += line[i].DistanceTo(line[i + 1]);
        return s;
    }

    /// <summary>Intersection point of segments ab and cd where they cross properly (not at shared ends), else null.</summary>
    public static Point2? ProperIntersection(Point2 a, Point2 b, Point2 c, Point2 d, double tolerance)
    {
        double rX = b.X - a.X, rY = b.Y - a.Y, sX = d.X - c.X, sY = d.Y - c.Y;
        double denom = rX * sY - rY * sX;
        if (Math.Abs(denom) < 1e-300) return null;
        double t = ((c.X - a.X) * sY - (c.Y - a.Y) * sX) / denom;
        double u = ((c.X - a.X) * rY - (c.Y - a.Y) * rX) / denom;
        double lenR = Math.Sqrt(rX * rX + rY * rY), lenS = Math.Sqrt(sX * sX + sY * sY);
        double tolT = tolerance / lenR, tolU = tolerance / lenS;
        if (t <= tolT || t >= 1 - tolT || u <= tolU || u >= 1 - tolU) return null;
        return new Point2(a.X + t * rX, a.Y + t * rY);
    }
}
