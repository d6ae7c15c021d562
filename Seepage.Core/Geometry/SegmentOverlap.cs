namespace Seepage.Core.Geometry;

/// <summary>The common stretch of two segments that lie on one line (within a tolerance), e.g. two boundary conditions
/// given on the same piece of boundary or two cutoffs drawn on top of each other. Segments that merely touch at a point
/// or cross have no common stretch.</summary>
public static class SegmentOverlap
{
    /// <summary>The common stretch of a0–a1 and b0–b1 when both ends of b lie within <paramref name="tolerance"/> (m) of
    /// the line through a and the shared part is longer than the tolerance; null otherwise.</summary>
    public static (Point2 From, Point2 To)? Of(Point2 a0, Point2 a1, Point2 b0, Point2 b1, double tolerance)
    {
        var d = a1 - a0;
        double length = d.Length;
        if (length <= tolerance || b0.DistanceTo(b1) <= tolerance) return null;
        var u = (1 / length) * d;
        // Distance of b's ends from the line through a: |cross(u, b − a0)|.
        double Off(Point2 p) => Math.Abs(u.X * (p.Y - a0.Y) - u.Y * (p.X - a0.X));
        if (Off(b0) > tolerance || Off(b1) > tolerance) return null;
        double Along(Point2 p) => u.X * (p.X - a0.X) + u.Y * (p.Y - a0.Y);
        double s0 = Math.Max(0, Math.Min(Along(b0), Along(b1))), s1 = Math.Min(length, Math.Max(Along(b0), Along(b1)));
        return s1 - s0 > tolerance ? (a0 + s0 * u, a0 + s1 * u) : null;
    }

    /// <summary>The first common stretch of two polylines (segment by segment), or null.</summary>
    public static (Point2 From, Point2 To)? Of(IReadOnlyList<Point2> a, IReadOnlyList<Point2> b, double tolerance)
    {
        for (int i = 0; i + 1 < a.Count; i++)
            for (int j = 0; j + 1 < b.Count; j++)
                if (Of(a[i], a[i + 1], b[j], b[j + 1], tolerance) is { } common) return common;
        return null;
    }
}
