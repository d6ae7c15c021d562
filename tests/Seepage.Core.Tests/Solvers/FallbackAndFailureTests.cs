using Seepage.Core.Solvers;

namespace Seepage.Core.Tests.Solvers;

public class FallbackAndFailureTests
{
    private static double MaxRelativeDifference(double[] x, double[] reference)
    {
        double scale = reference.Max(Math.Abs);
        return x.Zip(reference, (u, v) => Math.Abs(u - v)).Max() / scale;
    }

    [Theory]
    [InlineData(PreconditionerKind.IncompleteCholesky)]
    [InlineData(PreconditionerKind.Jacobi)]
    [InlineData(PreconditionerKind.AlgebraicMultigrid)]
    public void Solve_EachPreconditioner_MatchesDenseCholesky(PreconditionerKind kind)
    {
        var problem = Problems.PartialHeads(10, 1e3, 10);
        var x = new double[problem.Unknowns];
        var report = LinearSolver.Solve(problem.Matrix, problem.Rhs, x, new SolverOptions { Preconditioner = kind, RelativeTolerance = 1e-13 });
        Assert.True(MaxRelativeDifference(x, AlgebraicMultigridTests.DenseSolve(problem.Matrix, problem.Rhs)) <= 1e-9);
        Assert.True(report.Residual <= 1e-13);
    }

    // IC(0) takes far fewer iterations than Jacobi on a Laplacian (Saad 2003, ch. 10, from memory).
    [Fact]
    public void Solve_IncompleteCholesky_BeatsJacobiIterations()
    {
        var problem = Problems.PartialHeads(24, 1e3, 1);
        var ic = LinearSolver.Solve(problem.Matrix, problem.Rhs, new double[problem.Unknowns], new SolverOptions { Preconditioner = PreconditionerKind.IncompleteCholesky });
        var jacobi = LinearSolver.Solve(problem.Matrix, problem.Rhs, new double[problem.Unknowns], new SolverOptions { Preconditioner = PreconditionerKind.Jacobi });
        Assert.True(ic.Iterations * 2 < jacobi.Iterations, $"IC(0) {ic.Iterations}, Jacobi {jacobi.Iterations}");
    }

    [Fact]
    public void Solve_CancelledToken_ThrowsOperationCanceled()
    {
        var problem = Problems.PartialHeads(16, 1e3, 1);
        using var source = new CancellationTokenSource();
        source.Cancel();
        Assert.ThrowsAny<OperationCanceledException>(() =>
            LinearSolver.Solve(problem.Matrix, problem.Rhs, new double[problem.Unknowns], new SolverOptions(), source.Token));
    }

    [Theory]
    [InlineData(PreconditionerKind.AlgebraicMultigrid)]
    [InlineData(PreconditionerKind.Jacobi)]
    public void Solve_TimeBudgetExhausted_ThrowsNotConverged(PreconditionerKind kind)
    {
        var problem = Problems.PartialHeads(16, 1e3, 1);
        var ex = Assert.Throws<SolverNotConvergedException>(() => LinearSolver.Solve(problem.Matrix, problem.Rhs,
            new double[problem.Unknowns], new SolverOptions { Preconditioner = kind, TimeBudget = TimeSpan.Zero }));
        Assert.Contains("time budget", ex.Message);
    }

    [Fact]
    public void Solve_TooFewIterations_ThrowsWithIterationsAndResidual()
    {
        var problem = Problems.PartialHeads(16, 1e3, 1);
        var ex = Assert.Throws<SolverNotConvergedException>(() => LinearSolver.Solve(problem.Matrix, problem.Rhs,
            new double[problem.Unknowns], new SolverOptions { MaxIterations = 2 }));
        Assert.Equal(2, ex.Iterations);
        Assert.InRange(ex.Residual, 1e-10, 1);
        Assert.Contains("2 iterations", ex.Message);
    }

    // tridiag(−1.5, 2, −1.5) has eigenvalues 2 − 3 cos(kπ/(n+1)), some negative: symmetric, positive
    // diagonal, indefinite (common practice).
    [Theory]
    [InlineData(PreconditionerKind.AlgebraicMultigrid)]
    [InlineData(PreconditionerKind.Jacobi)]
    public void Solve_IndefiniteMatrix_ThrowsNotPositiveDefinite(PreconditionerKind kind)
    {
        int n = 40;
        var entries = new List<(int, int, double)>();
        for (int i = 0; i < n; i++)
        {
            entries.Add((i, i, 2));
            if (i > 0) { entries.Add((i, i - 1, -1.5)); entries.Add((i - 1, i, -1.5)); }
        }
        var a = GridProblem.ToCsr(entries, n);
        var b = Enumerable.Repeat(1.0, n).ToArray();
        var ex = Assert.Throws<SolverNotConvergedException>(() =>
            LinearSolver.Solve(a, b, new double[n], new SolverOptions { Preconditioner = kind, CoarsestSize = 8 }));
        Assert.Contains("positive definite", ex.Message);
    }

    [Fact]
    public void Solve_NegativeDiagonal_ThrowsBeforeIterating()
    {
        var a = new CsrMatrix(2, new[] { 0, 1, 2 }, new[] { 0, 1 }, new[] { 1.0, -2.0 });
        var ex = Assert.Throws<MatrixRefusedException>(() =>
            LinearSolver.Solve(a, new[] { 1.0, 1.0 }, new double[2], new SolverOptions()));
        Assert.Contains("row 1", ex.Reason);
    }
}
