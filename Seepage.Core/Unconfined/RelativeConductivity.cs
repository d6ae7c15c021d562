namespace Seepage.Core.Unconfined;

/// <summary>
/// Relative conductivity k_r of the saturated–unsaturated model as a function of the pressure head p = h − y (m):
/// k_r = 1 for p ≥ 0, falling smoothly (k_r = f + (1 − f)(3s² − 2s³), s = 1 + p/δ) to the floor f over the band
/// −δ &lt; p &lt; 0, and k_r = f below it. The floor keeps the system positive definite; the band keeps the
/// iteration smooth. As δ and f go to zero the model tends to the sharp free surface (soil above it carries no flow).
/// </summary>
public sealed record RelativeConductivity(double Band, double Floor)
{
    // Three-point Gauss–Legendre on [−1, 1]: exact for polynomials up to degree 5 (here cubic k_r times linear density).
    private static readonly double[] GaussPoint = [-Math.Sqrt(0.6), 0, Math.Sqrt(0.6)];
    private static readonly double[] GaussWeight = [5.0 / 9, 8.0 / 9, 5.0 / 9];

    /// <summary>k_r at pressure head p (m), dimensionless.</summary>
    public double Value(double p)
    {
        if (p >= 0) return 1;
        if (Band <= 0 || p <= -Band) return Floor;
        double s = 1 + p / Band;
        return Floor + (1 - Floor) * s * s * (3 - 2 * s);
    }

    /// <summary>The exact mean of k_r over a linear triangle whose vertex pressure heads are p0, p1, p2 (m). For a
    /// linear field with sorted vertex values a ≤ b ≤ c, the share of the area per unit of p is the triangular density
    /// ρ(t) = 2(t − a)/((c − a)(b − a)) on [a, b] and 2(c − t)/((c − a)(c − b)) on [b, c]; the mean is ∫ k_r ρ dt,
    /// integrated piece by piece between the kinks of k_r (at −δ and 0), exactly by three-point Gauss.
    /// The element's conductivity thus follows the wetted share of its area continuously as the surface moves.</summary>
    public double ElementMean(double p0, double p1, double p2)
    {
        double a = Math.Min(p0, Math.Min(p1, p2)), c = Math.Max(p0, Math.Max(p1, p2)), b = p0 + p1 + p2 - a - c;
        if (a >= 0) return 1;
        if (c <= -Band) return Floor;
        double span = c - a;
        if (span <= 1e-12 * (1 + Math.Abs(a))) return Value(a);
        double mean = 0;
        if (b > a) mean += Piece(a, b, t => 2 * (t - a) / (span * (b - a)));
        if (c > b) mean += Piece(b, c, t => 2 * (c - t) / (span * (c - b)));
        return Math.Clamp(mean, Floor, 1);
    }

    private double Piece(double from, double to, Func<double, double> density)
    {
        double sum = 0, start = from;
        foreach (double kink in (ReadOnlySpan<double>)[-Band, 0.0])
        {
            if (kink <= start || kink >= to) continue;
            sum += Gauss(start, kink, density);
            start = kink;
        }
        return sum + Gauss(start, to, density);
    }

    private double Gauss(double from, double to, Func<double, double> density)
    {
        double half = 0.5 * (to - from), mid = 0.5 * (to + from), sum = 0;
        for (int g = 0; g < 3; g++)
        {
            double t = mid + half * GaussPoint[g];
            sum += GaussWeight[g] * Value(t) * density(t);
        }
        return sum * half;
    }
}
