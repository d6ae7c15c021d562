using Seepage.Core.Geometry;

namespace Seepage.Core.Sections;

/// <summary>Reads [x, y] pairs and polylines from a document, recording problems with their pointers.</summary>
internal sealed class PointReader(List<SectionProblem> problems)
{
    /// <summary>Largest coordinate magnitude accepted, m: sections are local (a few km at most), and beyond this the
    /// geometric tolerances lose their meaning.</summary>
    public const double LargestCoordinate = 1e6;

    public Point2? Point(double[]? pair, string pointer)
    {
        if (pair is null) { problems.Add(new(pointer, "is required: a point [x, y] in metres.")); return null; }
        if (pair.Length != 2) { problems.Add(new(pointer, $"must be a point [x, y] with 2 numbers, not {pair.Length}.")); return null; }
        if (!double.IsFinite(pair[0]) || !double.IsFinite(pair[1])) { problems.Add(new(pointer, "coordinates must be finite numbers.")); return null; }
        if (Math.Abs(pair[0]) > LargestCoordinate || Math.Abs(pair[1]) > LargestCoordinate)
        { problems.Add(new(pointer, "coordinates must lie within ±1,000,000 m; use local section coordinates.")); return null; }
        return new Point2(pair[0], pair[1]);
    }

    public List<Point2>? Polyline(List<double[]>? points, string pointer, int minimum, string what)
    {
        if (points is null) { problems.Add(new(pointer, $"is required: {what}, a list of at least {minimum} points [x, y] in metres.")); return null; }
        if (points.Count < minimum) { problems.Add(new(pointer, $"needs at least {minimum} points, has {points.Count}.")); return null; }
        var result = new List<Point2>(points.Count);
        bool ok = true;
        for (int i = 0; i < points.Count; i++)
        {
            var p = Point(points[i], $"{pointer}/{i}");
            if (p is null) ok = false; else result.Add(p.Value);
        }
        if (!ok) return null;
        for (int i = 0; i + 1 < result.Count; i++)
            if (result[i].NearlyEquals(result[i + 1], 1e-12 * (1 + result[i].Length)))
            {
                problems.Add(new($"{pointer}/{i + 1}", "repeats the previous point; consecutive points must differ."));
                return null;
            }
        return result;
    }
}
