namespace Seepage.Core.Geometry;

/// <summary>A point of the section plane.</summary>
/// <remarks>X is the horizontal station in metres (positive downstream by convention of the section),
/// Y the elevation in metres, positive up.</remarks>
public readonly record struct Point2(double X, double Y)
{
    public static Point2 operator +(Point2 a, Point2 b) => new(a.X + b.X, a.Y + b.Y);
    public static Point2 operator -(Point2 a, Point2 b) => new(a.X - b.X, a.Y - b.Y);
    public static Point2 operator *(double s, Point2 a) => new(s * a.X, s * a.Y);

    /// <summary>Euclidean distance in metres.</summary>
    public double DistanceTo(Point2 other) => Math.Sqrt((X - other.X) * (X - other.X) + (Y - other.Y) * (Y - other.Y));

    /// <summary>Length of the position vector in metres.</summary>
    public double Length => Math.Sqrt(X * X + Y * Y);

    /// <summary>True when both coordinates agree within <paramref name="tolerance"/> metres.</summary>
    public bool NearlyEquals(Point2 other, double tolerance) =>
        Math.Abs(X - other.X) <= tolerance && Math.Abs(Y - other.Y) <= tolerance;

    public override string ToString() => FormattableString.Invariant($"({X:G6}, {Y:G6})");
}
