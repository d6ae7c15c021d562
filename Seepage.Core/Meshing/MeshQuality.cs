namespace Seepage.Core.Meshing;

/// <summary>Quality figures of a mesh: angles in degrees, histogram of smallest angles in 5° bins
/// (bin k holds triangles whose smallest angle lies in [5k, 5k+5)).</summary>
public sealed record MeshQuality(
    double MinAngle,
    double MaxAngle,
    int[] MinAngleHistogram,
    int Nodes,
    int Triangles,
    double Seconds)
{
    /// <summary>Computes the quality figures of a triangle list.</summary>
    public static MeshQuality Measure(double[] x, double[] y, int[] triangles, double seconds)
    {
        var histogram = new int[12];
        double minAngle = 180, maxAngle = 0;
        for (int t = 0; t < triangles.Length / 3; t++)
        {
            int a = triangles[3 * t], b = triangles[3 * t + 1], c = triangles[3 * t + 2];
            double ab = Hypot(x[b] - x[a], y[b] - y[a]);
            double bc = Hypot(x[c] - x[b], y[c] - y[b]);
            double ca = Hypot(x[a] - x[c], y[a] - y[c]);
            double angA = Angle(ab, ca, bc), angB = Angle(ab, bc, ca), angC = 180 - angA - angB;
            double lo = Math.Min(angA, Math.Min(angB, angC));
            double hi = Math.Max(angA, Math.Max(angB, angC));
            minAngle = Math.Min(minAngle, lo);
            maxAngle = Math.Max(maxAngle, hi);
            histogram[Math.Clamp((int)(lo / 5), 0, histogram.Length - 1)]++;
        }
        return new MeshQuality(minAngle, maxAngle, histogram, x.Length, triangles.Length / 3, seconds);
    }

    // Angle opposite side `opposite`, between sides s1 and s2 (law of cosines), degrees.
    private static double Angle(double s1, double s2, double opposite)
    {
        double c = (s1 * s1 + s2 * s2 - opposite * opposite) / (2 * s1 * s2);
        return Math.Acos(Math.Clamp(c, -1, 1)) * 180 / Math.PI;
    }

    private static double Hypot(double dx, double dy) => Math.Sqrt(dx * dx + dy * dy);
}
