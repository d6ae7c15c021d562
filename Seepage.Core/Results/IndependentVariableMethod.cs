namespace Seepage.Core.Results;

/// <summary>
/// Closed forms of the method of independent variables for a level floor of length b on a permeable foundation of
/// infinite depth with vertical cutoffs (Khosla, Bose &amp; Taylor, "Design of Weirs on Permeable Foundations", Central
/// Board of Irrigation Publication 12, 1936). The formulas below are written from memory and were checked here only
/// against their limiting cases and against the finite element solution of the same idealised section (see the
/// tests), not against the original text. Pressures are fractions of the head difference H above the tailwater.
/// </summary>
public static class IndependentVariableMethod
{
    /// <summary>
    /// Pressure fractions at the key points of a pile of depth d (m) with floor lengths b1 upstream and b2
    /// downstream of it (m): α1 = b1/d, α2 = b2/d, λ = (√(1+α1²) + √(1+α2²))/2, λ1 = (√(1+α1²) − √(1+α2²))/2,
    /// φE = arccos((λ1 − 1)/λ)/π (upstream face at the floor), φD = arccos(λ1/λ)/π (tip),
    /// φC = arccos((λ1 + 1)/λ)/π (downstream face at the floor). With b2 = 0 this is the downstream-end pile,
    /// λ = (1 + √(1 + α²))/2, φE = arccos((λ − 2)/λ)/π, φD = arccos((λ − 1)/λ)/π, φC = 0; with b1 = 0 the upstream-end
    /// pile, whose values are 1 − those of the mirrored downstream-end pile (φE = 1).
    /// </summary>
    public static (double E, double D, double C) KeyPoints(double b1, double b2, double d)
    {
        double r1 = Math.Sqrt(1 + b1 * b1 / (d * d)), r2 = Math.Sqrt(1 + b2 * b2 / (d * d));
        double lambda = (r1 + r2) / 2, lambda1 = (r1 - r2) / 2;
        return (Phi((lambda1 - 1) / lambda), Phi(lambda1 / lambda), Phi((lambda1 + 1) / lambda));
    }

    /// <summary>Exit gradient at the downstream-end pile of depth d (m) under a floor of total length b (m) and head
    /// difference H (m): G_E = H / (d·π·√λ), λ = (1 + √(1 + (b/d)²))/2. Dimensionless.</summary>
    public static double ExitGradient(double h, double b, double d)
    {
        double lambda = (1 + Math.Sqrt(1 + b * b / (d * d))) / 2;
        return h / (d * Math.PI * Math.Sqrt(lambda));
    }

    /// <summary>
    /// Correction for the mutual interference of piles, as a fraction of H: C = 0.19·√(D/b′)·(d + D)/b, d the depth
    /// of the pile whose key point is corrected, D the depth of the neighbouring (interfering) pile, b′ the distance
    /// between them, b the floor length (all m; the published form gives 19·… in per cent). It is added at a key point
    /// upstream of the interfering pile and subtracted at one downstream of it.
    /// </summary>
    public static double Interference(double d, double interferingDepth, double spacing, double floorLength) =>
        0.19 * Math.Sqrt(interferingDepth / spacing) * (d + interferingDepth) / floorLength;

    private static double Phi(double argument) => Math.Acos(Math.Clamp(argument, -1, 1)) / Math.PI;
}
