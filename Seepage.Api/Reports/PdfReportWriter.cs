using PdfSharp;
using PdfSharp.Drawing;
using PdfSharp.Pdf;

namespace Seepage.Api.Reports;

/// <summary>Writes a report as an A4 PDF with PDFsharp: text and tables flow down the pages, figures are drawn as vectors.</summary>
public sealed class PdfReportWriter
{
    private const double Margin = 48, Line = 12.5;
    private readonly PdfDocument _pdf = new();
    private readonly XFont _body = new(ReportFonts.Family, 9), _bold = new(ReportFonts.Family, 9, XFontStyleEx.Bold),
        _small = new(ReportFonts.Family, 7.5), _smallBold = new(ReportFonts.Family, 7.5, XFontStyleEx.Bold),
        _h1 = new(ReportFonts.Family, 15, XFontStyleEx.Bold), _h2 = new(ReportFonts.Family, 11.5, XFontStyleEx.Bold);
    private XGraphics _g = null!;
    private double _y, _width;
    private int _figure;

    /// <summary>The PDF bytes. Throws <see cref="InvalidOperationException"/> when no font is available (see <see cref="ReportFonts"/>).</summary>
    public static byte[] Write(ReportDocument report)
    {
        if (!ReportFonts.Available) throw new InvalidOperationException("No TrueType font was found for the PDF (install fonts-dejavu-core).");
        ReportFonts.Install();
        return new PdfReportWriter().Render(report);
    }

    private byte[] Render(ReportDocument report)
    {
        _pdf.Info.Title = report.Title;
        _pdf.Info.Subject = "Seepage design memo";
        NewPage();
        Wrap(report.Title, _h1, 18);
        Wrap($"{report.Subtitle} — printed {report.Date:yyyy-MM-dd HH:mm} UTC", _body, Line);
        _y += 6;
        Caution(report.Caution);
        foreach (var block in report.Blocks)
        {
            switch (block)
            {
                case ReportHeading h: Room(40); _y += 8; Wrap(h.Text, _h2, 15); _y += 2; break;
                case ReportParagraph p: Wrap(p.Text, _body, Line); _y += 4; break;
                case ReportList l: foreach (string item in l.Items) Wrap("• " + item, _body, Line, indent: 8); _y += 4; break;
                case ReportTable t: Table(t); break;
                case ReportFigure f: Figure(f); break;
            }
        }
        _y += 6;
        Caution(report.Caution);
        using var stream = new MemoryStream();
        _pdf.Save(stream, false);
        return stream.ToArray();
    }

    private void NewPage()
    {
        _g?.Dispose();
        var page = _pdf.AddPage();
        page.Size = PageSize.A4;
        _g = XGraphics.FromPdfPage(page);
        _width = page.Width.Point - 2 * Margin;
        _y = Margin;
        _g.DrawString($"page {_pdf.PageCount}", _small, XBrushes.Gray, new XRect(Margin, page.Height.Point - 30, _width, 10), XStringFormats.TopRight);
    }

    private void Room(double height)
    {
        if (_y + height > _pdf.Pages[^1].Height.Point - Margin) NewPage();
    }

    private void Caution(string text)
    {
        var lines = Lines("Caution. " + text, _bold, _width - 12);
        double h = lines.Count * Line + 8;
        Room(h);
        _g.DrawRectangle(new XPen(XColor.FromArgb(0xb0, 0x3a, 0x2e), 1.2), XBrushes.White, Margin, _y, _width, h);
        foreach (string line in lines) { _g.DrawString(line, _bold, XBrushes.Black, new XPoint(Margin + 6, _y + 4 + 9)); _y += Line; }
        _y += 14;
    }

    private void Wrap(string text, XFont font, double step, double indent = 0)
    {
        foreach (string line in Lines(text, font, _width - indent))
        {
            Room(step);
            _g.DrawString(line, font, XBrushes.Black, new XPoint(Margin + indent, _y + step * 0.8));
            _y += step;
        }
    }

    private List<string> Lines(string text, XFont font, double width)
    {
        var lines = new List<string>();
        var current = "";
        foreach (string word in text.Split(' ', StringSplitOptions.RemoveEmptyEntries))
        {
            string trial = current.Length == 0 ? word : current + " " + word;
            if (current.Length > 0 && _g.MeasureString(trial, font).Width > width) { lines.Add(current); current = word; }
            else current = trial;
        }
        if (current.Length > 0 || lines.Count == 0) lines.Add(current);
        return lines;
    }

    private void Table(ReportTable t)
    {
        int n = t.Headers.Count;
        var weights = Enumerable.Range(0, n).Select(j => Math.Clamp(t.Rows.Select(r => j < r.Count ? r[j].Length : 0)
            .Append(t.Headers[j].Length).Max(), 4, 40))
            .Select((w, j) => Math.Max(w, 1.3 * t.Headers[j].Split(' ').Max(s => s.Length) + 1)).ToArray();
        double total = weights.Sum();
        var widths = weights.Select(w => _width * w / total).ToArray();
        Room(3 * Line);
        _g.DrawString(t.Caption, _bold, XBrushes.Black, new XPoint(Margin, _y + 9));
        _y += Line;
        Row(t.Headers, widths, _smallBold, XColor.FromArgb(0xee, 0xee, 0xee));
        foreach (var row in t.Rows) Row(row, widths, _small, XColors.White);
        _y += 8;
    }

    private void Row(IReadOnlyList<string> cells, double[] widths, XFont font, XColor shade)
    {
        var wrapped = widths.Select((w, j) => Lines(j < cells.Count ? cells[j] : "", font, w - 6)).ToList();
        double h = wrapped.Max(l => l.Count) * 9.5 + 4;
        Room(h);
        double x = Margin;
        for (int j = 0; j < widths.Length; j++)
        {
            _g.DrawRectangle(new XPen(XColors.Gray, 0.4), new XSolidBrush(shade), x, _y, widths[j], h);
            var brush = j < cells.Count && cells[j] == "FAIL" ? new XSolidBrush(XColor.FromArgb(0xb0, 0x3a, 0x2e)) : XBrushes.Black;
            for (int k = 0; k < wrapped[j].Count; k++)
                _g.DrawString(wrapped[j][k], font, brush, new XPoint(x + 3, _y + 9 + 9.5 * k));
            x += widths[j];
        }
        _y += h;
    }

    private void Figure(ReportFigure f)
    {
        double height = PdfFigureWriter.Height(f.Figure, _width);
        var caption = Lines($"Figure {++_figure}. {f.Caption}", _small, _width);
        Room(height + caption.Count * 10 + 6);
        PdfFigureWriter.Draw(_g, f.Figure, Margin, _y, _width);
        _y += height;
        foreach (string line in caption) { _g.DrawString(line, _small, XBrushes.Black, new XPoint(Margin, _y + 8)); _y += 10; }
        _y += 8;
    }
}
