using Seepage.Core.Meshing;
using Seepage.Core.Solvers;

namespace Seepage.Core.Fem;

/// <summary>Assembles the global conductivity matrix K (all nodes, before boundary conditions) straight into
/// the CSR values of the precomputed pattern: K = Σ_e k_e over the P1 triangles. An optional factor per triangle
/// (dimensionless, e.g. the relative conductivity of partly saturated soil) scales each element's tensor.</summary>
public static class GlobalAssembler
{
    public static CsrMatrix Assemble(Mesh mesh, SparsityPattern pattern, IReadOnlyList<ConductivityTensor> zoneTensors,
        double[]? elementFactors = null)
    {
        var values = new double[pattern.Columns.Length];
        var tri = mesh.Triangles; var x = mesh.X; var y = mesh.Y;
        Span<double> k = stackalloc double[9];
        Span<int> slot = stackalloc int[9];
        for (int t = 0; t < mesh.TriangleCount; t++)
        {
            int n0 = tri[3 * t], n1 = tri[3 * t + 1], n2 = tri[3 * t + 2];
            var tensor = zoneTensors[mesh.Zones[t]];
            if (elementFactors is not null) tensor = tensor.Scaled(elementFactors[t]);
            LinearTriangle.Stiffness(x[n0], y[n0], x[n1], y[n1], x[n2], y[n2], tensor, k);
            int r0 = n0, r1 = n1, r2 = n2;
            slot[0] = pattern.IndexOf(r0, n0); slot[1] = pattern.IndexOf(r0, n1); slot[2] = pattern.IndexOf(r0, n2);
            slot[3] = pattern.IndexOf(r1, n0); slot[4] = pattern.IndexOf(r1, n1); slot[5] = pattern.IndexOf(r1, n2);
            slot[6] = pattern.IndexOf(r2, n0); slot[7] = pattern.IndexOf(r2, n1); slot[8] = pattern.IndexOf(r2, n2);
            for (int q = 0; q < 9; q++) values[slot[q]] += k[q];
        }
        return new CsrMatrix(pattern.Size, pattern.RowStart, pattern.Columns, values);
    }

    /// <summary>K = Σ_e k_e over the quadratic triangles of <paramref name="dofs"/> (pattern of 6-node elements).</summary>
    public static CsrMatrix AssembleQuadratic(Mesh mesh, QuadraticDofs dofs, SparsityPattern pattern,
        IReadOnlyList<ConductivityTensor> zoneTensors)
    {
        var values = new double[pattern.Columns.Length];
        var tri = mesh.Triangles; var x = mesh.X; var y = mesh.Y; var el = dofs.Elements;
        Span<double> k = stackalloc double[36];
        for (int t = 0; t < mesh.TriangleCount; t++)
        {
            int n0 = tri[3 * t], n1 = tri[3 * t + 1], n2 = tri[3 * t + 2];
            QuadraticTriangle.Stiffness(x[n0], y[n0], x[n1], y[n1], x[n2], y[n2], zoneTensors[mesh.Zones[t]], k);
            for (int i = 0; i < 6; i++)
            {
                int row = el[6 * t + i];
                for (int j = 0; j < 6; j++) values[pattern.IndexOf(row, el[6 * t + j])] += k[6 * i + j];
            }
        }
        return new CsrMatrix(pattern.Size, pattern.RowStart, pattern.Columns, values);
    }
}
