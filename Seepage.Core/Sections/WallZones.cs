using NetTopologySuite.Geometries;
using Seepage.Core.Geometry;
using NtsGeometry = NetTopologySuite.Geometries.Geometry;

namespace Seepage.Core.Sections;

/// <summary>
/// Cuts permeable walls into the zones: each wall's strip (clipped to the domain) becomes a zone of its own soil,
/// appended after the section's zones, and is taken out of the zones it crosses. A zone keeps its index (its
/// largest remaining piece); any further pieces a wall splits off are appended after it with the same soil.
/// </summary>
internal static class WallZones
{
    public static (List<Soil> Soils, List<Zone> Zones) Insert(IReadOnlyList<Soil> soils, IReadOnlyList<Zone> zones,
        CutoffReader.CutoffSet read, Domain domain, double tolerance, List<SectionProblem> problems)
    {
        var walls = read.Permeable; var wallIndex = read.PermeableIndex;
        var outSoils = soils.ToList();
        var outZones = new List<Zone>();
        var extra = new List<Zone>();
        double areaTolerance = Math.Max(tolerance * tolerance, 1e-9 * domain.Area);
        var strips = new List<NtsGeometry>();
        for (int w = 0; w < walls.Count; w++)
        {
            var wall = walls[w]; string at = $"/cutoffs/{wallIndex[w]}";
            var strip = Domain.ToPolygon(wall.Strip());
            var inside = strip.Intersection(domain.Union);
            if (inside.Area < strip.Area * (1 - 1e-6) - areaTolerance)
                problems.Add(new($"{at}/thickness", FormattableString.Invariant(
                    $"the {wall.Thickness} m wide strip of the wall reaches outside the soil by {strip.Area - inside.Area:G4} m²; a wall must lie inside the zones (its top edge on the ground or a structure).")));
            for (int v = 0; v < strips.Count; v++)
                if (strips[v].Intersection(strip).Area > areaTolerance)
                    problems.Add(new(at, $"overlaps the permeable wall at /cutoffs/{wallIndex[v]}; walls must not overlap."));
            strips.Add(inside);
        }
        if (problems.Count > 0) return (outSoils, zones.ToList());

        NtsGeometry cut = strips.Count == 1 ? strips[0] : strips.Aggregate((a, b) => a.Union(b));
        for (int z = 0; z < zones.Count; z++)
        {
            var zone = zones[z];
            var rest = Domain.ToPolygon(zone.Outline).Difference(cut);
            var pieces = Polygons(rest).Where(p => p.Area > areaTolerance).OrderByDescending(p => p.Area).ToList();
            if (pieces.Count == 0)
            {
                problems.Add(new($"/zones/{z}", "lies entirely inside a permeable wall; make the wall thinner or drop the zone."));
                continue;
            }
            if (pieces.Any(p => p.NumInteriorRings > 0))
            {
                problems.Add(new($"/zones/{z}", "would get a hole from a permeable wall; a wall must reach the ground or a structure."));
                continue;
            }
            outZones.Add(zone with { Outline = Ring(pieces[0]) });
            extra.AddRange(pieces.Skip(1).Select(p => zone with { Outline = Ring(p) }));
        }
        outZones.AddRange(extra);
        for (int w = 0; w < walls.Count; w++)
        {
            var wall = walls[w];
            outSoils.Add(new Soil($"{wall.Name} (wall)", wall.K, wall.K, 0, null, null, null, null));
            foreach (var piece in Polygons(strips[w]).Where(p => p.Area > areaTolerance))
                outZones.Add(new Zone(outSoils.Count - 1, Ring(piece), Math.Max(wall.Thickness / 2, 4 * tolerance)));
        }
        return (outSoils, outZones);
    }

    private static IEnumerable<Polygon> Polygons(NtsGeometry g)
    {
        for (int i = 0; i < g.NumGeometries; i++)
            if (g.GetGeometryN(i) is Polygon p && !p.IsEmpty) yield return p;
    }

    // The exterior ring, counter-clockwise, without the closing point and without repeated points.
    private static List<Point2> Ring(Polygon p)
    {
        var pts = new List<Point2>();
        foreach (var c in p.ExteriorRing.Coordinates)
            if (pts.Count == 0 || !pts[^1].NearlyEquals(new Point2(c.X, c.Y), 1e-12)) pts.Add(new Point2(c.X, c.Y));
        if (pts.Count > 1 && pts[0].NearlyEquals(pts[^1], 1e-12)) pts.RemoveAt(pts.Count - 1);
        if (PolygonMath.SignedArea(pts) < 0) pts.Reverse();
        return pts;
    }
}
