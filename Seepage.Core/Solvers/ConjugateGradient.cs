using System.Diagnostics;

namespace Seepage.Core.Solvers;

/// <summary>Preconditioned conjugate gradient for symmetric positive definite systems.</summary>
public static class ConjugateGradient
{
    /// <summary>Solves A x = b starting from the given x; throws <see cref="SolverNotConvergedException"/>
    /// when the tolerance is not reached within the iteration cap or the time budget.</summary>
    public static SolveReport Solve(CsrMatrix a, double[] b, double[] x, IPreconditioner m, SolverOptions options,
        CancellationToken cancellation = default)
    {
        var clock = Stopwatch.StartNew();
        int n = a.Size;
        string method = $"PCG + {m.Name}";
        var r = new double[n]; var z = new double[n]; var p = new double[n]; var q = new double[n];
        double bNorm = Math.Sqrt(Dot(b, b));
        if (bNorm == 0)
        {
            Array.Clear(x);
            return new SolveReport(method, m.Levels, m.OperatorComplexity, 0, 0, clock.Elapsed.TotalSeconds, n);
        }

        a.Multiply(x, r);
        for (int i = 0; i < n; i++) r[i] = b[i] - r[i];
        m.Apply(r, z);
        Array.Copy(z, p, n);
        double rz = Dot(r, z);
        double residual = Math.Sqrt(Dot(r, r)) / bNorm;
        int iteration = 0;
        while (residual > options.RelativeTolerance)
        {
            if (iteration >= options.MaxIterations)
                throw new SolverNotConvergedException(method, iteration, residual, options.RelativeTolerance, "iteration cap reached");
            if (options.TimeBudget is { } budget && clock.Elapsed > budget)
                throw new SolverNotConvergedException(method, iteration, residual, options.RelativeTolerance, "time budget exceeded");
            cancellation.ThrowIfCancellationRequested();

            a.Multiply(p, q);
            double pq = Dot(p, q);
            if (!(pq > 0))
                throw new SolverNotConvergedException(method, iteration, residual, options.RelativeTolerance, "matrix not positive definite");
            double alpha = rz / pq;
            double rr = 0;
            for (int i = 0; i < n; i++)
            {
                x[i] += alpha * p[i];
                r[i] -= alpha * q[i];
                rr += r[i] * r[i];
            }
            residual = Math.Sqrt(rr) / bNorm;
            iteration++;
            if (residual <= options.RelativeTolerance) break;
            m.Apply(r, z);
            double rzNew = Dot(r, z);
            double beta = rzNew / rz;
            rz = rzNew;
            for (int i = 0; i < n; i++) p[i] = z[i] + beta * p[i];
        }
        return new SolveReport(method, m.Levels, m.OperatorComplexity, iteration, residual, clock.Elapsed.TotalSeconds, n);
    }

    private static double Dot(ReadOnlySpan<double> u, ReadOnlySpan<double> v)
    {
        double s = 0;
        for (int i = 0; i < u.Length; i++) s += u[i] * v[i];
        return s;
    }
}
