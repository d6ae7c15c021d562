using Seepage.Core.Geometry;
using Seepage.Core.Meshing;

namespace Seepage.Core.Results;

/// <summary>The phreatic surface of an unconfined solution: the level line p = h − y = 0 of the nodal pressure head,
/// traced through the mesh. Pieces shorter than 1 % of the longest (closed specks in the unsaturated soil where p
/// grazes zero) are left out; each line runs from its upstream (lower x) end, and the lines are sorted upstream first.</summary>
public static class PhreaticSurfaceTracer
{
    public static IReadOnlyList<PhreaticLine> Trace(Mesh mesh, double[] heads)
    {
        var pressure = PressureHead(mesh, heads);
        var lines = ContourTracer.Trace(mesh, pressure, 0);
        if (lines.Count == 0) return [];
        double longest = lines.Max(PolygonMath.Length);
        return lines.Where(l => PolygonMath.Length(l) >= 0.01 * longest)
            .Select(l => l[0].X <= l[^1].X ? l : Enumerable.Reverse(l).ToList())
            .OrderBy(l => l[0].X).Select(l => new PhreaticLine(l)).ToList();
    }

    /// <summary>Pressure head p = h − y (m) at each mesh node.</summary>
    public static double[] PressureHead(Mesh mesh, double[] heads)
    {
        var p = new double[mesh.NodeCount];
        for (int i = 0; i < p.Length; i++) p[i] = heads[i] - mesh.Y[i];
        return p;
    }
}
