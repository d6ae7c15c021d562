using Seepage.Core.Fem;
using Seepage.Core.Geometry;
using Seepage.Core.Sections;

namespace Seepage.Core.Results;

/// <summary>
/// Uplift under each structure: pore pressure u = γw (h − y) at the base nodes (kPa), force F = ∫ u ds (kN/m),
/// centroid x̄ = ∫ u x ds / F, moment about the downstream toe M = ∫ u |x_toe − x| ds. u is linear along each
/// P1 edge, so the trapezoid sums are exact; with quadratic elements u is quadratic along an edge and u·x cubic, so
/// Simpson's rule over the edge (with the mid node) is exact. Where a cutoff meets the base its top node is split,
/// and the two stations at that point carry the two faces' pressures; those two heads are also reported as
/// percentages of the head difference (the key points of the independent-variable method).
/// </summary>
public static class UpliftCalculator
{
    public static List<UpliftResult> Compute(SectionModel section, HeadField field, MeshBoundary boundary, double tolerance)
    {
        var results = new List<UpliftResult>();
        var tail = section.Heads.Count > 0 ? section.Heads.MinBy(h => h.Total)! : null;
        double high = section.Heads.Select(h => h.Total).DefaultIfEmpty(0).Max(), low = section.Heads.Select(h => h.Total).DefaultIfEmpty(0).Min();
        var q = field.Quadratic;
        foreach (var structure in section.Structures)
        {
            var stationOf = new PolylineStation(structure.Base);
            var edges = boundary.On(structure.Base, tolerance)
                .Select(e => (e, sa: stationOf.Of(boundary.Node(e.A)), sb: stationOf.Of(boundary.Node(e.B))))
                .Select(x => x.sa <= x.sb ? (x.e.A, x.e.B, x.sa, x.sb) : (x.e.B, x.e.A, x.sb, x.sa))
                .OrderBy(x => 0.5 * (x.Item3 + x.Item4)).ToList();
            var stations = new List<UpliftStation>();
            double force = 0, firstMoment = 0;
            int lastNode = -1;
            foreach (var (a, b, _, _) in edges)
            {
                var ua = Station(a); var ub = Station(b);
                if (a != lastNode) stations.Add(ua);
                double len = new Point2(ua.X, ua.Y).DistanceTo(new Point2(ub.X, ub.Y));
                if (q is not null)
                {
                    var um = Station(q.Mid(a, b));
                    stations.Add(um);
                    force += len / 6 * (ua.Pressure + 4 * um.Pressure + ub.Pressure);
                    firstMoment += len / 6 * (ua.Pressure * ua.X + 4 * um.Pressure * um.X + ub.Pressure * ub.X);
                }
                else
                {
                    force += 0.5 * len * (ua.Pressure + ub.Pressure);
                    firstMoment += len / 6 * (2 * ua.Pressure * ua.X + ua.Pressure * ub.X + ub.Pressure * ua.X + 2 * ub.Pressure * ub.X);
                }
                stations.Add(ub);
                lastNode = b;
            }
            double centroid = force != 0 ? firstMoment / force : 0.5 * (structure.Base[0].X + structure.Base[^1].X);
            double toe = DownstreamToe(structure, tail);
            double moment = Math.Abs(toe * force - firstMoment);
            results.Add(new UpliftResult(structure.Name, stations, force, centroid, moment, toe)
            {
                Junctions = Junctions(section, structure, stations, high, low),
            });
        }
        return results;

        UpliftStation Station(int n)
        {
            double x = q?.X[n] ?? field.Mesh.X[n], y = q?.Y[n] ?? field.Mesh.Y[n], h = field.Heads[n];
            return new UpliftStation(x, y, h, section.WaterUnitWeight * (h - y));
        }
    }

    // At a cutoff whose top lies on the base the split node gives two stations; the higher head is the upstream face.
    private static List<UpliftJunction> Junctions(SectionModel section, Structure structure, List<UpliftStation> stations,
        double high, double low)
    {
        var list = new List<UpliftJunction>();
        double h = high - low, tol = section.MatchTolerance;
        if (h <= 0) return list;
        foreach (var c in section.Cutoffs)
        {
            if (PolygonMath.DistanceToPolyline(c.Top, structure.Base) > tol) continue;
            var at = stations.Where(s => new Point2(s.X, s.Y).DistanceTo(c.Top) <= tol).ToList();
            if (at.Count == 0) continue;
            list.Add(new UpliftJunction(c.Name, c.Top.X, 100 * (at.Max(s => s.Head) - low) / h, 100 * (at.Min(s => s.Head) - low) / h));
        }
        return list.OrderBy(j => j.X).ToList();
    }

    // The base end nearer the tailwater (the lowest fixed head) is the downstream toe.
    private static double DownstreamToe(Structure s, HeadBoundary? tail)
    {
        if (tail is null) return s.Base[^1].X;
        double d0 = PolygonMath.DistanceToPolyline(s.Base[0], tail.Along), d1 = PolygonMath.DistanceToPolyline(s.Base[^1], tail.Along);
        return d0 < d1 ? s.Base[0].X : s.Base[^1].X;
    }
}
