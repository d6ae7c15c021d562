namespace Seepage.Core.Solvers;

/// <summary>The solver the pipeline calls: picks the preconditioner and runs PCG.</summary>
public static class LinearSolver
{
    public static SolveReport Solve(CsrMatrix a, double[] b, double[] x, SolverOptions options,
        CancellationToken cancellation = default)
    {
        var preconditioner = new JacobiPreconditioner(a);
        return ConjugateGradient.Solve(a, b, x, preconditioner, options, cancellation);
    }
}
