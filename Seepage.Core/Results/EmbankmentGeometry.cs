using Seepage.Core.Geometry;
using Seepage.Core.Sections;

namespace Seepage.Core.Results;

/// <summary>
/// The idealised embankment the hand methods need, read off an unconfined section: in coordinates along the flow (x
/// increasing downstream, scaled by √(ky/kx) for an anisotropic soil) and elevations above the base. Problem says why no
/// hand method applies (not homogeneous, no level impervious base, the reservoir face not reaching the base).
/// </summary>
internal sealed record EmbankmentGeometry(string? Problem, double K, double Scale, double Depth, double TailwaterDepth,
    double HeelX, double EntryX, double ToeX, double? ToeAngle, double? Drain, bool Rectangular, double Base, double Sign)
{
    /// <summary>A point of the idealised section back in section coordinates (m).</summary>
    public Point2 ToSection(double x, double height) => new(Sign * x / Scale, Base + height);

    public static EmbankmentGeometry Of(SectionModel section)
    {
        var soils = section.Zones.Select(z => z.Soil).Distinct().ToList();
        double yb = section.Zones.SelectMany(z => z.Outline).Min(p => p.Y), tol = section.MatchTolerance;
        var reservoir = section.Heads.MaxBy(h => h.Total)!;
        double depth = reservoir.Total - yb;
        EmbankmentGeometry Fail(string why) => new(why, 0, 1, depth, 0, 0, 0, 0, null, null, false, yb, 1);
        if (soils.Count != 1) return Fail("the section is not homogeneous (more than one soil).");
        var soil = section.Soils[soils[0]];
        if (Math.Abs(soil.BeddingAngle) > 1e-9 && Math.Abs(soil.Kx - soil.Ky) > 1e-12 * soil.Kx)
            return Fail("the soil's bedding is inclined; the transformed section needs horizontal bedding.");
        if (section.Cutoffs.Count > 0 || section.Structures.Count > 0) return Fail("the section has cutoffs or structures.");
        double scale = Math.Sqrt(soil.Ky / soil.Kx), k = Math.Sqrt(soil.Kx * soil.Ky);
        var all = section.Zones.SelectMany(z => z.Outline).ToList();
        double sign = reservoir.Along.Average(p => p.X) <= 0.5 * (all.Min(p => p.X) + all.Max(p => p.X)) ? 1 : -1;
        double X(Point2 p) => sign * p.X * scale;

        var heel = reservoir.Along.Where(p => Math.Abs(p.Y - yb) <= tol).Select(X).DefaultIfEmpty(double.NaN).Max();
        if (double.IsNaN(heel)) return Fail("the reservoir face does not reach the base.");
        double? water = WaterLine(reservoir.Along, reservoir.Total, X, tol);
        if (water is null) return Fail("the reservoir face ends below the reservoir level, so its water line is unknown.");
        double delta = Math.Abs(water.Value - heel), entry = water.Value - 0.3 * delta;
        double tail = section.Heads.Where(h => h != reservoir).Select(h => h.Total - yb).DefaultIfEmpty(0).Max();

        double? drain = section.Drains.SelectMany(d => d.Along).Where(p => Math.Abs(p.Y - yb) <= tol).Select(X)
            .Where(x => x > heel).Cast<double?>().Min();
        var face = section.SeepageFaces.SelectMany(f => f.Along.Zip(f.Along.Skip(1)))
            .Where(s => Math.Abs(Math.Min(s.First.Y, s.Second.Y) - yb) <= tol && Math.Abs(s.First.Y - s.Second.Y) > tol)
            .Select(s => s.First.Y < s.Second.Y ? (Low: s.First, High: s.Second) : (Low: s.Second, High: s.First)).ToList();
        var toeSegment = face.Count > 0 ? face[0] : default;
        var tailHead = section.Heads.Where(h => h != reservoir).SelectMany(h => h.Along).ToList();
        double toe = face.Count > 0 ? X(toeSegment.Low)
            : tailHead.Count > 0 ? tailHead.Select(X).Max() : all.Select(X).Max();
        double? angle = face.Count > 0
            ? Math.Atan2(toeSegment.High.Y - toeSegment.Low.Y, Math.Abs(X(toeSegment.High) - X(toeSegment.Low)))
            : null;
        bool rectangular = delta <= tol && (angle is null || Math.Abs(angle.Value - Math.PI / 2) < 1e-6);
        return new(null, k, scale, depth, tail, heel, entry, toe, angle, drain, rectangular, yb, sign);
    }

    // x (flow coordinate) where the polyline crosses the reservoir level; null when it stays below it.
    private static double? WaterLine(IReadOnlyList<Point2> along, double level, Func<Point2, double> x, double tol)
    {
        for (int i = 0; i + 1 < along.Count; i++)
        {
            Point2 a = along[i], b = along[i + 1];
            if ((a.Y - level) * (b.Y - level) > 0 && Math.Abs(a.Y - level) > tol && Math.Abs(b.Y - level) > tol) continue;
            if (Math.Abs(b.Y - a.Y) <= tol) continue;
            double t = Math.Clamp((level - a.Y) / (b.Y - a.Y), 0, 1);
            return x(a) + t * (x(b) - x(a));
        }
        return null;
    }
}
