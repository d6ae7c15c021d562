namespace Seepage.Core.Geometry;

/// <summary>
/// Exact floating-point expansion arithmetic: a real number is held as a sum of non-overlapping doubles
/// ("expansion"), smallest magnitude first.
/// </summary>
/// <remarks>
/// After J. R. Shewchuk, "Adaptive precision floating-point arithmetic and fast robust geometric
/// predicates", Discrete &amp; Computational Geometry 18 (1997) 305–363: Two-Sum (Knuth), Two-Product
/// (here via a fused multiply-add, which is exact), Grow-Expansion, Fast-Expansion-Sum and Scale-Expansion
/// with zero elimination. Written from memory of that paper. All spans hold at most the lengths noted at
/// each method; callers pass stack buffers.
/// </remarks>
internal static class ExpansionArithmetic
{
    /// <summary>x + y = a + b exactly, x = fl(a + b).</summary>
    public static void TwoSum(double a, double b, out double x, out double y)
    {
        x = a + b;
        double bv = x - a;
        double av = x - bv;
        y = (a - av) + (b - bv);
    }

    /// <summary>x + y = a - b exactly, x = fl(a - b).</summary>
    public static void TwoDiff(double a, double b, out double x, out double y)
    {
        x = a - b;
        double bv = a - x;
        double av = x + bv;
        y = (a - av) + (bv - b);
    }

    /// <summary>x + y = a · b exactly (the FMA computes the rounding error of the product exactly).</summary>
    public static void TwoProduct(double a, double b, out double x, out double y)
    {
        x = a * b;
        y = Math.FusedMultiplyAdd(a, b, -x);
    }

    /// <summary>h = e + f (both expansions); returns the length of h (≤ |e| + |f|), zeros eliminated.</summary>
    public static int Sum(ReadOnlySpan<double> e, ReadOnlySpan<double> f, Span<double> h)
    {
        // Merge by magnitude, then accumulate with Two-Sum (Fast-Expansion-Sum-Zero-Elim; the linear
        // Two-Sum chain is used instead of Fast-Two-Sum, which is exact regardless of magnitude order).
        int elen = e.Length, flen = f.Length;
        if (elen == 0) { f.CopyTo(h); return flen; }
        if (flen == 0) { e.CopyTo(h); return elen; }
        int ei = 0, fi = 0, hi = 0;
        double q;
        if (Math.Abs(f[0]) > Math.Abs(e[0])) q = e[ei++]; else q = f[fi++];
        while (ei < elen || fi < flen)
        {
            double next;
            if (fi >= flen || (ei < elen && Math.Abs(e[ei]) < Math.Abs(f[fi]))) next = e[ei++];
            else next = f[fi++];
            TwoSum(q, next, out double qn, out double err);
            if (err != 0) h[hi++] = err;
            q = qn;
        }
        if (q != 0 || hi == 0) h[hi++] = q;
        return hi;
    }

    /// <summary>h = e · b; returns the length of h (≤ 2|e|), zeros eliminated.</summary>
    public static int Scale(ReadOnlySpan<double> e, double b, Span<double> h)
    {
        if (e.Length == 0) return 0;
        int hi = 0;
        TwoProduct(e[0], b, out double q, out double low);
        if (low != 0) h[hi++] = low;
        for (int i = 1; i < e.Length; i++)
        {
            TwoProduct(e[i], b, out double p1, out double p0);
            TwoSum(q, p0, out double sum, out double err);
            if (err != 0) h[hi++] = err;
            TwoSum(p1, sum, out q, out err);
            if (err != 0) h[hi++] = err;
        }
        if (q != 0 || hi == 0) h[hi++] = q;
        return hi;
    }

    /// <summary>h = e · f; returns the length of h (≤ 2|e||f|). Scratch must hold 2|e||f| + 2|e| values.</summary>
    public static int Multiply(ReadOnlySpan<double> e, ReadOnlySpan<double> f, Span<double> h, Span<double> scratch)
    {
        int len = 0;
        Span<double> term = scratch[..(2 * e.Length)];
        Span<double> acc = scratch.Slice(2 * e.Length);
        for (int j = 0; j < f.Length; j++)
        {
            int tl = Scale(e, f[j], term);
            h[..len].CopyTo(acc);
            len = Sum(acc[..len], term[..tl], h);
        }
        return len;
    }

    /// <summary>The sign of an expansion: the sign of its largest (last) component.</summary>
    public static double Estimate(ReadOnlySpan<double> e)
    {
        double s = 0;
        for (int i = 0; i < e.Length; i++) s += e[i];
        return s;
    }
}
