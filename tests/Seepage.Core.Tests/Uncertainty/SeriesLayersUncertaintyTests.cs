using MathNet.Numerics.Distributions;
using Seepage.Core.Uncertainty;

namespace Seepage.Core.Tests.Uncertainty;

[Trait("Category", "Slow")] // Monte Carlo design runs
public class SeriesLayersUncertaintyTests(Xunit.Abstractions.ITestOutputHelper output)
{
    // Two layers in series (Darcy, 1856; Harr, "Groundwater and Seepage", 1962, ch. 1): q = B·H / (L1/k1 + L2/k2), exact
    // for P1 elements. With k1, k2 independent lognormals the distribution of q is found here by direct numerical
    // integration: P(q ≤ t) = ∫ F2(k2*(k1, t)) dF1(k1), k2* = L2 / (B·H/t − L1/k1) (or certain when L1/k1 ≥ B·H/t), by the
    // midpoint rule on 20,000 equal-probability cells of k1; E[q] by the midpoint rule on 2,000 × 2,000 cells.
    private const double L1 = 3, L2 = 2, B = 10, H = 5;
    private static readonly Distribution K1 = Distribution.LognormalOfMedian(1e-4, 0.5);
    private static readonly Distribution K2 = Distribution.LognormalOfMedian(2e-6, 0.8);

    private static double Q(double k1, double k2) => B * H / (L1 / k1 + L2 / k2);

    private static double Cdf(double t)
    {
        const int m = 20000;
        double sum = 0, sigma2 = K2.Scale, mu2 = K2.Location;
        for (int i = 0; i < m; i++)
        {
            double k1 = K1.Quantile((i + 0.5) / m), rest = B * H / t - L1 / k1;
            sum += rest <= 0 ? 1 : Normal.CDF(0, 1, (Math.Log(L2 / rest) - mu2) / sigma2);
        }
        return sum / m;
    }

    private static double ExactMean()
    {
        const int m = 2000;
        var a = Enumerable.Range(0, m).Select(i => K1.Quantile((i + 0.5) / m)).ToArray();
        var b = Enumerable.Range(0, m).Select(i => K2.Quantile((i + 0.5) / m)).ToArray();
        double sum = 0;
        foreach (double k1 in a) foreach (double k2 in b) sum += Q(k1, k2);
        return sum / ((double)m * m);
    }

    private static UncertaintyStudy Study(int n, double fosmStep = UncertaintyStudy.DefaultFosmStep) =>
        new([new UncertainVariable("/soils/0/kx", K1), new UncertainVariable("/soils/1/kx", K2)], n, 5, FosmStep: fosmStep);

    [Fact]
    public void Run_TwoLognormalLayers_MeanAndPercentilesMatchNumericalIntegration()
    {
        const int n = 1000;
        var result = UncertaintySupport.Run(UncertaintySupport.TwoLayers(L1, L2, B, H), Study(n));
        var flow = result.Summary.Figures["flow"];
        double mean = ExactMean();
        // Sampling error of the mean: sd/√N (an upper bound for Latin hypercube on a monotone response); three of them.
        double se = flow.StandardDeviation / Math.Sqrt(n);
        output.WriteLine($"mean MC {flow.Mean:E5}, integrated {mean:E5}, difference {(flow.Mean - mean) / mean:P3} (3 SE = {3 * se / mean:P3})");
        Assert.True(Math.Abs(flow.Mean - mean) < 3 * se, $"mean {flow.Mean:E5} vs {mean:E5}");
        // Percentiles checked in probability: the exact CDF at the sample percentile must lie within three binomial
        // standard errors √(p(1 − p)/N) of p.
        foreach (var (p, value) in new[] { (0.05, flow.P05), (0.5, flow.P50), (0.95, flow.P95) })
        {
            double f = Cdf(value), band = 3 * Math.Sqrt(p * (1 - p) / n);
            output.WriteLine($"p{p * 100:00}: MC {value:E5}, exact CDF there {f:F4} (band ±{band:F4})");
            Assert.True(Math.Abs(f - p) < band, $"CDF at MC p{p * 100:00} = {f:F4}");
        }
    }

    // FOSM against the closed-form derivatives of the series flow: ∂q/∂kᵢ = q²·Lᵢ / (B·H·kᵢ²), Var q = Σ (∂q/∂kᵢ σᵢ)²
    // (Baecher & Christian, "Reliability and Statistics in Geotechnical Engineering", 2003). A step of 0.01 σ makes the
    // central-difference error O(δ²) negligible.
    [Fact]
    public void Run_TwoLayers_FosmMatchesClosedFormDerivatives()
    {
        var result = UncertaintySupport.Run(UncertaintySupport.TwoLayers(L1, L2, B, H), Study(4, 0.01));
        double m1 = K1.Mean, m2 = K2.Mean, q = Q(m1, m2);
        double d1 = q * q * L1 / (B * H * m1 * m1), d2 = q * q * L2 / (B * H * m2 * m2);
        double sd = Math.Sqrt(Math.Pow(d1 * K1.StandardDeviation, 2) + Math.Pow(d2 * K2.StandardDeviation, 2));
        var fosm = result.Fosm["flow"];
        output.WriteLine($"FOSM mean {fosm.Mean:E6} vs {q:E6}; sd {fosm.StandardDeviation:E6} vs {sd:E6}; dq/dk1 {fosm.Derivatives[0]:E6} vs {d1:E6}");
        Assert.Equal(1.0, fosm.Mean / q, 1e-9);
        Assert.Equal(1.0, fosm.Derivatives[0] / d1, 1e-4);
        Assert.Equal(1.0, fosm.Derivatives[1] / d2, 1e-4);
        Assert.Equal(1.0, fosm.StandardDeviation / sd, 1e-4);
    }

    // Samples run on several threads with shared AMG hierarchies taken from a pool: the same seed must give the same
    // figures, bit for bit, on every run (no hierarchy used by two samples at once).
    [Fact]
    public void Run_SameSeedTwice_IdenticalSampleFigures()
    {
        var section = UncertaintySupport.TwoLayers(L1, L2, B, H) with { Mesh = new() { Size = 0.15 } };
        var first = UncertaintySupport.Run(section, Study(100), 1e-10);
        var second = UncertaintySupport.Run(section, Study(100), 1e-10);
        Assert.Equal(first.Samples.Select(s => s.Figures!.Flow), second.Samples.Select(s => s.Figures!.Flow));
    }
}
