using static Seepage.Core.Geometry.ExpansionArithmetic;

namespace Seepage.Core.Geometry;

/// <summary>
/// Orientation and in-circle tests whose sign is always correct for double inputs: a floating-point
/// evaluation with a forward error bound (the filter) decides almost every call; only when the result is
/// within the bound is the determinant evaluated exactly with expansion arithmetic.
/// </summary>
/// <remarks>
/// Error bounds are those of J. R. Shewchuk, "Adaptive precision floating-point arithmetic and fast robust
/// geometric predicates", Discrete &amp; Computational Geometry 18 (1997): ccwerrboundA = (3 + 16ε)ε and
/// iccerrboundA = (10 + 96ε)ε with ε = 2⁻⁵³ (from memory). The fallback here is a single exact stage rather
/// than Shewchuk's four-stage adaptive ladder: simpler, and the filter already settles the common case.
/// </remarks>
internal static class RobustPredicates
{
    private const double Epsilon = 1.1102230246251565e-16; // 2^-53
    private const double CcwBound = (3.0 + 16.0 * Epsilon) * Epsilon;
    private const double InCircleBound = (10.0 + 96.0 * Epsilon) * Epsilon;

    /// <summary>Positive when a, b, c turn counter-clockwise, negative clockwise, zero when collinear.
    /// The magnitude is twice the signed area when the filter decides, otherwise only the sign is meaningful.</summary>
    public static double Orient(double ax, double ay, double bx, double by, double cx, double cy)
    {
        double detLeft = (ax - cx) * (by - cy);
        double detRight = (ay - cy) * (bx - cx);
        double det = detLeft - detRight;
        double detSum;
        if (detLeft > 0)
        {
            if (detRight <= 0) return det;
            detSum = detLeft + detRight;
        }
        else if (detLeft < 0)
        {
            if (detRight >= 0) return det;
            detSum = -detLeft - detRight;
        }
        else return det;
        if (det >= CcwBound * detSum || -det >= CcwBound * detSum) return det;
        return OrientExact(ax, ay, bx, by, cx, cy);
    }

    /// <summary>Positive when d lies strictly inside the circle through a, b, c (counter-clockwise),
    /// negative outside, zero on it.</summary>
    public static double InCircle(double ax, double ay, double bx, double by, double cx, double cy, double dx, double dy)
    {
        double adx = ax - dx, bdx = bx - dx, cdx = cx - dx;
        double ady = ay - dy, bdy = by - dy, cdy = cy - dy;
        double bdxcdy = bdx * cdy, cdxbdy = cdx * bdy;
        double alift = adx * adx + ady * ady;
        double cdxady = cdx * ady, adxcdy = adx * cdy;
        double blift = bdx * bdx + bdy * bdy;
        double adxbdy = adx * bdy, bdxady = bdx * ady;
        double clift = cdx * cdx + cdy * cdy;
        double det = alift * (bdxcdy - cdxbdy) + blift * (cdxady - adxcdy) + clift * (adxbdy - bdxady);
        double permanent = (Math.Abs(bdxcdy) + Math.Abs(cdxbdy)) * alift
                         + (Math.Abs(cdxady) + Math.Abs(adxcdy)) * blift
                         + (Math.Abs(adxbdy) + Math.Abs(bdxady)) * clift;
        double bound = InCircleBound * permanent;
        if (det > bound || -det > bound) return det;
        return InCircleExact(ax, ay, bx, by, cx, cy, dx, dy);
    }

    private static double OrientExact(double ax, double ay, double bx, double by, double cx, double cy)
    {
        // det = ax·by − ay·bx + bx·cy − by·cx + cx·ay − cy·ax, each product exact as two doubles.
        Span<double> p = stackalloc double[2];
        Span<double> acc = stackalloc double[12];
        Span<double> tmp = stackalloc double[12];
        int len = 0;
        len = AddProduct(ax, by, p, acc, tmp, len);
        len = AddProduct(-ay, bx, p, acc, tmp, len);
        len = AddProduct(bx, cy, p, acc, tmp, len);
        len = AddProduct(-by, cx, p, acc, tmp, len);
        len = AddProduct(cx, ay, p, acc, tmp, len);
        len = AddProduct(-cy, ax, p, acc, tmp, len);
        return acc[len - 1];
    }

    private static int AddProduct(double a, double b, Span<double> p, Span<double> acc, Span<double> tmp, int len)
    {
        TwoProduct(a, b, out double hi, out double lo);
        int pl = 0;
        if (lo != 0) p[pl++] = lo;
        p[pl++] = hi;
        acc[..len].CopyTo(tmp);
        return Sum(tmp[..len], p[..pl], acc);
    }

    private static double InCircleExact(double ax, double ay, double bx, double by, double cx, double cy, double dx, double dy)
    {
        // Differences are exact as 2-component expansions; the determinant
        //   alift·(bdx·cdy − bdy·cdx) + blift·(cdx·ady − cdy·adx) + clift·(adx·bdy − ady·bdx)
        // is then formed with exact expansion products (each term has at most 512 components).
        Span<double> adx = stackalloc double[2], ady = stackalloc double[2];
        Span<double> bdx = stackalloc double[2], bdy = stackalloc double[2];
        Span<double> cdx = stackalloc double[2], cdy = stackalloc double[2];
        int nadx = Diff(ax, dx, adx), nady = Diff(ay, dy, ady);
        int nbdx = Diff(bx, dx, bdx), nbdy = Diff(by, dy, bdy);
        int ncdx = Diff(cx, dx, cdx), ncdy = Diff(cy, dy, cdy);
        Span<double> scratch = stackalloc double[2600];
        Span<double> total = stackalloc double[1600];
        Span<double> next = stackalloc double[1600];
        int tlen = 0;
        tlen = AddTerm(adx[..nadx], ady[..nady], bdx[..nbdx], cdy[..ncdy], bdy[..nbdy], cdx[..ncdx], total, next, scratch, tlen);
        tlen = AddTerm(bdx[..nbdx], bdy[..nbdy], cdx[..ncdx], ady[..nady], cdy[..ncdy], adx[..nadx], total, next, scratch, tlen);
        tlen = AddTerm(cdx[..ncdx], cdy[..ncdy], adx[..nadx], bdy[..nbdy], ady[..nady], bdx[..nbdx], total, next, scratch, tlen);
        return total[tlen - 1];
    }

    private static int Diff(double a, double b, Span<double> e)
    {
        TwoDiff(a, b, out double hi, out double lo);
        int n = 0;
        if (lo != 0) e[n++] = lo;
        e[n++] = hi;
        return n;
    }

    // total += (px² + py²) · (q1·q2 − r1·r2); returns the new length of total.
    private static int AddTerm(ReadOnlySpan<double> px, ReadOnlySpan<double> py,
        ReadOnlySpan<double> q1, ReadOnlySpan<double> q2, ReadOnlySpan<double> r1, ReadOnlySpan<double> r2,
        Span<double> total, Span<double> spare, Span<double> scratch, int tlen)
    {
        Span<double> s = scratch[..100];
        Span<double> a = stackalloc double[8], b = stackalloc double[8], c = stackalloc double[16];
        Span<double> lift = stackalloc double[16], cross = stackalloc double[16], term = stackalloc double[600];
        int na = ExpansionArithmetic.Multiply(px, px, a, s);
        int nb = ExpansionArithmetic.Multiply(py, py, b, s);
        int nlift = Sum(a[..na], b[..nb], lift);
        na = ExpansionArithmetic.Multiply(q1, q2, a, s);
        nb = ExpansionArithmetic.Multiply(r1, r2, b, s);
        for (int i = 0; i < nb; i++) b[i] = -b[i];
        int ncross = Sum(a[..na], b[..nb], cross);
        int nterm = ExpansionArithmetic.Multiply(lift[..nlift], cross[..ncross], term, scratch[100..]);
        total[..tlen].CopyTo(spare);
        return Sum(spare[..tlen], term[..nterm], total);
    }
}
