using Seepage.Core.Geometry;

namespace Seepage.Core.Sections;

/// <summary>
/// Refuses two boundary conditions on the same stretch of boundary: two fixed heads (which would win, 2 m or 99 m?), a
/// drain on a fixed-head stretch, and any other pair of boundary polylines listed in <see cref="Lines"/> (a new kind of
/// boundary condition, such as a seepage face, is added there). Polylines that only meet at a point are fine. The later
/// polyline gets the problem, naming the earlier one's pointer.
/// </summary>
public static class BoundaryConflictCheck
{
    /// <summary>One boundary condition's polyline: its JSON pointer, what it is (for the message) and its points.</summary>
    public sealed record BoundaryLine(string Pointer, string Condition, IReadOnlyList<Point2> Points);

    /// <summary>The boundary-condition polylines of a document whose points are all well formed (the others are reported
    /// by the point reader).</summary>
    public static IEnumerable<BoundaryLine> Lines(SectionDocument doc)
    {
        for (int i = 0; i < (doc.Heads?.Count ?? 0); i++)
            if (doc.Heads![i] is { } h && Points(h.Along) is { } line)
                yield return new BoundaryLine($"/heads/{i}/along", FormattableString.Invariant($"the fixed head {h.Total} m"), line);
        for (int i = 0; i < (doc.Drains?.Count ?? 0); i++)
            if (doc.Drains![i] is { } d && Points(d.Along) is { } line)
                yield return new BoundaryLine($"/drains/{i}/along", "a drain (head = elevation)", line);
        for (int i = 0; i < (doc.SeepageFaces?.Count ?? 0); i++)
            if (doc.SeepageFaces![i] is { } f && Points(f.Along) is { } line)
                yield return new BoundaryLine($"/seepageFaces/{i}/along", "a seepage face", line);
    }

    /// <summary>Adds a problem for every later polyline that shares a stretch longer than <paramref name="tolerance"/> (m)
    /// with an earlier one.</summary>
    public static void Check(SectionDocument doc, double tolerance, List<SectionProblem> problems)
    {
        var lines = Lines(doc).ToList();
        for (int j = 1; j < lines.Count; j++)
            for (int i = 0; i < j; i++)
                if (SegmentOverlap.Of(lines[i].Points, lines[j].Points, tolerance) is { } common)
                {
                    problems.Add(new(lines[j].Pointer,
                        $"lies on the same stretch of boundary as {lines[i].Pointer} ({lines[i].Condition}), from {common.From} to " +
                        $"{common.To}; it would give {lines[j].Condition} there as well. A stretch takes one boundary condition: " +
                        "end one polyline where the other begins."));
                    break;
                }
    }

    private static List<Point2>? Points(List<double[]>? along)
    {
        if (along is null || along.Count < 2) return null;
        var points = new List<Point2>(along.Count);
        foreach (var p in along)
        {
            if (p is not { Length: 2 } || !double.IsFinite(p[0]) || !double.IsFinite(p[1])) return null;
            points.Add(new Point2(p[0], p[1]));
        }
        return points;
    }
}
