namespace Seepage.Core.Solvers;

/// <summary>Estimate of ρ(D⁻¹A) for SPD A by a few Lanczos steps on the similar matrix S A S, S = D^{-1/2}:
/// the largest Ritz value converges fast to the top of the spectrum (Saad, "Iterative Methods for Sparse
/// Linear Systems", 2nd ed., SIAM 2003, ch. 6 — from memory). α_j = v_jᵀ S A S v_j = tᵀ A t with t = S v_j
/// comes out of the product itself; the three-term update and ‖w‖ share one pass. The start vector is a
/// fixed pseudo-random one so setups repeat exactly.</summary>
internal static unsafe class SpectralRadius
{
    public static double OfJacobi(CsrMatrix a, double[] diagonal, int steps = 10)
    {
        int n = a.Size;
        if (n == 1) return 1;
        steps = Math.Min(steps, n);
        var s = GC.AllocateUninitializedArray<double>(n);
        for (int i = 0; i < n; i++) s[i] = diagonal[i] > 0 ? 1 / Math.Sqrt(diagonal[i]) : 1;
        var v = GC.AllocateUninitializedArray<double>(n); var vPrev = new double[n];
        var y = GC.AllocateUninitializedArray<double>(n); var t = GC.AllocateUninitializedArray<double>(n);
        var random = new Random(20261201);
        for (int i = 0; i < n; i++) v[i] = random.NextDouble() + 0.5;
        double vNorm = Math.Sqrt(VectorKernels.Dot(v, v));
        for (int i = 0; i < n; i++) v[i] /= vNorm;
        var alpha = new double[steps]; var beta = new double[steps];
        int m = 0, split = TwoWay.Middle(n);
        for (int j = 0; j < steps; j++)
        {
            TwoWay.For(n, split, (lo, hi) => { for (int i = lo; i < hi; i++) t[i] = s[i] * v[i]; });
            double aj = a.MultiplyDot(t, y);                       // y = A t, α = tᵀ A t
            double bPrev = j > 0 ? beta[j - 1] : 0;
            var (vj, vp) = (v, vPrev);
            // w = S y − α v − β v_prev, stored over v_prev; returns ‖w‖².
            double ww = TwoWay.Sum(n, split, (lo, hi) =>
            {
                double sum = 0;
                for (int i = lo; i < hi; i++)
                {
                    double w = s[i] * y[i] - aj * vj[i] - bPrev * vp[i];
                    vp[i] = w; sum += w * w;
                }
                return sum;
            });
            alpha[j] = aj; m = j + 1;
            double bj = Math.Sqrt(ww);
            beta[j] = bj;
            if (bj <= 1e-12 * Math.Abs(aj)) break;
            // v_{j+1} = w / β_j lives in the old v_prev array; v_j becomes the new v_prev.
            (v, vPrev) = (vp, vj);
            double inv = 1 / bj;
            TwoWay.For(n, split, (lo, hi) => { for (int i = lo; i < hi; i++) vp[i] *= inv; });
        }
        return LargestEigenvalue(alpha, beta, m);
    }

    /// <summary>Largest eigenvalue of the symmetric tridiagonal (α on the diagonal, β beside it), by
    /// bisection on the Sturm sequence count inside the Gershgorin interval.</summary>
    internal static double LargestEigenvalue(double[] alpha, double[] beta, int m)
    {
        double lo = double.MaxValue, hi = double.MinValue;
        for (int i = 0; i < m; i++)
        {
            double r = (i > 0 ? Math.Abs(beta[i - 1]) : 0) + (i < m - 1 ? Math.Abs(beta[i]) : 0);
            lo = Math.Min(lo, alpha[i] - r); hi = Math.Max(hi, alpha[i] + r);
        }
        for (int it = 0; it < 100 && hi - lo > 1e-12 * Math.Max(1, Math.Abs(hi)); it++)
        {
            double mid = 0.5 * (lo + hi);
            if (CountAbove(alpha, beta, m, mid) > 0) lo = mid; else hi = mid;
        }
        return hi;
    }

    /// <summary>Number of eigenvalues greater than x (m minus the negative pivots of T − x I).</summary>
    private static int CountAbove(double[] alpha, double[] beta, int m, double x)
    {
        int below = 0; double d = 1;
        for (int i = 0; i < m; i++)
        {
            double b2 = i > 0 ? beta[i - 1] * beta[i - 1] : 0;
            d = alpha[i] - x - (i > 0 ? b2 / d : 0);
            if (d == 0) d = 1e-300;
            if (d < 0) below++;
        }
        return m - below;
    }
}
