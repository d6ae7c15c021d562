using Seepage.Core.Geometry;
using Seepage.Core.Meshing;

namespace Seepage.Core.Fem;

/// <summary>
/// The solved total head (m) with the conductivity tensor of each zone (m/s). With linear elements
/// <see cref="Heads"/> holds one value per mesh node; with quadratic elements (<see cref="Quadratic"/> set) the
/// mesh nodes come first and the mid-edge nodes follow, so the first <c>Mesh.NodeCount</c> values are always the
/// heads at the mesh nodes (what drawing and contouring use). Evaluation is element-wise.
/// </summary>
public sealed class HeadField(Mesh mesh, double[] heads, IReadOnlyList<ConductivityTensor> zoneTensors, QuadraticDofs? quadratic = null)
{
    public Mesh Mesh { get; } = mesh;
    public double[] Heads { get; } = heads;
    public IReadOnlyList<ConductivityTensor> ZoneTensors { get; } = zoneTensors;
    /// <summary>The quadratic unknowns, or null for linear elements.</summary>
    public QuadraticDofs? Quadratic { get; } = quadratic;

    /// <summary>Dimensionless factor per triangle on its zone's tensor (the relative conductivity of an unconfined
    /// solution: 1 where saturated, down to a small floor above the phreatic surface); null means 1 everywhere.</summary>
    public double[]? ElementFactors { get; init; }

    /// <summary>The conductivity tensor of triangle t, m/s (its zone's, times its element factor).</summary>
    public ConductivityTensor TensorOf(int t) =>
        ElementFactors is null ? ZoneTensors[Mesh.Zones[t]] : ZoneTensors[Mesh.Zones[t]].Scaled(ElementFactors[t]);

    /// <summary>Element order: 1 or 2.</summary>
    public int Order => Quadratic is null ? 1 : 2;

    /// <summary>Head (m) in triangle t at barycentric coordinates (l0, l1, l2).</summary>
    public double Value(int t, double l0, double l1, double l2)
    {
        if (Quadratic is not { } q)
        {
            var tri = Mesh.Triangles;
            return l0 * Heads[tri[3 * t]] + l1 * Heads[tri[3 * t + 1]] + l2 * Heads[tri[3 * t + 2]];
        }
        Span<double> n = stackalloc double[6];
        QuadraticTriangle.Shapes(l0, l1, l2, n);
        double h = 0;
        for (int i = 0; i < 6; i++) h += n[i] * Heads[q.Elements[6 * t + i]];
        return h;
    }

    /// <summary>Head gradient (dh/dx, dh/dy) in triangle t at its centroid, dimensionless (constant for P1).</summary>
    public (double Dx, double Dy) Gradient(int t) => GradientAt(t, 1.0 / 3, 1.0 / 3, 1.0 / 3);

    /// <summary>Head gradient (dh/dx, dh/dy) in triangle t at barycentric (l0, l1, l2), dimensionless.</summary>
    public (double Dx, double Dy) GradientAt(int t, double l0, double l1, double l2)
    {
        var tri = Mesh.Triangles; var x = Mesh.X; var y = Mesh.Y;
        int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
        if (Quadratic is not { } q)
            return LinearTriangle.Gradient(x[a], y[a], x[b], y[b], x[c], y[c], Heads[a], Heads[b], Heads[c]);
        Span<double> lx = stackalloc double[3], ly = stackalloc double[3], gx = stackalloc double[6], gy = stackalloc double[6];
        QuadraticTriangle.BarycentricGradients(x[a], y[a], x[b], y[b], x[c], y[c], lx, ly);
        QuadraticTriangle.ShapeGradients(l0, l1, l2, lx, ly, gx, gy);
        double dx = 0, dy = 0;
        for (int i = 0; i < 6; i++) { double h = Heads[q.Elements[6 * t + i]]; dx += gx[i] * h; dy += gy[i] * h; }
        return (dx, dy);
    }

    /// <summary>Head gradient in triangle t at point p (m), dimensionless.</summary>
    public (double Dx, double Dy) GradientAt(int t, Point2 p)
    {
        var (l0, l1, l2) = Barycentric(t, p);
        return GradientAt(t, l0, l1, l2);
    }

    /// <summary>Darcy velocity v = −K ∇h in triangle t at its centroid, m/s.</summary>
    public (double Vx, double Vy) Velocity(int t) => ToVelocity(t, Gradient(t));

    /// <summary>Darcy velocity v = −K ∇h in triangle t at point p, m/s.</summary>
    public (double Vx, double Vy) VelocityAt(int t, Point2 p) => ToVelocity(t, GradientAt(t, p));

    /// <summary>Barycentric coordinates of p in triangle t.</summary>
    public (double, double, double) Barycentric(int t, Point2 p)
    {
        var tri = Mesh.Triangles; var m = Mesh;
        int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
        double x0 = m.X[a], y0 = m.Y[a], x1 = m.X[b], y1 = m.Y[b], x2 = m.X[c], y2 = m.Y[c];
        double d = (x1 - x0) * (y2 - y0) - (x2 - x0) * (y1 - y0);
        double l1 = ((p.X - x0) * (y2 - y0) - (x2 - x0) * (p.Y - y0)) / d;
        double l2 = ((x1 - x0) * (p.Y - y0) - (p.X - x0) * (y1 - y0)) / d;
        return (1 - l1 - l2, l1, l2);
    }

    private (double, double) ToVelocity(int t, (double Dx, double Dy) g)
    {
        var k = TensorOf(t);
        return (-(k.Kxx * g.Dx + k.Kxy * g.Dy), -(k.Kxy * g.Dx + k.Kyy * g.Dy));
    }
}
