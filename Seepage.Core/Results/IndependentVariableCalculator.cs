using Seepage.Core.Geometry;
using Seepage.Core.Sections;

namespace Seepage.Core.Results;

/// <summary>
/// Applies the method of independent variables (<see cref="IndependentVariableMethod"/>) to a section with one level
/// floor and one to three vertical cutoffs hanging from it, and sets the FE heads at the same key points beside
/// the closed forms. The floor may sit on the ground (its base a line running forward in x, level or sloping) or be sunk into it: a base that drops
/// vertically from the ground at its upstream end, runs level, and rises vertically to the same ground level at
/// its downstream end is a floor of thickness t below the ground. Applied: the basic closed forms for upstream,
/// intermediate and downstream piles with pile depths d from the ground level, the floor-thickness correction
/// (key points move from the ground level down to the underside of the floor by straight interpolation toward
/// the tip, (φD − φ)·t/d), the correction for mutual interference of neighbouring piles (depths below the
/// underside). Not applied: the slope correction (see <see cref="Compute"/>'s output for why); on a sloping floor
/// the piles' depths are taken from the underside at each pile.
/// </summary>
public static class IndependentVariableCalculator
{
    public const string Source = "Khosla, Bose & Taylor, \"Design of Weirs on Permeable Foundations\", CBI Publication 12, 1936 (closed forms as recalled, from memory)";

    public static IndependentVariableResult? Compute(SectionModel section, FieldSampler sampler, ExitResult? exit, List<string> notes)
    {
        if (section.Structures.Count != 1 || section.Heads.Count < 2) return null;
        var floor = section.Structures[0];
        double tol = section.MatchTolerance;
        if (FloorProfile(floor.Base, tol) is not var (underside, ground))
        {
            notes.Add("Independent variables: the floor is neither a level or sloping floor on the ground nor a level floor sunk into it with vertical ends; the method is not applied.");
            return null;
        }
        double t = ground is { } g0 ? g0 - underside[0].Y : 0;
        var piles = section.Cutoffs.Where(c => PolygonMath.DistanceToPolyline(c.Top, underside) <= tol).OrderBy(c => c.Top.X).ToList();
        if (piles.Count == 0 || piles.Count > 3 || piles.Count != section.Cutoffs.Count) return null;
        if (piles.Any(c => Math.Abs(c.Tip.X - c.Top.X) > tol || c.Tip.Y >= c.Top.Y)) { notes.Add("Independent variables: a cutoff is not vertical; the method is not applied."); return null; }

        double upX = underside[0].X, downX = underside[^1].X, b = downX - upX;
        double high = section.Heads.Max(h => h.Total), low = section.Heads.Min(h => h.Total), h = high - low;
        var upHead = section.Heads.MaxBy(x => x.Total)!;
        bool reversed = PolygonMath.DistanceToPolyline(floor.Base[^1], upHead.Along) < PolygonMath.DistanceToPolyline(floor.Base[0], upHead.Along);
        if (reversed) { notes.Add("Independent variables: the headwater is on the +x side; the method is applied to sections with flow in +x only."); return null; }

        var result = new List<KeyPointPile>();
        double eps = section.MatchTolerance;
        for (int i = 0; i < piles.Count; i++)
        {
            var c = piles[i];
            double x = c.Top.X, y0 = c.Top.Y, d = (ground ?? y0) - c.Tip.Y, below = y0 - c.Tip.Y;
            var (e, dd, cc) = IndependentVariableMethod.KeyPoints(x - upX, downX - x, d);
            bool atUp = x - upX <= tol, atDown = downX - x <= tol;
            // Floor thickness: from the ground level down to the underside, toward the tip's value.
            double corrE = atUp ? 0 : -(e - dd) * t / d, corrC = atDown ? 0 : (dd - cc) * t / d;
            // Interference of the neighbour downstream raises C (upstream of it); of the neighbour upstream lowers E.
            // Depths below the underside of the floor at the pile whose point is corrected.
            if (i + 1 < piles.Count && !atDown) corrC += IndependentVariableMethod.Interference(below, y0 - piles[i + 1].Tip.Y, piles[i + 1].Top.X - x, b);
            if (i > 0 && !atUp) corrE -= IndependentVariableMethod.Interference(below, y0 - piles[i - 1].Tip.Y, x - piles[i - 1].Top.X, b);
            string position = atUp ? "upstream" : atDown ? "downstream" : "intermediate";
            result.Add(new KeyPointPile(c.Name, position, x, d,
                Point(e, corrE, Fe(new Point2(x - eps, y0 - eps))),
                Point(dd, 0, Fe(new Point2(x, c.Tip.Y - eps))),
                Point(cc, corrC, Fe(new Point2(x + eps, y0 - eps)))));
        }

        var last = piles[^1];
        double? ge = downX - last.Top.X <= tol ? IndependentVariableMethod.ExitGradient(h, b, (ground ?? last.Top.Y) - last.Tip.Y) : null;
        if (ge is null) notes.Add("Independent variables: no cutoff at the downstream end of the floor; G_E is not defined (the exit gradient at a floor's toe without a cutoff is singular).");
        double soilBelow = underside.Min(p => p.Y) - section.Zones.SelectMany(z => z.Outline).Min(p => p.Y);
        var resultNotes = new List<string>
        {
            FormattableString.Invariant($"The method assumes a foundation of infinite depth; this section has {soilBelow:0.##} m of soil below the floor ({soilBelow / b:0.##} times the floor length b = {b:0.##} m)."),
            "Pressures in per cent of H above the lowest fixed head; FE values are the computed heads just beside each key point.",
        };
        if (section.Zones.Select(z => z.Soil).Distinct().Count() > 1 || section.Soils.Any(s => Math.Abs(s.Kx - s.Ky) > 1e-12 * s.Kx))
            resultNotes.Add("The method assumes one homogeneous, isotropic soil; this section is layered or anisotropic, so the closed forms are a rough guide only.");
        var applied = new List<string> { ground is null
            ? "basic closed forms for upstream, intermediate and downstream piles (pile depths d from the underside of the floor at each pile)"
            : "basic closed forms for upstream, intermediate and downstream piles (pile depths d from the ground level)" };
        var notApplied = new List<string>();
        if (t > tol) applied.Add(FormattableString.Invariant($"floor thickness t = {t:0.###} m below the ground: φE − (φE − φD)·t/d, φC + (φD − φC)·t/d (not at the upstream end's E nor the downstream end's C)"));
        else notApplied.Add("floor thickness (none: the floor sits on the ground)");
        if (piles.Count > 1) applied.Add("mutual interference of neighbouring piles: C = 19·√(D/b′)·(d + D)/b per cent, depths below the underside of the floor");
        else notApplied.Add("mutual interference (a single pile)");
        notApplied.Add(underside.Zip(underside.Skip(1)).All(s => Math.Abs(s.First.Y - s.Second.Y) <= tol)
            ? "slope of the floor (none: the floor is level)"
            : "slope of the floor: the published slope correction, as recalled, was checked against finite element heads on 1:4 floors; the FE confirmed its sign (higher for a floor falling in the direction of flow) but not its size (about half), so it is left out; the FE values beside the method govern");
        return new IndependentVariableResult(floor.Name, b, h, result, ge, exit?.MaxGradient, exit?.RowGradientAtMax,
            applied, notApplied, resultNotes, Source) { FloorThickness = t };

        double? Fe(Point2 p) => sampler.Head(p) is { } v && h > 0 ? 100 * (v - low) / h : null;
    }

    // The underside of the floor as a polyline from upstream to downstream (x increasing), and the ground level when
    // the floor is sunk into it: either a base running forward in x (level or sloping, on the ground: ground null), or
    // a base that drops vertically from the ground, runs level and rises vertically to the same ground level.
    private static (List<Point2> Underside, double? Ground)? FloorProfile(IReadOnlyList<Point2> floorBase, double tol)
    {
        var pts = floorBase.ToList();
        if (pts[^1].X < pts[0].X) pts.Reverse();
        if (pts.Zip(pts.Skip(1)).All(s => s.Second.X - s.First.X > tol)) return (pts, null);
        if (pts.Count < 4) return null;
        Point2 first = pts[0], second = pts[1], beforeLast = pts[^2], last = pts[^1];
        double y0 = second.Y;
        var inner = pts.Skip(1).Take(pts.Count - 2).ToList();
        bool sunk = Math.Abs(first.X - second.X) <= tol && Math.Abs(last.X - beforeLast.X) <= tol
            && Math.Abs(first.Y - last.Y) <= tol && first.Y > y0 + tol
            && inner.All(p => Math.Abs(p.Y - y0) <= tol) && inner.Zip(inner.Skip(1)).All(s => s.Second.X - s.First.X > tol);
        return sunk ? (inner, first.Y) : null;
    }

    private static KeyPoint Point(double basic, double correction, double? fe)
    {
        double corrected = 100 * (basic + correction);
        return new KeyPoint(100 * basic, 100 * correction, corrected, fe, fe - corrected);
    }
}
