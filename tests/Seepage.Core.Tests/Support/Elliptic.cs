namespace Seepage.Core.Tests.Support;

/// <summary>Complete elliptic integral of the first kind by the arithmetic–geometric mean:
/// K(m) = π / (2·AGM(1, √(1 − m²))), m the modulus (Abramowitz &amp; Stegun, "Handbook of Mathematical
/// Functions", 1964, §17.6).</summary>
internal static class Elliptic
{
    public static double K(double modulus)
    {
        double a = 1, b = Math.Sqrt(1 - modulus * modulus);
        while (Math.Abs(a - b) > 1e-15 * a) (a, b) = (0.5 * (a + b), Math.Sqrt(a * b));
        return Math.PI / (2 * a);
    }

    /// <summary>Complementary modulus √(1 − m²).</summary>
    public static double Complement(double modulus) => Math.Sqrt(1 - modulus * modulus);
}
