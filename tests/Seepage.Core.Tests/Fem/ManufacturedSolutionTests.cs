using System.Globalization;
using Seepage.Core.Fem;
using Seepage.Core.Solvers;
using Seepage.Core.Tests.Support;

namespace Seepage.Core.Tests.Fem;

/// <summary>Convergence rates by the method of manufactured solutions (Roache, "Verification and Validation in
/// Computational Science and Engineering", 1998): the harmonic u = sin(πx)·sinh(πy)/sinh(π) on the unit square,
/// prescribed on the whole boundary, solved on four uniform refinements. The a-priori estimates for a smooth
/// solution (Ciarlet, "The Finite Element Method for Elliptic Problems", 1978, Thm 3.2.2 with the Aubin–Nitsche
/// argument) give ‖u − u_h‖_L2 = O(h^(k+1)) and |u − u_h|_H1 = O(h^k) for elements of degree k:
/// P1 (2, 1), P2 (3, 2).
/// The fitted log–log slopes must lie within ±0.1 of these; the table is printed when one does not.</summary>
public class ManufacturedSolutionTests(Xunit.Abstractions.ITestOutputHelper output)
{
    private static double Exact(double x, double y) => Math.Sin(Math.PI * x) * Math.Sinh(Math.PI * y) / Math.Sinh(Math.PI);

    private static (double Dx, double Dy) ExactGradient(double x, double y) =>
        (Math.PI * Math.Cos(Math.PI * x) * Math.Sinh(Math.PI * y) / Math.Sinh(Math.PI),
         Math.PI * Math.Sin(Math.PI * x) * Math.Cosh(Math.PI * y) / Math.Sinh(Math.PI));

    // Degree-5, 7-point symmetric rule on a triangle (Dunavant, "High degree efficient symmetrical Gaussian
    // quadrature rules for the triangle", Int. J. Numer. Methods Eng. 21, 1985; values from memory, checked by
    // Quadrature_Degree5Rule_IntegratesQuinticsExactly). Barycentric points, weights as fractions of the area.
    private static readonly (double L0, double L1, double L2, double W)[] Rule = Points();

    private static (double, double, double, double)[] Points()
    {
        const double a1 = 0.059715871789770, b1 = 0.470142064105115, w1 = 0.132394152788506;
        const double a2 = 0.797426985353087, b2 = 0.101286507323456, w2 = 0.125939180544827;
        return [(1.0 / 3, 1.0 / 3, 1.0 / 3, 0.225),
            (a1, b1, b1, w1), (b1, a1, b1, w1), (b1, b1, a1, w1),
            (a2, b2, b2, w2), (b2, a2, b2, w2), (b2, b2, a2, w2)];
    }

    [Fact]
    public void Quadrature_Degree5Rule_IntegratesQuinticsExactly()
    {
        // ∫ x^a y^b over the reference triangle (0,0), (1,0), (0,1) = a! b! / (a + b + 2)!.
        double Integrate(Func<double, double, double> f) => 0.5 * Rule.Sum(q => q.W * f(q.L1, q.L2));
        Assert.Equal(1.0 / 42, Integrate((x, _) => Math.Pow(x, 5)), 1e-13);
        Assert.Equal(1.0 / 420, Integrate((x, y) => x * x * y * y * y), 1e-13);
        Assert.Equal(0.5, Integrate((_, _) => 1), 1e-14);
    }

    [Theory]
    [InlineData(1, 2.0, 1.0)]
    [InlineData(2, 3.0, 2.0)]
    public void Solve_ManufacturedHarmonic_ErrorSlopesMatchElementDegree(int order, double l2Rate, double h1Rate)
    {
        int[] cells = order == 1 ? [8, 16, 32, 64] : [4, 8, 16, 32];
        var rows = cells.Select(n => Errors(n, order)).ToList();
        double[] logH = [.. cells.Select(n => Math.Log(1.0 / n))];
        double l2Slope = Slope(logH, [.. rows.Select(r => Math.Log(r.L2))]);
        double h1Slope = Slope(logH, [.. rows.Select(r => Math.Log(r.H1))]);
        string table = Table(cells, rows, l2Slope, h1Slope, order);
        output.WriteLine(table);
        Assert.True(Math.Abs(l2Slope - l2Rate) <= 0.1 && Math.Abs(h1Slope - h1Rate) <= 0.1, table);
    }

    private static (double L2, double H1) Errors(int n, int order)
    {
        var mesh = GridMesh.Rectangle(0, 1, 0, 1, n, n);
        var tensors = new[] { new ConductivityTensor(1, 0, 1) };
        var dofs = order == 2 ? new QuadraticDofs(mesh) : null;
        int count = dofs?.Count ?? mesh.NodeCount;
        var k = dofs is null
            ? GlobalAssembler.Assemble(mesh, SparsityPattern.Of(mesh), tensors)
            : GlobalAssembler.AssembleQuadratic(mesh, dofs, SparsityPattern.Of(dofs.Count, dofs.Elements, 6), tensors);
        var isFixed = new bool[count]; var value = new double[count];
        var boundary = new MeshBoundary(mesh);
        foreach (int i in MeshBoundary.NodesOf(boundary.Edges, dofs))
        {
            isFixed[i] = true;
            value[i] = dofs is null ? Exact(mesh.X[i], mesh.Y[i]) : Exact(dofs.X[i], dofs.Y[i]);
        }
        var system = LinearSystem.Condense(k, new FixedHeads(isFixed, value));
        var free = new double[system.Matrix.Size];
        LinearSolver.Solve(system.Matrix, system.Rhs, free, new SolverOptions { RelativeTolerance = 1e-13 });
        var field = new HeadField(mesh, system.Expand(free), tensors, dofs);

        double l2 = 0, h1 = 0;
        for (int t = 0; t < mesh.TriangleCount; t++)
        {
            int a = mesh.Triangles[3 * t], b = mesh.Triangles[3 * t + 1], c = mesh.Triangles[3 * t + 2];
            double area = 0.5 * Math.Abs((mesh.X[b] - mesh.X[a]) * (mesh.Y[c] - mesh.Y[a])
                - (mesh.X[c] - mesh.X[a]) * (mesh.Y[b] - mesh.Y[a]));
            foreach (var (l0, l1, l2q, w) in Rule)
            {
                double x = l0 * mesh.X[a] + l1 * mesh.X[b] + l2q * mesh.X[c];
                double y = l0 * mesh.Y[a] + l1 * mesh.Y[b] + l2q * mesh.Y[c];
                double e = field.Value(t, l0, l1, l2q) - Exact(x, y);
                var (gx, gy) = field.GradientAt(t, l0, l1, l2q);
                var (ex, ey) = ExactGradient(x, y);
                l2 += w * area * e * e;
                h1 += w * area * ((gx - ex) * (gx - ex) + (gy - ey) * (gy - ey));
            }
        }
        return (Math.Sqrt(l2), Math.Sqrt(h1));
    }

    /// <summary>Least-squares slope of y against x.</summary>
    private static double Slope(double[] x, double[] y)
    {
        double mx = x.Average(), my = y.Average();
        return x.Zip(y).Sum(p => (p.First - mx) * (p.Second - my)) / x.Sum(v => (v - mx) * (v - mx));
    }

    // Observed order between two meshes of halved size: log2 of the error ratio.
    private static string Order(double coarse, double fine) =>
        (Math.Log(coarse / fine) / Math.Log(2)).ToString("F3", CultureInfo.InvariantCulture);

    private static string Table(int[] cells, List<(double L2, double H1)> rows, double l2Slope, double h1Slope, int order)
    {
        var lines = new List<string> { $"P{order}: cells per side, h, L2 error, order, H1 error, order" };
        for (int i = 0; i < cells.Length; i++)
        {
            string o2 = i == 0 ? "" : Order(rows[i - 1].L2, rows[i].L2);
            string o1 = i == 0 ? "" : Order(rows[i - 1].H1, rows[i].H1);
            lines.Add(string.Create(CultureInfo.InvariantCulture,
                $"{cells[i],4} {1.0 / cells[i],8:F5} {rows[i].L2,12:E4} {o2,6} {rows[i].H1,12:E4} {o1,6}"));
        }
        lines.Add(string.Create(CultureInfo.InvariantCulture, $"fitted slopes: L2 {l2Slope:F3}, H1 {h1Slope:F3}"));
        return string.Join("\n", lines);
    }
}
