using System.Numerics;
using Seepage.Core.Geometry;

namespace Seepage.Core.Tests.Meshing;

/// <summary>The predicates against exact rational evaluation (BigInteger on the doubles scaled by 2^1100).
/// The near-degenerate grid around (0.5, 0.5) with points (12, 12), (24, 24) is the classic failure case of
/// naive floating-point orientation (Kettner et al., "Classroom examples of robustness problems in
/// geometric computations", Comput. Geom. 40, 2008 — from memory).</summary>
public class RobustPredicatesTests
{
    private static BigInteger Big(double v)
    {
        // Exact: v · 2^1100 is an integer for every finite double of moderate exponent.
        long bits = BitConverter.DoubleToInt64Bits(v);
        bool negative = bits < 0;
        int exponent = (int)((bits >> 52) & 0x7FF);
        long mantissa = bits & 0xFFFFFFFFFFFFFL;
        if (exponent == 0) exponent = 1; else mantissa |= 1L << 52;
        var m = new BigInteger(mantissa) << (exponent - 1075 + 1100);
        return negative ? -m : m;
    }

    private static int ExactOrient(double ax, double ay, double bx, double by, double cx, double cy) =>
        ((Big(ax) - Big(cx)) * (Big(by) - Big(cy)) - (Big(ay) - Big(cy)) * (Big(bx) - Big(cx))).Sign;

    private static int ExactInCircle(double ax, double ay, double bx, double by, double cx, double cy, double dx, double dy)
    {
        BigInteger adx = Big(ax) - Big(dx), ady = Big(ay) - Big(dy), bdx = Big(bx) - Big(dx), bdy = Big(by) - Big(dy), cdx = Big(cx) - Big(dx), cdy = Big(cy) - Big(dy);
        return ((adx * adx + ady * ady) * (bdx * cdy - cdx * bdy) + (bdx * bdx + bdy * bdy) * (cdx * ady - adx * cdy) + (cdx * cdx + cdy * cdy) * (adx * bdy - bdx * ady)).Sign;
    }

    [Fact]
    public void Orient_NearlyCollinearGrid_MatchesExactSign()
    {
        int mismatches = 0, zeros = 0;
        for (int i = 0; i < 64; i++)
            for (int j = 0; j < 64; j++)
            {
                double px = 0.5 + i * Math.Pow(2, -53), py = 0.5 + j * Math.Pow(2, -53);
                int fast = Math.Sign(RobustPredicates.Orient(px, py, 12, 12, 24, 24));
                int exact = ExactOrient(px, py, 12, 12, 24, 24);
                if (fast != exact) mismatches++;
                if (exact == 0) zeros++;
            }
        Assert.Equal(0, mismatches);
        Assert.True(zeros > 0); // the grid does contain exactly collinear points
    }

    [Fact]
    public void InCircle_NearlyCocircularPoints_MatchesExactSign()
    {
        var random = new Random(5);
        int mismatches = 0;
        for (int k = 0; k < 3000; k++)
        {
            // Three points on the unit circle (rounded) and a fourth perturbed by a few ulps around it.
            double a1 = random.NextDouble() * 2 * Math.PI, a2 = a1 + 2, a3 = a1 + 4, a4 = random.NextDouble() * 2 * Math.PI;
            double s = 1 + (random.Next(9) - 4) * Math.Pow(2, -52);
            double ax = Math.Cos(a1), ay = Math.Sin(a1), bx = Math.Cos(a2), by = Math.Sin(a2), cx = Math.Cos(a3), cy = Math.Sin(a3);
            double dx = s * Math.Cos(a4), dy = s * Math.Sin(a4);
            int fast = Math.Sign(RobustPredicates.InCircle(ax, ay, bx, by, cx, cy, dx, dy));
            if (fast != ExactInCircle(ax, ay, bx, by, cx, cy, dx, dy)) mismatches++;
        }
        Assert.Equal(0, mismatches);
    }

    [Fact]
    public void InCircle_GridPointsOnCircle_ReturnsZero()
    {
        // (0,0), (4,0), (4,2), (0,2) are cocircular (a rectangle), so the test must give exactly zero.
        Assert.Equal(0.0, RobustPredicates.InCircle(0, 0, 4, 0, 4, 2, 0, 2));
        Assert.True(RobustPredicates.InCircle(0, 0, 4, 0, 4, 2, 1, 1) > 0);
        Assert.True(RobustPredicates.InCircle(0, 0, 4, 0, 4, 2, 5, 5) < 0);
    }
}
