using Seepage.Core.Geometry;

namespace Seepage.Core.Results;

/// <summary>Arc-length stations along a polyline: the distance (m) from its first point to the projection of a point.</summary>
public sealed class PolylineStation(IReadOnlyList<Point2> line)
{
    public double Of(Point2 p)
    {
        double best = double.PositiveInfinity, station = 0, walked = 0;
        for (int i = 0; i + 1 < line.Count; i++)
        {
            double len = line[i].DistanceTo(line[i + 1]);
            double d = PolygonMath.DistanceToSegment(p, line[i], line[i + 1]);
            if (d < best - 1e-12 * (1 + len))
            {
                best = d;
                station = walked + PolygonMath.ProjectOnSegment(p, line[i], line[i + 1]) * len;
            }
            walked += len;
        }
        return station;
    }
}
