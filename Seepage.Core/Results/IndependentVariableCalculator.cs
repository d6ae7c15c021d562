using Seepage.Core.Geometry;
using Seepage.Core.Sections;

namespace Seepage.Core.Results;

/// <summary>
/// Applies the method of independent variables (<see cref="IndependentVariableMethod"/>) to a section with one level
/// floor and one to three vertical cutoffs hanging from it, and sets the FE heads at the same key points beside
/// the closed forms. Applied: the basic closed forms for upstream, intermediate and downstream piles and the
/// correction for mutual interference of neighbouring piles. Not applied: the floor-thickness correction (the
/// base polyline is the soil contact and pile depths are measured from it, which is the zero-thickness floor the
/// closed forms assume) and the slope correction (only level floors are accepted).
/// </summary>
public static class IndependentVariableCalculator
{
    public const string Source = "Khosla, Bose & Taylor, \"Design of Weirs on Permeable Foundations\", CBI Publication 12, 1936 (closed forms as recalled, from memory)";

    public static IndependentVariableResult? Compute(SectionModel section, FieldSampler sampler, ExitResult? exit, List<string> notes)
    {
        if (section.Structures.Count != 1 || section.Heads.Count < 2) return null;
        var floor = section.Structures[0];
        double tol = 1e-6 * section.Extent;
        double y0 = floor.Base[0].Y;
        if (floor.Base.Any(p => Math.Abs(p.Y - y0) > tol)) { notes.Add("Independent variables: the floor is not level; the method (with its slope correction) is not applied."); return null; }
        var piles = section.Cutoffs.Where(c => PolygonMath.DistanceToPolyline(c.Top, floor.Base) <= tol).OrderBy(c => c.Top.X).ToList();
        if (piles.Count == 0 || piles.Count > 3 || piles.Count != section.Cutoffs.Count) return null;
        if (piles.Any(c => Math.Abs(c.Tip.X - c.Top.X) > tol || c.Tip.Y >= c.Top.Y)) { notes.Add("Independent variables: a cutoff is not vertical; the method is not applied."); return null; }

        double upX = floor.Base.Min(p => p.X), downX = floor.Base.Max(p => p.X), b = downX - upX;
        double high = section.Heads.Max(h => h.Total), low = section.Heads.Min(h => h.Total), h = high - low;
        var upHead = section.Heads.MaxBy(x => x.Total)!;
        bool reversed = PolygonMath.DistanceToPolyline(new Point2(downX, y0), upHead.Along) < PolygonMath.DistanceToPolyline(new Point2(upX, y0), upHead.Along);
        if (reversed) { notes.Add("Independent variables: the headwater is on the +x side; the method is applied to sections with flow in +x only."); return null; }

        var result = new List<KeyPointPile>();
        double eps = 1e-6 * section.Extent;
        for (int i = 0; i < piles.Count; i++)
        {
            var c = piles[i];
            double x = c.Top.X, d = c.Top.Y - c.Tip.Y;
            var (e, dd, cc) = IndependentVariableMethod.KeyPoints(x - upX, downX - x, d);
            double corrE = 0, corrC = 0;
            // Interference of the neighbour downstream raises C (upstream of it); of the neighbour upstream lowers E.
            if (i + 1 < piles.Count) corrC += IndependentVariableMethod.Interference(d, piles[i + 1].Top.Y - piles[i + 1].Tip.Y, piles[i + 1].Top.X - x, b);
            if (i > 0) corrE -= IndependentVariableMethod.Interference(d, piles[i - 1].Top.Y - piles[i - 1].Tip.Y, x - piles[i - 1].Top.X, b);
            bool atUp = x - upX <= tol, atDown = downX - x <= tol;
            if (atUp) corrE = 0;   // φE = 100 % at the upstream end whatever the neighbours
            if (atDown) corrC = 0; // φC = 0 at the downstream end
            string position = atUp ? "upstream" : atDown ? "downstream" : "intermediate";
            result.Add(new KeyPointPile(c.Name, position, x, d,
                Point(e, corrE, Fe(new Point2(x - eps, y0 - eps))),
                Point(dd, 0, Fe(new Point2(x, c.Tip.Y - eps))),
                Point(cc, corrC, Fe(new Point2(x + eps, y0 - eps)))));
        }

        var last = piles[^1];
        double? ge = downX - last.Top.X <= tol ? IndependentVariableMethod.ExitGradient(h, b, last.Top.Y - last.Tip.Y) : null;
        if (ge is null) notes.Add("Independent variables: no cutoff at the downstream end of the floor; G_E is not defined (the exit gradient at a floor's toe without a cutoff is singular).");
        double bottom = section.Zones.SelectMany(z => z.Outline).Min(p => p.Y);
        var resultNotes = new List<string>
        {
            FormattableString.Invariant($"The method assumes a foundation of infinite depth; this section has {y0 - bottom:0.##} m of soil below the floor ({(y0 - bottom) / b:0.##} times the floor length b = {b:0.##} m)."),
            "Pressures in per cent of H above the lowest fixed head; FE values are the computed heads just beside each key point.",
        };
        if (section.Zones.Select(z => z.Soil).Distinct().Count() > 1 || section.Soils.Any(s => Math.Abs(s.Kx - s.Ky) > 1e-12 * s.Kx))
            resultNotes.Add("The method assumes one homogeneous, isotropic soil; this section is layered or anisotropic, so the closed forms are a rough guide only.");
        return new IndependentVariableResult(floor.Name, b, h, result, ge, exit?.MaxGradient, exit?.RowGradientAtMax,
            ["basic closed forms for upstream, intermediate and downstream piles", "mutual interference of neighbouring piles: C = 19·√(D/b′)·(d + D)/b per cent"],
            ["floor thickness (the base is the soil contact; pile depths are measured from it)", "slope of the floor (only level floors are accepted)"],
            resultNotes, Source);

        double? Fe(Point2 p) => sampler.Head(p) is { } v && h > 0 ? 100 * (v - low) / h : null;
    }

    private static KeyPoint Point(double basic, double correction, double? fe)
    {
        double corrected = 100 * (basic + correction);
        return new KeyPoint(100 * basic, 100 * correction, corrected, fe, fe - corrected);
    }
}
