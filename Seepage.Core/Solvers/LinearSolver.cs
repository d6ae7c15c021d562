using System.Diagnostics;

namespace Seepage.Core.Solvers;

/// <summary>The solver the pipeline calls: checks the matrix, builds the chosen preconditioner (by default
/// smoothed-aggregation AMG) and runs preconditioned conjugate gradients. The report's Seconds cover setup
/// and iterations; SetupSeconds the setup alone.</summary>
public static class LinearSolver
{
    public static SolveReport Solve(CsrMatrix a, double[] b, double[] x, SolverOptions options,
        CancellationToken cancellation = default)
    {
        var clock = Stopwatch.StartNew();
        if (b.Length != a.Size || x.Length != a.Size) throw new ArgumentException("b and x must have one entry per row of a.");
        if (a.Size == 0) return new SolveReport("none (no unknowns)", 0, 0, 0, 0, clock.Elapsed.TotalSeconds, 0);
        var diagonal = CheckedDiagonal(a);
        IPreconditioner m = options.Preconditioner switch
        {
            PreconditionerKind.Jacobi => new JacobiPreconditioner(a),
            PreconditionerKind.IncompleteCholesky => new IncompleteCholeskyPreconditioner(a),
            _ => new AlgebraicMultigridPreconditioner(a, options, cancellation, clock, diagonal),
        };
        double setup = clock.Elapsed.TotalSeconds;
        var report = ConjugateGradient.Solve(a, b, x, m, options, cancellation, clock);
        return report with { SetupSeconds = setup };
    }

    /// <summary>An SPD matrix has a positive diagonal; anything else is refused before iterating.</summary>
    private static double[] CheckedDiagonal(CsrMatrix a)
    {
        var d = a.Diagonal();
        for (int i = 0; i < d.Length; i++)
            if (!(d[i] > 0) || double.IsInfinity(d[i]))
                throw new MatrixRefusedException("linear solve",
                    FormattableString.Invariant($"matrix not positive definite: diagonal entry {d[i]:E3} in row {i}"));
        return d;
    }
}
