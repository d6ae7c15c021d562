using Seepage.Core.Solvers;

namespace Seepage.Core.Tests.Solvers;

public class ConjugateGradientTests
{
    // 1-D Laplacian tridiag(-1, 2, -1) with x = 1 at both ends eliminated: the exact solution is all ones
    // (the discrete second difference of a constant vanishes) — common practice as a solver smoke test.
    [Fact]
    public void Solve_TridiagonalLaplacian_ReproducesConstant()
    {
        int n = 50;
        var rowStart = new List<int> { 0 }; var cols = new List<int>(); var vals = new List<double>();
        for (int i = 0; i < n; i++)
        {
            if (i > 0) { cols.Add(i - 1); vals.Add(-1); }
            cols.Add(i); vals.Add(2);
            if (i < n - 1) { cols.Add(i + 1); vals.Add(-1); }
            rowStart.Add(cols.Count);
        }
        var a = new CsrMatrix(n, rowStart.ToArray(), cols.ToArray(), vals.ToArray());
        var b = new double[n]; b[0] = 1; b[n - 1] = 1;
        var x = new double[n];
        var report = ConjugateGradient.Solve(a, b, x, new JacobiPreconditioner(a), new SolverOptions());
        Assert.All(x, v => Assert.Equal(1.0, v, 1e-9));
        Assert.True(report.Iterations <= n);
    }

    [Fact]
    public void Solve_IterationCapTooSmall_Throws()
    {
        int n = 50;
        var rowStart = new List<int> { 0 }; var cols = new List<int>(); var vals = new List<double>();
        for (int i = 0; i < n; i++)
        {
            if (i > 0) { cols.Add(i - 1); vals.Add(-1); }
            cols.Add(i); vals.Add(2);
            if (i < n - 1) { cols.Add(i + 1); vals.Add(-1); }
            rowStart.Add(cols.Count);
        }
        var a = new CsrMatrix(n, rowStart.ToArray(), cols.ToArray(), vals.ToArray());
        var b = new double[n]; b[0] = 1; b[n - 1] = 1;
        var ex = Assert.Throws<SolverNotConvergedException>(() =>
            ConjugateGradient.Solve(a, b, new double[n], new JacobiPreconditioner(a), new SolverOptions { MaxIterations = 3 }));
        Assert.Equal(3, ex.Iterations);
    }
}
