using Seepage.Core.Geometry;

namespace Seepage.Core.Sections;

/// <summary>Reads and checks the cutoff walls: inside the domain, top on its boundary, tip inside it. A cutoff with
/// a thickness and a conductivity kx is a permeable wall instead, whose tip may also rest on the boundary.</summary>
internal static class CutoffReader
{
    /// <summary>The impervious cutoffs and the permeable walls, with each wall's index in the section's cutoffs.</summary>
    public sealed record CutoffSet(List<Cutoff> Cutoffs, List<PermeableWall> Permeable, List<int> PermeableIndex);

    public static CutoffSet Read(List<CutoffDocument>? docs, Domain? domain, double tolerance, double unitFactor, PointReader reader,
        List<SectionProblem> problems)
    {
        var cutoffs = new List<Cutoff>();
        var permeable = new List<PermeableWall>();
        var permeableIndex = new List<int>();
        if (docs is null) return new(cutoffs, permeable, permeableIndex);
        var lines = new List<(Point2 Top, Point2 Tip, int Index)>();
        for (int i = 0; i < docs.Count; i++)
        {
            var c = docs[i]; string at = $"/cutoffs/{i}";
            if (c is null) { problems.Add(new(at, "must be an object.")); continue; }
            var top = reader.Point(c.Top, $"{at}/top");
            var tip = reader.Point(c.Tip, $"{at}/tip");
            bool isWall = c.Thickness is not null || c.Kx is not null;
            if (isWall && !WallData(c, at, unitFactor, problems)) continue;
            if (top is null || tip is null) continue;
            if (top.Value.DistanceTo(tip.Value) <= tolerance * 10) { problems.Add(new($"{at}/tip", "coincides with the top; a cutoff needs a length.")); continue; }
            string name = c.Name ?? $"cutoff {i + 1}";
            if (domain is not null)
            {
                if (!domain.SegmentInside(top.Value, tip.Value, tolerance * 10))
                { problems.Add(new(at, "leaves the domain; a cutoff must lie inside the zones.")); continue; }
                if (domain.DistanceToBoundary(top.Value) > tolerance * 10)
                    problems.Add(new($"{at}/top", "must lie on the boundary of the domain (the ground surface or a structure base)."));
                if (!isWall && !domain.StrictlyInside(tip.Value, tolerance * 10))
                    problems.Add(new($"{at}/tip", "reaches the impervious boundary of the domain: the wall closes the flow path. End the tip inside the soil."));
            }
            if (isWall)
            {
                permeable.Add(new PermeableWall(name, top.Value, tip.Value, c.Thickness!.Value, c.Kx!.Value * unitFactor));
                permeableIndex.Add(i);
            }
            else cutoffs.Add(new Cutoff(name, top.Value, tip.Value));
            lines.Add((top.Value, tip.Value, i));
        }
        for (int i = 0; i < lines.Count; i++)
            for (int j = i + 1; j < lines.Count; j++)
                if (PolygonMath.ProperIntersection(lines[i].Top, lines[i].Tip, lines[j].Top, lines[j].Tip, tolerance) is not null)
                    problems.Add(new($"/cutoffs/{lines[j].Index}", $"crosses cutoff {lines[i].Index}; cutoffs must not cross."));
                else if (SegmentOverlap.Of(lines[i].Top, lines[i].Tip, lines[j].Top, lines[j].Tip, tolerance * 10) is { } common)
                    problems.Add(new($"/cutoffs/{lines[j].Index}", $"lies on /cutoffs/{lines[i].Index} from {common.From} to {common.To}; " +
                        "two cutoffs must not share a stretch (give one wall once)."));
        return new(cutoffs, permeable, permeableIndex);
    }

    // A permeable wall needs both a positive thickness (m) and a positive conductivity kx (conductivityUnit).
    private static bool WallData(CutoffDocument c, string at, double unitFactor, List<SectionProblem> problems)
    {
        bool ok = true;
        if (c.Thickness is not { } t)
        { problems.Add(new($"{at}/thickness", "is required with kx: a permeable wall needs its thickness in metres (give neither for an impervious wall of zero thickness).")); ok = false; }
        else if (!double.IsFinite(t) || t <= 0)
        { problems.Add(new($"{at}/thickness", "must be a positive thickness in metres (leave out thickness and kx for an impervious wall of zero thickness).")); ok = false; }
        if (c.Kx is not { } k)
        { problems.Add(new($"{at}/kx", "is required with a thickness: a permeable wall needs its hydraulic conductivity (in conductivityUnit); leave out the thickness for an impervious wall.")); ok = false; }
        else if (!double.IsFinite(k) || k <= 0)
        { problems.Add(new($"{at}/kx", "must be a positive hydraulic conductivity (in conductivityUnit).")); ok = false; }
        else if (ConductivityUnits.OutOfRange(k * unitFactor) is { } why) { problems.Add(new($"{at}/kx", why)); ok = false; }
        return ok;
    }
}
