using Seepage.Core.Uncertainty;

namespace Seepage.Core.Tests.Uncertainty;

public class SamplingTests
{
    private static readonly UncertainVariable[] Two =
    [
        new("/a", Distribution.UniformOf(0, 1)), new("/b", Distribution.NormalOf(10, 2)),
    ];

    // Latin hypercube (McKay, Beckman & Conover, Technometrics 21, 1979): each of the N equal-probability strata of each
    // variable holds exactly one sample.
    [Fact]
    public void Draw_LatinHypercube_OneSamplePerStratum()
    {
        const int n = 250;
        var values = SampleDesign.Draw(Two, n, 42, SamplingMethod.LatinHypercube, []);
        var strata = values.Select(v => (int)(v[0] * n)).OrderBy(s => s).ToArray();
        Assert.Equal(Enumerable.Range(0, n), strata);
    }

    [Fact]
    public void Draw_SameSeed_SameSamples_OtherSeed_Different()
    {
        var a = SampleDesign.Draw(Two, 50, 7, SamplingMethod.LatinHypercube, []);
        var b = SampleDesign.Draw(Two, 50, 7, SamplingMethod.LatinHypercube, []);
        var c = SampleDesign.Draw(Two, 50, 8, SamplingMethod.LatinHypercube, []);
        Assert.Equal(a.SelectMany(r => r), b.SelectMany(r => r));
        Assert.NotEqual(a.SelectMany(r => r), c.SelectMany(r => r));
    }

    // Iman & Conover (Commun. Statist. – Simul. Comput. 11, 1982): the target rank correlation is reached to within the
    // sampling error (about 1/√N) and every variable keeps its own values.
    [Fact]
    public void Draw_RankCorrelation_ReachedAndMarginalsKept()
    {
        const int n = 1000;
        var plain = SampleDesign.Draw(Two, n, 3, SamplingMethod.LatinHypercube, []);
        var correlated = SampleDesign.Draw(Two, n, 3, SamplingMethod.LatinHypercube, [new VariableCorrelation(0, 1, 0.7)]);
        double rho = Spearman.Rho(correlated.Select(r => r[0]).ToList(), correlated.Select(r => r[1]).ToList());
        Assert.True(Math.Abs(rho - 0.7) < 0.05, $"rank correlation {rho:F3}");
        Assert.Equal(plain.Select(r => r[1]).Order(), correlated.Select(r => r[1]).Order());
    }

    // The lognormal given by its 5 % and 95 % points returns them; from median and cov, mean = median·√(1 + cov²)
    // (Baecher & Christian 2003, ch. 3).
    [Fact]
    public void Lognormal_RangeAndMedianForms_Consistent()
    {
        var range = Distribution.LognormalOfRange(1e-6, 1e-4);
        Assert.Equal(1e-6, range.Quantile(0.05), 1e-15);
        Assert.Equal(1e-4, range.Quantile(0.95), 1e-13);
        Assert.Equal(1e-5, range.Median, 1e-14);
        var median = Distribution.LognormalOfMedian(2e-4, 0.8);
        Assert.Equal(2e-4 * Math.Sqrt(1 + 0.64), median.Mean, 1e-15);
        Assert.Equal(0.8, median.StandardDeviation / median.Mean, 1e-12);
    }

    // p_f with no failure leaves β undefined and states the rule-of-three bound; β = −Φ⁻¹(p_f) otherwise.
    [Fact]
    public void CheckProbability_Counts_BetaAndStandardError()
    {
        var none = CheckProbability.Of(0, 1000, 3);
        Assert.Null(none.Beta);
        Assert.Equal(0.003, none.UpperBound!.Value, 12);
        var some = CheckProbability.Of(23, 1000, 3);
        Assert.Equal(0.023, some.ProbabilityOfFailure, 12);
        Assert.Equal(Math.Sqrt(0.023 * 0.977 / 1000), some.StandardError, 12);
        Assert.Equal(1.995, some.Beta!.Value, 3); // Φ(−1.995) ≈ 0.023 (standard normal table)
    }
}
