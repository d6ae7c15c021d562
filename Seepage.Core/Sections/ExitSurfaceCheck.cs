using System.Collections;
using Seepage.Core.Geometry;

namespace Seepage.Core.Sections;

/// <summary>Refuses a given exit surface that lies on no boundary where water can leave: a head, a drain or (when the
/// contract has them) a seepage face. On a no-flow boundary the normal gradient is zero by the boundary condition, so a
/// piping check there would report a safe-looking figure that means nothing.</summary>
internal static class ExitSurfaceCheck
{
    public static void Check(SectionDocument doc, ExitCheck? exit, IEnumerable<HeadBoundary> heads, IEnumerable<DrainBoundary> drains,
        double tolerance, List<SectionProblem> problems)
    {
        if (exit is not { AlongGiven: true }) return;
        var outflow = heads.Select(h => h.Along).Concat(drains.Select(d => d.Along)).Concat(SeepageFaces(doc)).ToList();
        for (int i = 0; i + 1 < exit.Along.Count; i++)
            foreach (double t in new[] { 0.25, 0.5, 0.75 })
            {
                var p = exit.Along[i] + t * (exit.Along[i + 1] - exit.Along[i]);
                if (outflow.Any(line => PolygonMath.DistanceToPolyline(p, line) <= tolerance * 10)) return;
            }
        problems.Add(new("/exitCheck/along", "lies on no head, drain or seepage-face boundary: water cannot leave there (the boundary " +
            "is no-flow), so there is no exit gradient to check. Put the exit surface on the tailwater or a drain."));
    }

    // Seepage faces, when the section document has them (a member "seepageFaces" whose items have "along").
    private static IEnumerable<IReadOnlyList<Point2>> SeepageFaces(SectionDocument doc)
    {
        if (!SectionContract.MembersOf(typeof(SectionDocument)).TryGetValue("seepageFaces", out var member)) yield break;
        if (member.GetValue(doc) is not IEnumerable faces) yield break;
        foreach (var face in faces)
            if (face?.GetType().GetProperty("Along")?.GetValue(face) is List<double[]> along)
                yield return along.Where(p => p is { Length: 2 }).Select(p => new Point2(p[0], p[1])).ToList();
    }
}
