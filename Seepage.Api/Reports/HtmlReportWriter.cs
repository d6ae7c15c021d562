using System.Net;
using System.Text;

namespace Seepage.Api.Reports;

/// <summary>Writes a report as one printable HTML page: plain tables (they paste into a word processor as tables), inline
/// SVG figures, print styles for A4.</summary>
public static class HtmlReportWriter
{
    private const string Style = """
        body { font-family: "DejaVu Sans", Arial, sans-serif; font-size: 10.5pt; color: #111; max-width: 820px; margin: 24px auto; padding: 0 12px; }
        h1 { font-size: 17pt; margin-bottom: 2px; } h2 { font-size: 13pt; margin-top: 22px; border-bottom: 1px solid #999; }
        .sub { color: #444; margin-top: 0; } .caution { border: 2px solid #b03a2e; padding: 8px 10px; background: #fdf2f0; }
        table { border-collapse: collapse; margin: 8px 0 14px; width: 100%; } caption { text-align: left; font-weight: bold; padding: 4px 0; }
        th, td { border: 1px solid #888; padding: 3px 6px; text-align: left; vertical-align: top; overflow-wrap: anywhere; } th { background: #eee; }
        td.fail { color: #b03a2e; font-weight: bold; } figure { margin: 10px 0 16px; page-break-inside: avoid; } figcaption { font-size: 9.5pt; color: #333; }
        svg { max-width: 100%; height: auto; }
        @media print { body { margin: 0; max-width: none; } h2 { page-break-after: avoid; } table { page-break-inside: avoid; } }
        """;

    public static string Write(ReportDocument report)
    {
        var html = new StringBuilder();
        html.Append("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\"><title>").Append(E(report.Title))
            .Append("</title><style>").Append(Style).Append("</style></head><body>\n");
        html.Append("<h1>").Append(E(report.Title)).Append("</h1>\n<p class=\"sub\">").Append(E(report.Subtitle))
            .Append(" — printed ").Append(report.Date.ToString("yyyy-MM-dd HH:mm")).Append(" UTC</p>\n");
        html.Append("<p class=\"caution\"><strong>Caution.</strong> ").Append(E(report.Caution)).Append("</p>\n");
        int figure = 0;
        foreach (var block in report.Blocks)
        {
            switch (block)
            {
                case ReportHeading h: html.Append("<h2>").Append(E(h.Text)).Append("</h2>\n"); break;
                case ReportParagraph p: html.Append("<p>").Append(E(p.Text)).Append("</p>\n"); break;
                case ReportList l:
                    html.Append("<ul>");
                    foreach (string item in l.Items) html.Append("<li>").Append(E(item)).Append("</li>");
                    html.Append("</ul>\n");
                    break;
                case ReportTable t: Table(html, t); break;
                case ReportFigure f:
                    figure++;
                    html.Append("<figure>").Append(SvgFigureWriter.Write(f.Figure)).Append("<figcaption>Figure ").Append(figure).Append(". ")
                        .Append(E(f.Caption)).Append("</figcaption></figure>\n");
                    break;
            }
        }
        html.Append("<p class=\"caution\">").Append(E(report.Caution)).Append("</p>\n</body></html>\n");
        return html.ToString();
    }

    private static void Table(StringBuilder html, ReportTable t)
    {
        html.Append("<table><caption>").Append(E(t.Caption)).Append("</caption><thead><tr>");
        foreach (string h in t.Headers) html.Append("<th>").Append(E(h)).Append("</th>");
        html.Append("</tr></thead><tbody>");
        foreach (var row in t.Rows)
        {
            html.Append("<tr>");
            foreach (string cell in row) html.Append(cell == "FAIL" ? "<td class=\"fail\">" : "<td>").Append(E(cell)).Append("</td>");
            html.Append("</tr>");
        }
        html.Append("</tbody></table>\n");
    }

    private static string E(string text) => WebUtility.HtmlEncode(text);
}
