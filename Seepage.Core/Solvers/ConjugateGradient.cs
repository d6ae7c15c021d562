using System.Diagnostics;

namespace Seepage.Core.Solvers;

/// <summary>Preconditioned conjugate gradients for symmetric positive definite systems (Saad, "Iterative
/// Methods for Sparse Linear Systems", 2nd ed., SIAM 2003, Algorithm 9.1). The vector updates are fused
/// (x, r and ‖r‖² in one pass; q = A p and pᵀq in one pass) and run on two threads for long vectors.</summary>
public static class ConjugateGradient
{
    /// <summary>Solves A x = b starting from the given x; throws <see cref="SolverNotConvergedException"/>
    /// when the tolerance is not reached within the iteration cap or the time budget, or when a curvature
    /// pᵀAp or rᵀz is not positive (A or the preconditioner is not positive definite).</summary>
    public static SolveReport Solve(CsrMatrix a, double[] b, double[] x, IPreconditioner m, SolverOptions options,
        CancellationToken cancellation = default)
        => Solve(a, b, x, m, options, cancellation, Stopwatch.StartNew());

    /// <summary>As above, with a clock already running (the time budget then also covers the setup).</summary>
    internal static SolveReport Solve(CsrMatrix a, double[] b, double[] x, IPreconditioner m, SolverOptions options,
        CancellationToken cancellation, Stopwatch clock)
    {
        int n = a.Size;
        string method = $"PCG + {m.Name}";
        double tol = options.RelativeTolerance;
        var r = new double[n]; var z = new double[n]; var p = new double[n]; var q = new double[n];
        double bNorm = Math.Sqrt(VectorKernels.Dot(b, b));
        if (bNorm == 0)
        {
            Array.Clear(x);
            return new SolveReport(method, m.Levels, m.OperatorComplexity, 0, 0, clock.Elapsed.TotalSeconds, n);
        }

        a.Multiply(x, r);
        for (int i = 0; i < n; i++) r[i] = b[i] - r[i];
        double residual = Math.Sqrt(VectorKernels.Dot(r, r)) / bNorm;
        if (!double.IsFinite(residual))
            throw new MatrixRefusedException(method, "non-finite initial residual (check matrix and right-hand side)");
        int iteration = 0;
        double rz = 0;
        while (residual > tol)
        {
            if (iteration >= options.MaxIterations)
                throw new SolverNotConvergedException(method, iteration, residual, tol, "iteration cap reached");
            if (options.TimeBudget is { } budget && clock.Elapsed > budget)
                throw new SolverNotConvergedException(method, iteration, residual, tol, "time budget exceeded");
            cancellation.ThrowIfCancellationRequested();

            m.Apply(r, z);
            double rzNew = VectorKernels.Dot(r, z);
            if (!(rzNew > 0))
                throw new SolverNotConvergedException(method, iteration, residual, tol, "preconditioner not positive definite (rᵀz ≤ 0)");
            if (iteration == 0) Array.Copy(z, p, n);
            else VectorKernels.UpdateDirection(p, z, rzNew / rz);
            rz = rzNew;

            double pq = a.MultiplyDot(p, q);
            if (!(pq > 0))
                throw new SolverNotConvergedException(method, iteration, residual, tol, "matrix not positive definite (pᵀAp ≤ 0)");
            double alpha = rz / pq;
            double rr = VectorKernels.UpdateSolutionAndResidual(x, r, p, q, alpha);
            residual = Math.Sqrt(rr) / bNorm;
            iteration++;
        }
        return new SolveReport(method, m.Levels, m.OperatorComplexity, iteration, residual, clock.Elapsed.TotalSeconds, n);
    }
}
