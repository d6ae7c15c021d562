using Seepage.Core.Fem;
using Seepage.Core.Solvers;
using Seepage.Core.Tests.Support;

namespace Seepage.Core.Tests.Fem;

public class QuadraticTriangleTests
{
    // Quadratic elements contain every quadratic polynomial, so a harmonic quadratic such as h = x² − y² + 3xy is
    // reproduced to round-off when it is prescribed on the boundary (the patch test; e.g. Zienkiewicz & Taylor,
    // "The Finite Element Method", vol. 1, 2000, ch. 10). Linear elements could not pass this.
    [Fact]
    public void AssembleQuadratic_HarmonicQuadratic_ReproducedExactly()
    {
        var mesh = GridMesh.Rectangle(0, 3, -2, 0, 6, 4, jiggle: 0.2);
        var dofs = new QuadraticDofs(mesh);
        static double Exact(double x, double y) => x * x - y * y + 3 * x * y;
        var tensors = new[] { new ConductivityTensor(1, 0, 1) };
        var k = GlobalAssembler.AssembleQuadratic(mesh, dofs, SparsityPattern.Of(dofs.Count, dofs.Elements, 6), tensors);
        var isFixed = new bool[dofs.Count]; var value = new double[dofs.Count];
        var boundary = new MeshBoundary(mesh);
        foreach (int n in MeshBoundary.NodesOf(boundary.Edges, dofs)) { isFixed[n] = true; value[n] = Exact(dofs.X[n], dofs.Y[n]); }
        var system = LinearSystem.Condense(k, new FixedHeads(isFixed, value));
        var free = new double[system.Matrix.Size];
        LinearSolver.Solve(system.Matrix, system.Rhs, free, new SolverOptions { RelativeTolerance = 1e-13 });
        var h = system.Expand(free);
        double worst = 0;
        for (int n = 0; n < dofs.Count; n++) worst = Math.Max(worst, Math.Abs(h[n] - Exact(dofs.X[n], dofs.Y[n])));
        Assert.True(worst < 1e-9, $"largest nodal error {worst:E3}");
        var field = new HeadField(mesh, h, tensors, dofs);
        var (gx, gy) = field.GradientAt(5, 0.2, 0.3, 0.5);
        var (l0, l1, l2) = (0.2, 0.3, 0.5);
        int a = mesh.Triangles[15], b = mesh.Triangles[16], c = mesh.Triangles[17];
        double px = l0 * mesh.X[a] + l1 * mesh.X[b] + l2 * mesh.X[c], py = l0 * mesh.Y[a] + l1 * mesh.Y[b] + l2 * mesh.Y[c];
        Assert.Equal(2 * px + 3 * py, gx, 1e-8);
        Assert.Equal(-2 * py + 3 * px, gy, 1e-8);
    }

    [Fact]
    public void Split_Triangle_GivesFourWithQuarterArea()
    {
        var mesh = GridMesh.Rectangle(0, 2, 0, 1, 2, 1);
        var fine = UniformRefinement.Split(mesh);
        Assert.Equal(4 * mesh.TriangleCount, fine.TriangleCount);
        Assert.Equal(mesh.NodeCount + 9, fine.NodeCount); // 2×1 cells: 6 nodes, 9 edges (4 horizontal, 3 vertical, 2 diagonal)
        double area = 0;
        for (int t = 0; t < fine.TriangleCount; t++)
        {
            int a = fine.Triangles[3 * t], b = fine.Triangles[3 * t + 1], c = fine.Triangles[3 * t + 2];
            double twice = (fine.X[b] - fine.X[a]) * (fine.Y[c] - fine.Y[a]) - (fine.X[c] - fine.X[a]) * (fine.Y[b] - fine.Y[a]);
            Assert.True(twice > 0, "refined triangles keep counter-clockwise order");
            area += twice / 2;
        }
        Assert.Equal(2.0, area, 1e-12);
    }
}
