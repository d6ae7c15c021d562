using Seepage.Core.Geometry;
using Seepage.Core.Sections;

namespace Seepage.Core.Results;

/// <summary>
/// Applies the method of independent variables (<see cref="IndependentVariableMethod"/>) to a section with one level
/// floor and one to three vertical cutoffs hanging from it, and sets the FE heads at the same key points beside
/// the closed forms. The floor may sit on the ground (its base a level line) or be sunk into it: a base that drops
/// vertically from the ground at its upstream end, runs level, and rises vertically to the same ground level at
/// its downstream end is a floor of thickness t below the ground. Applied: the basic closed forms for upstream,
/// intermediate and downstream piles with pile depths d from the ground level, the floor-thickness correction
/// (key points move from the ground level down to the underside of the floor by straight interpolation toward
/// the tip, (φD − φ)·t/d) and the correction for mutual interference of neighbouring piles (depths below the
/// underside). Not applied: the slope correction (only level floors are accepted).
/// </summary>
public static class IndependentVariableCalculator
{
    public const string Source = "Khosla, Bose & Taylor, \"Design of Weirs on Permeable Foundations\", CBI Publication 12, 1936 (closed forms as recalled, from memory)";

    public static IndependentVariableResult? Compute(SectionModel section, FieldSampler sampler, ExitResult? exit, List<string> notes)
    {
        if (section.Structures.Count != 1 || section.Heads.Count < 2) return null;
        var floor = section.Structures[0];
        double tol = 1e-6 * section.Extent;
        if (LevelFloor(floor.Base, tol) is not var (y0, top))
        {
            notes.Add("Independent variables: the floor is not level (nor a level floor sunk into the ground with vertical ends); the method (with its slope correction) is not applied.");
            return null;
        }
        double t = top - y0;
        var piles = section.Cutoffs.Where(c => PolygonMath.DistanceToPolyline(c.Top, floor.Base) <= tol).OrderBy(c => c.Top.X).ToList();
        if (piles.Count == 0 || piles.Count > 3 || piles.Count != section.Cutoffs.Count) return null;
        if (piles.Any(c => Math.Abs(c.Tip.X - c.Top.X) > tol || c.Tip.Y >= c.Top.Y)) { notes.Add("Independent variables: a cutoff is not vertical; the method is not applied."); return null; }
        if (piles.Any(c => Math.Abs(c.Top.Y - y0) > tol)) { notes.Add("Independent variables: a cutoff does not hang from the underside of the floor; the method is not applied."); return null; }

        var level = floor.Base.Where(p => Math.Abs(p.Y - y0) <= tol).ToList();
        double upX = level.Min(p => p.X), downX = level.Max(p => p.X), b = downX - upX;
        double high = section.Heads.Max(h => h.Total), low = section.Heads.Min(h => h.Total), h = high - low;
        var upHead = section.Heads.MaxBy(x => x.Total)!;
        bool reversed = PolygonMath.DistanceToPolyline(new Point2(downX, top), upHead.Along) < PolygonMath.DistanceToPolyline(new Point2(upX, top), upHead.Along);
        if (reversed) { notes.Add("Independent variables: the headwater is on the +x side; the method is applied to sections with flow in +x only."); return null; }

        var result = new List<KeyPointPile>();
        double eps = 1e-6 * section.Extent;
        for (int i = 0; i < piles.Count; i++)
        {
            var c = piles[i];
            double x = c.Top.X, d = top - c.Tip.Y, below = y0 - c.Tip.Y;
            var (e, dd, cc) = IndependentVariableMethod.KeyPoints(x - upX, downX - x, d);
            bool atUp = x - upX <= tol, atDown = downX - x <= tol;
            // Floor thickness: from the ground level down to the underside, toward the tip's value.
            double corrE = atUp ? 0 : -(e - dd) * t / d, corrC = atDown ? 0 : (dd - cc) * t / d;
            // Interference of the neighbour downstream raises C (upstream of it); of the neighbour upstream lowers E.
            if (i + 1 < piles.Count && !atDown) corrC += IndependentVariableMethod.Interference(below, y0 - piles[i + 1].Tip.Y, piles[i + 1].Top.X - x, b);
            if (i > 0 && !atUp) corrE -= IndependentVariableMethod.Interference(below, y0 - piles[i - 1].Tip.Y, x - piles[i - 1].Top.X, b);
            string position = atUp ? "upstream" : atDown ? "downstream" : "intermediate";
            result.Add(new KeyPointPile(c.Name, position, x, d,
                Point(e, corrE, Fe(new Point2(x - eps, y0 - eps))),
                Point(dd, 0, Fe(new Point2(x, c.Tip.Y - eps))),
                Point(cc, corrC, Fe(new Point2(x + eps, y0 - eps)))));
        }

        var last = piles[^1];
        double? ge = downX - last.Top.X <= tol ? IndependentVariableMethod.ExitGradient(h, b, top - last.Tip.Y) : null;
        if (ge is null) notes.Add("Independent variables: no cutoff at the downstream end of the floor; G_E is not defined (the exit gradient at a floor's toe without a cutoff is singular).");
        double bottom = section.Zones.SelectMany(z => z.Outline).Min(p => p.Y);
        var resultNotes = new List<string>
        {
            FormattableString.Invariant($"The method assumes a foundation of infinite depth; this section has {y0 - bottom:0.##} m of soil below the floor ({(y0 - bottom) / b:0.##} times the floor length b = {b:0.##} m)."),
            "Pressures in per cent of H above the lowest fixed head; FE values are the computed heads just beside each key point.",
        };
        if (section.Zones.Select(z => z.Soil).Distinct().Count() > 1 || section.Soils.Any(s => Math.Abs(s.Kx - s.Ky) > 1e-12 * s.Kx))
            resultNotes.Add("The method assumes one homogeneous, isotropic soil; this section is layered or anisotropic, so the closed forms are a rough guide only.");
        var applied = new List<string> { "basic closed forms for upstream, intermediate and downstream piles (pile depths d from the ground level)" };
        var notApplied = new List<string>();
        if (t > tol) applied.Add(FormattableString.Invariant($"floor thickness t = {t:0.###} m below the ground: φE − (φE − φD)·t/d, φC + (φD − φC)·t/d (not at the upstream end's E nor the downstream end's C)"));
        else notApplied.Add("floor thickness (none: the underside of the floor is level with the ground)");
        if (piles.Count > 1) applied.Add("mutual interference of neighbouring piles: C = 19·√(D/b′)·(d + D)/b per cent, depths below the underside of the floor");
        else notApplied.Add("mutual interference (a single pile)");
        notApplied.Add("slope of the floor (only level floors are accepted)");
        return new IndependentVariableResult(floor.Name, b, h, result, ge, exit?.MaxGradient, exit?.RowGradientAtMax,
            applied, notApplied, resultNotes, Source) { FloorThickness = t };

        double? Fe(Point2 p) => sampler.Head(p) is { } v && h > 0 ? 100 * (v - low) / h : null;
    }

    // The underside level and the ground level of a level floor: either a level base (thickness 0) or a base that
    // drops vertically from the ground, runs level and rises vertically to the same ground level; else null.
    private static (double Underside, double Ground)? LevelFloor(IReadOnlyList<Point2> floorBase, double tol)
    {
        var pts = floorBase;
        if (pts.All(p => Math.Abs(p.Y - pts[0].Y) <= tol)) return (pts[0].Y, pts[0].Y);
        if (pts.Count < 4) return null;
        Point2 first = pts[0], second = pts[1], beforeLast = pts[^2], last = pts[^1];
        double y0 = second.Y;
        bool sunk = Math.Abs(first.X - second.X) <= tol && Math.Abs(last.X - beforeLast.X) <= tol
            && Math.Abs(first.Y - last.Y) <= tol && first.Y > y0 + tol
            && pts.Skip(1).Take(pts.Count - 2).All(p => Math.Abs(p.Y - y0) <= tol);
        return sunk ? (y0, first.Y) : null;
    }

    private static KeyPoint Point(double basic, double correction, double? fe)
    {
        double corrected = 100 * (basic + correction);
        return new KeyPoint(100 * basic, 100 * correction, corrected, fe, fe - corrected);
    }
}
