using Seepage.Core.Results;

namespace Seepage.Core.Tests.Results;

public class IndependentVariableMethodTests
{
    // Khosla, Bose & Taylor, "Design of Weirs on Permeable Foundations", 1936 (closed forms from memory): the
    // intermediate-pile formula must reduce to the downstream-end pile when b2 = 0, to the upstream-end pile (the
    // mirror image, 1 − φ) when b1 = 0, and give φD = 1/2 for a pile at mid-floor by symmetry.
    [Theory]
    [InlineData(10, 5)]
    [InlineData(30, 4)]
    [InlineData(2, 8)]
    public void KeyPoints_EndPiles_MatchEndPileFormulas(double b, double d)
    {
        double lambda = (1 + Math.Sqrt(1 + b * b / (d * d))) / 2;
        double phiE = Math.Acos((lambda - 2) / lambda) / Math.PI, phiD = Math.Acos((lambda - 1) / lambda) / Math.PI;
        var down = IndependentVariableMethod.KeyPoints(b, 0, d);
        Assert.Equal(phiE, down.E, 1e-12);
        Assert.Equal(phiD, down.D, 1e-12);
        Assert.Equal(0, down.C, 1e-12);
        var up = IndependentVariableMethod.KeyPoints(0, b, d);
        Assert.Equal(1, up.E, 1e-12);
        Assert.Equal(1 - phiD, up.D, 1e-12);
        Assert.Equal(1 - phiE, up.C, 1e-12);
        Assert.Equal(0.5, IndependentVariableMethod.KeyPoints(b / 2, b / 2, d).D, 1e-12);
    }

    [Fact]
    public void ExitGradient_WorkedNumbers_MatchFormula()
    {
        // b = 10 m, d = 5 m, H = 6 m: α = 2, λ = (1 + √5)/2 = 1.618, G_E = 6/(5π·1.272) = 0.3003.
        Assert.Equal(0.30029, IndependentVariableMethod.ExitGradient(6, 10, 5), 4);
    }
}
