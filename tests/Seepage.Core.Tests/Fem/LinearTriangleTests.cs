using Seepage.Core.Fem;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;
using Seepage.Core.Tests.Support;

namespace Seepage.Core.Tests.Fem;

public class LinearTriangleTests
{
    private static readonly ConductivityTensor Anisotropic =
        ConductivityTensor.Of(new Soil("s", 3e-5, 1e-6, 30, null, null, null, null));

    // The patch test (Irons & Razzaque, "Experience with the patch test for convergence of finite elements", 1972;
    // also Zienkiewicz & Taylor, "The Finite Element Method", vol. 1): a conforming element must reproduce a
    // linear field exactly on any mesh when the boundary carries that field. A linear head is a solution of
    // div(K grad h) = 0 for any constant K.
    [Fact]
    public void Solve_LinearFieldOnIrregularMesh_ReproducedTo1e10()
    {
        var mesh = GridMesh.Rectangle(0, 10, -5, 0, 12, 9, jiggle: 0.3);
        var pattern = SparsityPattern.Of(mesh);
        var full = GlobalAssembler.Assemble(mesh, pattern, [Anisotropic]);
        Func<double, double, double> exact = (x, y) => 2.0 + 0.3 * x - 0.7 * y;
        var isFixed = new bool[mesh.NodeCount]; var value = new double[mesh.NodeCount];
        for (int i = 0; i < mesh.NodeCount; i++)
        {
            bool edge = Math.Abs(mesh.X[i]) < 1e-12 || Math.Abs(mesh.X[i] - 10) < 1e-12 || Math.Abs(mesh.Y[i]) < 1e-12 || Math.Abs(mesh.Y[i] + 5) < 1e-12;
            if (edge) { isFixed[i] = true; value[i] = exact(mesh.X[i], mesh.Y[i]); }
        }
        var system = LinearSystem.Condense(full, new FixedHeads(isFixed, value));
        var free = new double[system.Matrix.Size];
        LinearSolver.Solve(system.Matrix, system.Rhs, free, new SolverOptions { RelativeTolerance = 1e-14 });
        var h = system.Expand(free);
        for (int i = 0; i < mesh.NodeCount; i++) Assert.Equal(exact(mesh.X[i], mesh.Y[i]), h[i], 1e-10);
    }

    // Common practice: before boundary conditions the conductivity matrix is symmetric and every row sums to zero,
    // because a constant head drives no flow (K·1 = 0).
    [Fact]
    public void Assemble_BeforeBoundaryConditions_SymmetricWithZeroRowSums()
    {
        var mesh = GridMesh.Rectangle(-3, 4, -2, 1, 7, 5, jiggle: 0.25);
        var pattern = SparsityPattern.Of(mesh);
        var k = GlobalAssembler.Assemble(mesh, pattern, [Anisotropic]);
        double scale = k.Values.Max(Math.Abs);
        for (int i = 0; i < k.Size; i++)
        {
            double sum = 0;
            for (int p = k.RowStart[i]; p < k.RowStart[i + 1]; p++)
            {
                sum += k.Values[p];
                int q = pattern.IndexOf(k.Columns[p], i);
                Assert.True(q >= 0);
                Assert.Equal(k.Values[p], k.Values[q], 1e-14 * scale);
            }
            Assert.Equal(0, sum, 1e-13 * scale);
        }
    }

    [Fact]
    public void ConductivityTensor_RotatedBedding_KeepsInvariants()
    {
        // Trace and determinant of K are kx + ky and kx·ky for any rotation (common practice: tensor invariants).
        var k = ConductivityTensor.Of(new Soil("s", 4e-5, 1e-5, 37, null, null, null, null));
        Assert.Equal(5e-5, k.Kxx + k.Kyy, 1e-18);
        Assert.Equal(4e-10, k.Kxx * k.Kyy - k.Kxy * k.Kxy, 1e-22);
    }
}
