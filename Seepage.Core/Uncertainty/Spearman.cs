namespace Seepage.Core.Uncertainty;

/// <summary>Spearman's rank correlation coefficient (Spearman, Am. J. Psychol. 15, 1904): the Pearson correlation of the
/// ranks, ties given their mean rank. Used for the sensitivity of each figure to each variable.</summary>
public static class Spearman
{
    /// <summary>ρ of the paired values; NaN when either has no spread (e.g. a figure that does not vary).</summary>
    public static double Rho(IReadOnlyList<double> x, IReadOnlyList<double> y)
    {
        var rx = MeanRanks(x); var ry = MeanRanks(y);
        double mx = rx.Average(), my = ry.Average(), sxy = 0, sxx = 0, syy = 0;
        for (int i = 0; i < rx.Length; i++)
        {
            sxy += (rx[i] - mx) * (ry[i] - my); sxx += (rx[i] - mx) * (rx[i] - mx); syy += (ry[i] - my) * (ry[i] - my);
        }
        return sxx > 0 && syy > 0 ? sxy / Math.Sqrt(sxx * syy) : double.NaN;
    }

    private static double[] MeanRanks(IReadOnlyList<double> v)
    {
        var order = Enumerable.Range(0, v.Count).OrderBy(i => v[i]).ToArray();
        var rank = new double[v.Count];
        for (int a = 0; a < order.Length;)
        {
            int b = a;
            while (b + 1 < order.Length && v[order[b + 1]] == v[order[a]]) b++;
            for (int c = a; c <= b; c++) rank[order[c]] = 0.5 * (a + b);
            a = b + 1;
        }
        return rank;
    }
}
