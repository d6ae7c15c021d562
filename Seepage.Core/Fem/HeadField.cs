using Seepage.Core.Meshing;

namespace Seepage.Core.Fem;

/// <summary>The solved total head (m) at every node of a mesh, with the conductivity tensor of each zone (m/s).</summary>
public sealed class HeadField(Mesh mesh, double[] heads, IReadOnlyList<ConductivityTensor> zoneTensors)
{
    public Mesh Mesh { get; } = mesh;
    public double[] Heads { get; } = heads;
    public IReadOnlyList<ConductivityTensor> ZoneTensors { get; } = zoneTensors;

    /// <summary>Head gradient (dh/dx, dh/dy) in triangle t, dimensionless.</summary>
    public (double Dx, double Dy) Gradient(int t)
    {
        var tri = Mesh.Triangles; var x = Mesh.X; var y = Mesh.Y;
        int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
        return LinearTriangle.Gradient(x[a], y[a], x[b], y[b], x[c], y[c], Heads[a], Heads[b], Heads[c]);
    }

    /// <summary>Darcy velocity v = −K ∇h in triangle t, m/s.</summary>
    public (double Vx, double Vy) Velocity(int t)
    {
        var (gx, gy) = Gradient(t);
        var k = ZoneTensors[Mesh.Zones[t]];
        return (-(k.Kxx * gx + k.Kxy * gy), -(k.Kxy * gx + k.Kyy * gy));
    }
}
