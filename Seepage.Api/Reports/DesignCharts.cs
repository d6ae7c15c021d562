namespace Seepage.Api.Reports;

/// <summary>The charts of the design memos: a figure against the varied member with requirement lines, and histograms with
/// an allowable line. Data coordinates in the figures' own units.</summary>
public static class DesignCharts
{
    public const string Curve = "#1f5fbf", Limit = "#b03a2e", Found = "#2a9d4a", Bars = "#9db7e0";

    /// <summary>A curve y(x) through the points (markers at each), a dashed horizontal requirement line and a vertical line at
    /// the value found.</summary>
    public static Figure Against(string xLabel, string yLabel, IReadOnlyList<(double X, double Y)> points, double? requirement,
        string? requirementText, double? found)
    {
        var sorted = points.OrderBy(p => p.X).Select(p => new FigurePoint(p.X, p.Y)).ToList();
        var items = new List<FigureItem> { new(sorted, Curve, 1.5, Markers: true) };
        var legend = new List<LegendEntry> { new(Curve, yLabel) };
        double x0 = sorted.Min(p => p.X), x1 = sorted.Max(p => p.X);
        double y0 = Math.Min(sorted.Min(p => p.Y), requirement ?? double.PositiveInfinity);
        double y1 = Math.Max(sorted.Max(p => p.Y), requirement ?? double.NegativeInfinity);
        if (requirement is { } r)
        {
            items.Add(new FigureItem([new(x0, r), new(x1, r)], Limit, 1.2, Dashed: true));
            legend.Add(new LegendEntry(Limit, requirementText ?? "requirement", Dashed: true));
        }
        if (found is { } f)
        {
            items.Add(new FigureItem([new(f, y0), new(f, y1)], Found, 1.2));
            legend.Add(new LegendEntry(Found, $"value found: {ReportFormat.N(f)}"));
        }
        return new Figure(xLabel, yLabel, false, items, legend);
    }

    /// <summary>Histogram bars over the bin edges, with an optional dashed vertical allowable line.</summary>
    public static Figure Histogram(string label, IReadOnlyList<double> edges, IReadOnlyList<int> counts, double? allowable, string? allowableText)
    {
        var items = new List<FigureItem>();
        for (int i = 0; i < counts.Count; i++)
        {
            if (counts[i] == 0) continue;
            items.Add(new FigureItem([new(edges[i], 0), new(edges[i], counts[i]), new(edges[i + 1], counts[i]), new(edges[i + 1], 0)],
                Curve, 0.6, Fill: Bars));
        }
        var legend = new List<LegendEntry> { new(Bars, "samples per bin") };
        if (allowable is { } a)
        {
            items.Add(new FigureItem([new(a, 0), new(a, Math.Max(1, counts.Max()))], Limit, 1.5, Dashed: true));
            legend.Add(new LegendEntry(Limit, allowableText ?? "allowable", Dashed: true));
        }
        if (items.Count == 0) items.Add(new FigureItem([new(edges[0], 0), new(edges[^1], 0)], Curve));
        return new Figure(label, "samples", false, items, legend);
    }
}
