using Seepage.Core.Geometry;

namespace Seepage.Core.Sections;

/// <summary>Reads and checks the cutoff walls: inside the domain, top on its boundary, tip inside it.</summary>
internal static class CutoffReader
{
    public static List<Cutoff> Read(List<CutoffDocument>? docs, Domain? domain, double tolerance, PointReader reader,
        List<SectionProblem> problems)
    {
        var cutoffs = new List<Cutoff>();
        if (docs is null) return cutoffs;
        for (int i = 0; i < docs.Count; i++)
        {
            var c = docs[i]; string at = $"/cutoffs/{i}";
            if (c is null) { problems.Add(new(at, "must be an object.")); continue; }
            var top = reader.Point(c.Top, $"{at}/top");
            var tip = reader.Point(c.Tip, $"{at}/tip");
            if (c.Thickness is { } t && t > 0)
            {
                problems.Add(new($"{at}/thickness", "permeable walls of finite thickness are not supported yet; give no thickness for an impervious wall."));
                continue;
            }
            if (top is null || tip is null) continue;
            if (top.Value.DistanceTo(tip.Value) <= tolerance * 10) { problems.Add(new($"{at}/tip", "coincides with the top; a cutoff needs a length.")); continue; }
            string name = c.Name ?? $"cutoff {i + 1}";
            if (domain is not null)
            {
                if (!domain.SegmentInside(top.Value, tip.Value, tolerance * 10))
                { problems.Add(new(at, "leaves the domain; a cutoff must lie inside the zones.")); continue; }
                if (domain.DistanceToBoundary(top.Value) > tolerance * 10)
                    problems.Add(new($"{at}/top", "must lie on the boundary of the domain (the ground surface or a structure base)."));
                if (!domain.StrictlyInside(tip.Value, tolerance * 10))
                    problems.Add(new($"{at}/tip", "reaches the impervious boundary of the domain: the wall closes the flow path. End the tip inside the soil."));
            }
            cutoffs.Add(new Cutoff(name, top.Value, tip.Value));
        }
        for (int i = 0; i < cutoffs.Count; i++)
            for (int j = i + 1; j < cutoffs.Count; j++)
                if (PolygonMath.ProperIntersection(cutoffs[i].Top, cutoffs[i].Tip, cutoffs[j].Top, cutoffs[j].Tip, tolerance) is not null)
                    problems.Add(new($"/cutoffs/{j}", $"crosses cutoff {i}; cutoffs must not cross."));
        return cutoffs;
    }
}
