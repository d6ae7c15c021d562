namespace Seepage.Api.Reports;

/// <summary>A vector figure in data coordinates (m, kPa, dimensionless gradient...), drawn by the SVG and PDF writers alike.
/// <see cref="EqualAspect"/> keeps one metre the same length on both axes (sections, flow nets).</summary>
public sealed record Figure(string XLabel, string YLabel, bool EqualAspect, IReadOnlyList<FigureItem> Items, IReadOnlyList<LegendEntry> Legend)
{
    /// <summary>Data bounds over every item, widened when flat.</summary>
    public (double X0, double X1, double Y0, double Y1) Bounds()
    {
        var points = Items.SelectMany(i => i.Points).ToList();
        if (points.Count == 0) return (0, 1, 0, 1);
        double x0 = points.Min(p => p.X), x1 = points.Max(p => p.X), y0 = points.Min(p => p.Y), y1 = points.Max(p => p.Y);
        if (x1 - x0 < 1e-12) { x0 -= 0.5; x1 += 0.5; }
        if (y1 - y0 < 1e-12 * Math.Max(1, Math.Abs(y1))) { y0 -= Math.Max(0.5, Math.Abs(y0) * 0.1); y1 += Math.Max(0.5, Math.Abs(y1) * 0.1); }
        return (x0, x1, y0, y1);
    }
}

/// <summary>A polyline or polygon (closed with <see cref="Fill"/>), a set of point markers, or a text label at its first point.
/// Colours are #rrggbb; widths in points.</summary>
public sealed record FigureItem(IReadOnlyList<FigurePoint> Points, string Stroke, double Width = 1, bool Dashed = false,
    string? Fill = null, bool Markers = false, string? Label = null);

/// <summary>A point in data coordinates.</summary>
public readonly record struct FigurePoint(double X, double Y);

/// <summary>A legend line: a colour and what it stands for.</summary>
public sealed record LegendEntry(string Color, string Text, bool Dashed = false);
