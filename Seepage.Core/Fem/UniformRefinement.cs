using Seepage.Core.Meshing;

namespace Seepage.Core.Fem;

/// <summary>
/// Splits every triangle of a mesh into four through its edge midpoints (so the mesh size halves everywhere and the
/// shapes, hence the angles, are kept). Midpoints are shared by edge, keyed by the two end nodes; the faces of a
/// cutoff slit have distinct nodes, so their midpoints stay distinct and the slit survives refinement.
/// </summary>
public static class UniformRefinement
{
    public static Mesh Split(Mesh mesh)
    {
        var mids = new QuadraticDofs(mesh); // the mid-edge nodes are exactly the new vertices
        var el = mids.Elements;
        int nt = mesh.TriangleCount;
        var tri = new int[12 * nt];
        var zones = new int[4 * nt];
        for (int t = 0; t < nt; t++)
        {
            int v0 = el[6 * t], v1 = el[6 * t + 1], v2 = el[6 * t + 2], m01 = el[6 * t + 3], m12 = el[6 * t + 4], m20 = el[6 * t + 5];
            int[] four = [v0, m01, m20, m01, v1, m12, m20, m12, v2, m01, m12, m20];
            four.CopyTo(tri, 12 * t);
            for (int k = 0; k < 4; k++) zones[4 * t + k] = mesh.Zones[t];
        }
        return new Mesh(mids.X, mids.Y, tri, zones, MeshQuality.Measure(mids.X, mids.Y, tri, 0), mesh.Warnings);
    }
}
