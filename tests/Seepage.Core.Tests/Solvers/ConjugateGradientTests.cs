using Seepage.Core.Solvers;

namespace Seepage.Core.Tests.Solvers;

public class ConjugateGradientTests
{
    private const int N = 50;

    // 1-D Laplacian tridiag(-1, 2, -1) with x = 1 at both ends eliminated: the exact solution is all ones
    // (the discrete second difference of a constant vanishes) — common practice as a solver smoke test.
    private static (CsrMatrix A, double[] B) Laplacian()
    {
        var rowStart = new List<int> { 0 }; var cols = new List<int>(); var vals = new List<double>();
        for (int i = 0; i < N; i++)
        {
            if (i > 0) { cols.Add(i - 1); vals.Add(-1); }
            cols.Add(i); vals.Add(2);
            if (i < N - 1) { cols.Add(i + 1); vals.Add(-1); }
            rowStart.Add(cols.Count);
        }
        var b = new double[N]; b[0] = 1; b[N - 1] = 1;
        return (new CsrMatrix(N, rowStart.ToArray(), cols.ToArray(), vals.ToArray()), b);
    }

    [Fact]
    public void Solve_TridiagonalLaplacian_ReproducesConstant()
    {
        var (a, b) = Laplacian();
        var x = new double[N];
        var report = ConjugateGradient.Solve(a, b, x, new JacobiPreconditioner(a), new SolverOptions());
        Assert.All(x, v => Assert.Equal(1.0, v, 1e-9));
        Assert.True(report.Iterations <= N);
    }

    [Fact]
    public void Solve_IterationCapTooSmall_Throws()
    {
        var (a, b) = Laplacian();
        var ex = Assert.Throws<SolverNotConvergedException>(() =>
            ConjugateGradient.Solve(a, b, new double[N], new JacobiPreconditioner(a), new SolverOptions { MaxIterations = 3 }));
        Assert.Equal(3, ex.Iterations);
    }
}
