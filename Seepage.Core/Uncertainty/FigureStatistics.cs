namespace Seepage.Core.Uncertainty;

/// <summary>A histogram: <see cref="Edges"/> are the bin limits (one more than the counts), in the figure's unit.</summary>
public sealed record Histogram(IReadOnlyList<double> Edges, IReadOnlyList<int> Counts);

/// <summary>The sample statistics of one figure over the analysed samples, in the figure's unit: mean, standard deviation
/// (n − 1 divisor), the 5, 50 and 95 % points (linear interpolation between order statistics, Hyndman &amp; Fan, Am. Stat. 50,
/// 1996, definition 7) and a histogram of <see cref="Bins"/> equal bins from the smallest to the largest value.</summary>
public sealed record FigureStatistics(int Count, double Mean, double StandardDeviation, double P05, double P50, double P95,
    double Min, double Max, Histogram Histogram)
{
    /// <summary>Number of histogram bins.</summary>
    public const int Bins = 20;

    /// <summary>The coefficient of variation sd / mean (NaN when the mean is 0).</summary>
    public double Cov => Mean == 0 ? double.NaN : StandardDeviation / Math.Abs(Mean);

    /// <summary>Statistics of the values (at least one).</summary>
    public static FigureStatistics Of(IReadOnlyList<double> values)
    {
        var sorted = values.OrderBy(v => v).ToArray();
        int n = sorted.Length;
        double mean = sorted.Average();
        double ss = 0;
        foreach (double v in sorted) ss += (v - mean) * (v - mean);
        double sd = n > 1 ? Math.Sqrt(ss / (n - 1)) : 0;
        double lo = sorted[0], hi = sorted[^1];
        var counts = new int[Bins];
        double width = (hi - lo) / Bins;
        foreach (double v in sorted)
            counts[width > 0 ? Math.Min(Bins - 1, (int)((v - lo) / width)) : 0]++;
        var edges = Enumerable.Range(0, Bins + 1).Select(i => i == Bins ? hi : lo + i * width).ToArray();
        return new FigureStatistics(n, mean, sd, Percentile(sorted, 0.05), Percentile(sorted, 0.5), Percentile(sorted, 0.95), lo, hi,
            new Histogram(edges, counts));
    }

    /// <summary>The p-quantile of sorted values: x[h] interpolated at h = (n − 1)·p (definition 7).</summary>
    public static double Percentile(double[] sorted, double p)
    {
        double h = (sorted.Length - 1) * p;
        int i = (int)Math.Floor(h);
        return i + 1 < sorted.Length ? sorted[i] + (h - i) * (sorted[i + 1] - sorted[i]) : sorted[i];
    }
}
