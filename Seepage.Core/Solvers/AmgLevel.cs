namespace Seepage.Core.Solvers;

/// <summary>One level of the multigrid hierarchy and its fused V-cycle kernels. W = ω_s D⁻¹ is the damped
/// Jacobi smoother, P the prolongator from the next coarser level and R = Pᵀ the restriction.
/// Every kernel is a row loop split over two threads at fixed rows.</summary>
internal sealed unsafe class AmgLevel
{
    public AmgLevel(CsrMatrix a, double[] smootherWeight, CsrMatrix? p, CsrMatrix? r)
    {
        A = a; W = smootherWeight; P = p; R = r;
        Work = new double[a.Size];
        if (p is not null) { CoarseB = new double[p.ColumnCount]; CoarseX = new double[p.ColumnCount]; }
    }

    public CsrMatrix A { get; }
    public double[] W { get; }
    public CsrMatrix? P { get; }
    public CsrMatrix? R { get; }
    public double[] Work { get; }
    public double[]? CoarseB { get; }
    public double[]? CoarseX { get; }

    /// <summary>Pre-smoothing from a zero guess, x₁ = W b, fused with the residual r = b − A W b
    /// (x₁ itself is not stored: it is recomputed in <see cref="ProlongAdd"/>).</summary>
    public void PreSmoothResidual(double* b, double* r)
    {
        nint pb = (nint)b, pr = (nint)r;
        TwoWay.For(A.Size, A.SplitRow, (lo, hi) =>
        {
            double* bb = (double*)pb, rr = (double*)pr;
            fixed (int* rs = A.RowStart, cols = A.Columns)
            fixed (double* vals = A.Values, w = W)
                for (int i = lo; i < hi; i++)
                {
                    double s = 0;
                    for (int k = rs[i]; k < rs[i + 1]; k++) { int j = cols[k]; s += vals[k] * (w[j] * bb[j]); }
                    rr[i] = bb[i] - s;
                }
        });
    }

    /// <summary>b_c = R r.</summary>
    public void Restrict(double* r, double* coarseB)
    {
        var restriction = R!;
        nint pr = (nint)r, pc = (nint)coarseB;
        TwoWay.For(restriction.Size, restriction.SplitRow, (lo, hi) => restriction.MultiplyRows((double*)pr, (double*)pc, lo, hi));
    }

    /// <summary>Coarse-grid correction t = x₁ + P x_c with x₁ = W b.</summary>
    public void ProlongAdd(double* b, double* coarseX, double* t)
    {
        var p = P!;
        nint pb = (nint)b, pc = (nint)coarseX, pt = (nint)t;
        TwoWay.For(p.Size, p.SplitRow, (lo, hi) =>
        {
            double* bb = (double*)pb, xc = (double*)pc, tt = (double*)pt;
            fixed (int* rs = p.RowStart, cols = p.Columns)
            fixed (double* vals = p.Values, w = W)
                for (int i = lo; i < hi; i++)
                {
                    double s = w[i] * bb[i];
                    for (int k = rs[i]; k < rs[i + 1]; k++) s += vals[k] * xc[cols[k]];
                    tt[i] = s;
                }
        });
    }

    /// <summary>Post-smoothing x = t + W (b − A t).</summary>
    public void PostSmooth(double* b, double* t, double* x)
    {
        nint pb = (nint)b, pt = (nint)t, px = (nint)x;
        TwoWay.For(A.Size, A.SplitRow, (lo, hi) =>
        {
            double* bb = (double*)pb, tt = (double*)pt, xx = (double*)px;
            fixed (int* rs = A.RowStart, cols = A.Columns)
            fixed (double* vals = A.Values, w = W)
                for (int i = lo; i < hi; i++)
                {
                    double s = 0;
                    for (int k = rs[i]; k < rs[i + 1]; k++) s += vals[k] * tt[cols[k]];
                    xx[i] = tt[i] + w[i] * (bb[i] - s);
                }
        });
    }

    /// <summary>Jacobi sweeps from zero, x = Σ (I − W A)^k W b — a symmetric stand-in for an exact solve
    /// on a coarsest level too large to factor densely (reached only when coarsening stalls).</summary>
    public void SmoothOnly(double* b, double* x, int sweeps)
    {
        int n = A.Size;
        for (int i = 0; i < n; i++) x[i] = W[i] * b[i];
        fixed (double* t = Work)
            for (int s = 0; s < sweeps - 1; s++)
            {
                Buffer.MemoryCopy(x, t, n * sizeof(double), n * sizeof(double));
                PostSmooth(b, t, x);
            }
    }
}
