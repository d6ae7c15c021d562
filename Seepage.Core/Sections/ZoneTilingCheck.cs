using NetTopologySuite.Geometries;
using Seepage.Core.Geometry;

namespace Seepage.Core.Sections;

/// <summary>Checks that the zones tile one connected domain: no two overlap, and they leave no gap
/// (a hole enclosed by zones) between them.</summary>
internal static class ZoneTilingCheck
{
    public static void Check(Domain domain, double tolerance, List<SectionProblem> problems)
    {
        var polygons = domain.Polygons;
        double areaTolerance = Math.Max(tolerance * tolerance, 1e-9 * domain.Area);
        for (int i = 0; i < polygons.Count; i++)
            for (int j = i + 1; j < polygons.Count; j++)
            {
                if (!polygons[i].EnvelopeInternal.Intersects(polygons[j].EnvelopeInternal)) continue;
                double overlap = polygons[i].Intersection(polygons[j]).Area;
                if (overlap > areaTolerance)
                    problems.Add(new($"/zones/{j}/outline", FormattableString.Invariant(
                        $"overlaps zone {i} by {overlap:G4} m²; zones must not overlap.")));
            }

        switch (domain.Union)
        {
            case Polygon p:
                for (int h = 0; h < p.NumInteriorRings; h++)
                {
                    var hole = p.GetInteriorRingN(h);
                    var c = hole.Centroid.Coordinate;
                    double area = Math.Abs(NetTopologySuite.Algorithm.Area.OfRingSigned(hole.Coordinates));
                    if (area > areaTolerance)
                        problems.Add(new("/zones", FormattableString.Invariant(
                            $"leave a gap of {area:G4} m² near ({c.X:G6}, {c.Y:G6}); zones must tile the domain without gaps.")));
                }
                break;
            case MultiPolygon mp:
                problems.Add(new("/zones", $"form {mp.NumGeometries} separate pieces; the zones must make one connected domain."));
                break;
        }
    }
}
