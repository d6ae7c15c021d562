using System.Globalization;
using System.Net;
using System.Text;

namespace Seepage.Api.Reports;

/// <summary>Writes a <see cref="Figure"/> as inline SVG (vector; scales with the page and prints crisply).</summary>
public static class SvgFigureWriter
{
    private const double Left = 64, Right = 16, Top = 12, Bottom = 44;

    public static string Write(Figure figure, double width = 760, double maxHeight = 420)
    {
        var (x0, x1, y0, y1) = figure.Bounds();
        double plotW = width - Left - Right;
        double plotH = figure.EqualAspect ? Math.Min(maxHeight, plotW * (y1 - y0) / (x1 - x0)) : maxHeight * 0.65;
        if (figure.EqualAspect && plotH < 80) plotH = 80;
        double sx = plotW / (x1 - x0), sy = plotH / (y1 - y0);
        if (figure.EqualAspect) { double s = Math.Min(sx, sy); sx = sy = s; }
        double X(double x) => Left + (x - x0) * sx;
        double Y(double y) => Top + plotH - (y - y0) * sy;
        double legendH = figure.Legend.Count > 0 ? 18 : 0;
        double height = Top + plotH + Bottom + legendH;

        var svg = new StringBuilder();
        svg.Append(Invariant($"<svg xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 {width:F0} {height:F0}\" width=\"{width:F0}\" height=\"{height:F0}\" font-family=\"sans-serif\" font-size=\"11\">"));
        svg.Append(Invariant($"<rect x=\"{Left:F1}\" y=\"{Top:F1}\" width=\"{(x1 - x0) * sx:F1}\" height=\"{plotH:F1}\" fill=\"none\" stroke=\"#888888\" stroke-width=\"0.6\"/>"));
        foreach (double t in ReportFormat.Ticks(x0, x1))
            svg.Append(Invariant($"<line x1=\"{X(t):F1}\" y1=\"{Top + plotH:F1}\" x2=\"{X(t):F1}\" y2=\"{Top + plotH + 4:F1}\" stroke=\"#444444\"/><text x=\"{X(t):F1}\" y=\"{Top + plotH + 16:F1}\" text-anchor=\"middle\">{ReportFormat.Tick(t)}</text>"));
        foreach (double t in ReportFormat.Ticks(y0, y1, 5))
            svg.Append(Invariant($"<line x1=\"{Left - 4:F1}\" y1=\"{Y(t):F1}\" x2=\"{Left:F1}\" y2=\"{Y(t):F1}\" stroke=\"#444444\"/><text x=\"{Left - 6:F1}\" y=\"{Y(t) + 4:F1}\" text-anchor=\"end\">{ReportFormat.Tick(t)}</text>"));
        svg.Append(Invariant($"<text x=\"{Left + (x1 - x0) * sx / 2:F1}\" y=\"{Top + plotH + 34:F1}\" text-anchor=\"middle\">{E(figure.XLabel)}</text>"));
        svg.Append(Invariant($"<text transform=\"translate(14 {Top + plotH / 2:F1}) rotate(-90)\" text-anchor=\"middle\">{E(figure.YLabel)}</text>"));

        foreach (var item in figure.Items)
        {
            if (item.Points.Count == 0) continue;
            if (item.Label is { } label)
            {
                svg.Append(Invariant($"<text x=\"{X(item.Points[0].X):F1}\" y=\"{Y(item.Points[0].Y) - 4:F1}\" fill=\"{item.Stroke}\" text-anchor=\"middle\">{E(label)}</text>"));
                continue;
            }
            string points = string.Join(" ", item.Points.Select(p => Invariant($"{X(p.X):F1},{Y(p.Y):F1}")));
            string dash = item.Dashed ? " stroke-dasharray=\"6 4\"" : "";
            string tag = item.Fill is null ? "polyline" : "polygon";
            svg.Append(Invariant($"<{tag} points=\"{points}\" fill=\"{item.Fill ?? "none"}\" stroke=\"{item.Stroke}\" stroke-width=\"{item.Width:F2}\"{dash} stroke-linejoin=\"round\"/>"));
            if (item.Markers)
                foreach (var p in item.Points)
                    svg.Append(Invariant($"<circle cx=\"{X(p.X):F1}\" cy=\"{Y(p.Y):F1}\" r=\"3\" fill=\"{item.Stroke}\"/>"));
        }
        double lx = Left;
        foreach (var entry in figure.Legend)
        {
            double ly = Top + plotH + Bottom + 8;
            string dash = entry.Dashed ? " stroke-dasharray=\"6 4\"" : "";
            svg.Append(Invariant($"<line x1=\"{lx:F1}\" y1=\"{ly:F1}\" x2=\"{lx + 22:F1}\" y2=\"{ly:F1}\" stroke=\"{entry.Color}\" stroke-width=\"2\"{dash}/><text x=\"{lx + 26:F1}\" y=\"{ly + 4:F1}\">{E(entry.Text)}</text>"));
            lx += 34 + 6.2 * entry.Text.Length;
        }
        svg.Append("</svg>");
        return svg.ToString();
    }

    private static string E(string text) => WebUtility.HtmlEncode(text);

    private static string Invariant(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
