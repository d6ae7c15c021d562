namespace Seepage.Core.Solvers;

/// <summary>Estimate of ρ(D⁻¹A) for SPD A by a few Lanczos steps on the similar matrix D^{-1/2} A D^{-1/2}:
/// the largest Ritz value converges fast to the top of the spectrum (Saad, "Iterative Methods for Sparse
/// Linear Systems", 2nd ed., SIAM 2003, ch. 6 — from memory). The start vector is a fixed pseudo-random one
/// so setups repeat exactly.</summary>
internal static class SpectralRadius
{
    public static double OfJacobi(CsrMatrix a, double[] diagonal, int steps = 12)
    {
        int n = a.Size;
        if (n == 1) return 1;
        steps = Math.Min(steps, n);
        var s = new double[n];   // D^{-1/2}
        for (int i = 0; i < n; i++) s[i] = diagonal[i] > 0 ? 1 / Math.Sqrt(diagonal[i]) : 1;
        var v = new double[n]; var vPrev = new double[n]; var w = new double[n]; var t = new double[n];
        var random = new Random(20261201);
        for (int i = 0; i < n; i++) v[i] = random.NextDouble() + 0.5;
        Scale(v, 1 / Math.Sqrt(VectorKernels.Dot(v, v)));
        var alpha = new double[steps]; var beta = new double[steps];
        int m = 0;
        for (int j = 0; j < steps; j++)
        {
            for (int i = 0; i < n; i++) t[i] = s[i] * v[i];
            a.Multiply(t, w);
            for (int i = 0; i < n; i++) w[i] *= s[i];
            double aj = VectorKernels.Dot(w, v);
            double bPrev = j > 0 ? beta[j - 1] : 0;
            for (int i = 0; i < n; i++) w[i] -= aj * v[i] + bPrev * vPrev[i];
            alpha[j] = aj; m = j + 1;
            double bj = Math.Sqrt(VectorKernels.Dot(w, w));
            beta[j] = bj;
            if (bj <= 1e-12 * Math.Abs(aj)) break;
            (vPrev, v) = (v, vPrev);
            for (int i = 0; i < n; i++) v[i] = w[i] / bj;
        }
        return LargestEigenvalue(alpha, beta, m);
    }

    private static void Scale(double[] v, double f) { for (int i = 0; i < v.Length; i++) v[i] *= f; }

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
