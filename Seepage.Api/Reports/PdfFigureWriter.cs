using PdfSharp.Drawing;

namespace Seepage.Api.Reports;

/// <summary>Draws a <see cref="Figure"/> with PDFsharp's XGraphics (vector), laid out like the SVG figures.</summary>
public static class PdfFigureWriter
{
    private const double Left = 50, Right = 8, Top = 6, Bottom = 34;

    /// <summary>The height the figure takes at the given width, points.</summary>
    public static double Height(Figure figure, double width, double maxHeight = 300) => Layout(figure, width, maxHeight).Height;

    public static void Draw(XGraphics g, Figure figure, double left, double top, double width, double maxHeight = 300)
    {
        var (_, sx, sy, plotH) = Layout(figure, width, maxHeight);
        var (x0, x1, y0, y1) = figure.Bounds();
        double X(double x) => left + Left + (x - x0) * sx;
        double Y(double y) => top + Top + plotH - (y - y0) * sy;
        var font = new XFont(ReportFonts.Family, 7);
        var grey = new XPen(XColor.FromArgb(0x88, 0x88, 0x88), 0.5);
        g.DrawRectangle(grey, left + Left, top + Top, (x1 - x0) * sx, plotH);
        foreach (double t in ReportFormat.Ticks(x0, x1))
        {
            g.DrawLine(XPens.Black, X(t), top + Top + plotH, X(t), top + Top + plotH + 3);
            g.DrawString(ReportFormat.Tick(t), font, XBrushes.Black, new XRect(X(t) - 30, top + Top + plotH + 4, 60, 9), XStringFormats.TopCenter);
        }
        foreach (double t in ReportFormat.Ticks(y0, y1, 5))
        {
            g.DrawLine(XPens.Black, left + Left - 3, Y(t), left + Left, Y(t));
            g.DrawString(ReportFormat.Tick(t), font, XBrushes.Black, new XRect(left, Y(t) - 4.5, Left - 5, 9), XStringFormats.CenterRight);
        }
        g.DrawString(figure.XLabel, font, XBrushes.Black, new XRect(left + Left, top + Top + plotH + 14, (x1 - x0) * sx, 9), XStringFormats.TopCenter);
        var state = g.Save();
        g.RotateAtTransform(-90, new XPoint(left + 6, top + Top + plotH / 2));
        g.DrawString(figure.YLabel, font, XBrushes.Black, new XPoint(left + 6, top + Top + plotH / 2), XStringFormats.Center);
        g.Restore(state);

        foreach (var item in figure.Items)
        {
            if (item.Points.Count == 0) continue;
            var color = Color(item.Stroke);
            if (item.Label is { } label)
            {
                g.DrawString(label, font, new XSolidBrush(color), new XPoint(X(item.Points[0].X), Y(item.Points[0].Y) - 3), XStringFormats.BottomCenter);
                continue;
            }
            var points = item.Points.Select(p => new XPoint(X(p.X), Y(p.Y))).ToArray();
            var pen = new XPen(color, Math.Max(0.1, item.Width * 0.75)) { DashStyle = item.Dashed ? XDashStyle.Dash : XDashStyle.Solid, LineJoin = XLineJoin.Round };
            if (item.Fill is { } fill && fill != "none") g.DrawPolygon(pen, new XSolidBrush(Color(fill)), points, XFillMode.Winding);
            else if (item.Fill == "none") g.DrawPolygon(pen, points);
            else if (points.Length > 1) g.DrawLines(pen, points);
            if (item.Markers) foreach (var p in points) g.DrawEllipse(new XSolidBrush(color), p.X - 2, p.Y - 2, 4, 4);
        }
        double lx = left + Left, ly = top + Top + plotH + Bottom + 4;
        foreach (var entry in figure.Legend)
        {
            var pen = new XPen(Color(entry.Color), 1.5) { DashStyle = entry.Dashed ? XDashStyle.Dash : XDashStyle.Solid };
            double w = g.MeasureString(entry.Text, font).Width;
            if (lx + 26 + w > left + width) { lx = left + Left; ly += 10; }
            g.DrawLine(pen, lx, ly, lx + 16, ly);
            g.DrawString(entry.Text, font, XBrushes.Black, new XPoint(lx + 20, ly + 2.5));
            lx += 30 + w;
        }
    }

    private static (double Height, double Sx, double Sy, double PlotH) Layout(Figure figure, double width, double maxHeight)
    {
        var (x0, x1, y0, y1) = figure.Bounds();
        double plotW = width - Left - Right;
        double plotH = figure.EqualAspect ? Math.Clamp(plotW * (y1 - y0) / (x1 - x0), 60, maxHeight) : maxHeight * 0.6;
        double sx = plotW / (x1 - x0), sy = plotH / (y1 - y0);
        if (figure.EqualAspect) { double s = Math.Min(sx, sy); sx = sy = s; }
        double legendRows = figure.Legend.Count == 0 ? 0 : Math.Ceiling(figure.Legend.Sum(l => 30 + 3.6 * l.Text.Length) / (width - Left));
        return (Top + plotH + Bottom + 10 * legendRows + 4, sx, sy, plotH);
    }

    /// <summary>#rrggbb or #rrggbbaa to a colour.</summary>
    public static XColor Color(string hex)
    {
        string h = hex.TrimStart('#');
        int v(int i) => Convert.ToInt32(h.Substring(i, 2), 16);
        return h.Length >= 8 ? XColor.FromArgb(v(6), v(0), v(2), v(4)) : h.Length >= 6 ? XColor.FromArgb(v(0), v(2), v(4)) : XColors.Black;
    }
}
