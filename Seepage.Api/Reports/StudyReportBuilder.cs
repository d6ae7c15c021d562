using System.Text.Json.Nodes;
using Seepage.Api.Contracts;
using static Seepage.Api.Reports.ReportFormat;

namespace Seepage.Api.Reports;

/// <summary>The comparison memo of a study: a table of the alternatives and a chart of one figure against the varied parameter.</summary>
public static class StudyReportBuilder
{
    /// <summary>Figures that can be charted, by their query name: label and how to read them from a row.</summary>
    public static readonly IReadOnlyDictionary<string, (string Label, Func<StudyRowDto, double?> Read)> Figures =
        new Dictionary<string, (string, Func<StudyRowDto, double?>)>(StringComparer.OrdinalIgnoreCase)
        {
            ["flow"] = ("flow (m³/s per m)", r => r.Flow),
            ["upliftForce"] = ("uplift force (kN/m)", r => r.UpliftForce),
            ["exitGradient"] = ("max exit gradient", r => r.MaxExitGradient),
            ["exitFactor"] = ("factor against piping", r => r.ExitFactor),
        };

    public static ReportDocument Build(StudyDto study, string figure, DateTimeOffset printed)
    {
        var headers = new List<string> { "Alternative" };
        headers.AddRange(study.Parameters);
        headers.AddRange(["Flow (m³/s per m)", "Uplift (kN/m)", "Max exit gradient", "Piping factor", "Heave factor", "Lane", "Bligh",
            "Result (checks covered)"]);
        var rows = study.Rows.Select(r =>
        {
            var cells = new List<string> { r.Name };
            cells.AddRange(study.Parameters.Select(p => r.Changes.TryGetValue(p, out var v) ? Text(v) : "base"));
            cells.AddRange(r.Valid
                ? [N(r.Flow), N(r.UpliftForce), N(r.MaxExitGradient), Factor(r.ExitFactor, r.ExitRequiredFactor),
                    Factor(r.HeaveFactor, r.HeaveRequiredFactor), Verdict(r.LanePass), Verdict(r.BlighPass),
                    $"{Verdict(r.Pass)} ({(r.PassCovers is { Count: > 0 } c ? string.Join(", ", c) : "none")})"]
                : ["—", "—", "—", "—", "—", "—", "—", "not analysed: " + string.Join("; ", r.Problems.SelectMany(p => p.Value.Select(m => $"{p.Key} {m}")))]);
            return (IReadOnlyList<string>)cells;
        }).ToList();

        var (label, read) = Figures[figure];
        var (parameter, xs) = Abscissa(study);
        var chart = new Figure(parameter ?? "alternative number", label, false, [], []);
        string[] colors = ["#1f5fbf", "#c0392b", "#2a9d4a", "#8e44ad", "#d35400", "#16a085", "#555555"];
        // One line per combination of the other varied members, so a two-way study draws a family of curves.
        var others = study.Parameters.Where(p => p != parameter).ToList();
        var series = study.Rows.Select((r, i) => (Row: r, X: xs[i], Y: read(r)))
            .Where(p => p.X is not null && p.Y is not null)
            .GroupBy(p => string.Join(", ", others.Select(o => $"{o} = {(p.Row.Changes.TryGetValue(o, out var v) ? Text(v) : "base")}")))
            .ToList();
        var items = new List<FigureItem>();
        var legend = new List<LegendEntry>();
        for (int k = 0; k < series.Count; k++)
        {
            string color = colors[k % colors.Length];
            items.Add(new FigureItem(series[k].Select(p => new FigurePoint(p.X!.Value, p.Y!.Value)).OrderBy(p => p.X).ToList(), color, 1.5, Markers: true));
            legend.Add(new LegendEntry(color, series[k].Key.Length == 0 ? label : series[k].Key));
        }
        chart = chart with { Items = items, Legend = legend };

        var blocks = new List<ReportBlock>
        {
            new ReportParagraph($"{study.Total} alternatives of the base section, {study.Done} finished (status: {study.Status}). Each alternative " +
                "is the base section with the listed members (JSON pointers) changed, analysed by the finite element method; every " +
                "alternative has its own stored analysis and memo."),
            new ReportTable("Comparison of the alternatives", headers, rows),
            new ReportFigure($"{label} against {parameter ?? "the alternative number"}.", chart),
        };
        return new ReportDocument($"Seepage study: {study.Title}", $"Study {study.Id} of {study.CreatedAt:yyyy-MM-dd HH:mm} UTC", printed, study.Caution, blocks);
    }

    // The first varied member whose values are numbers in every row, else the alternative number (1, 2, ...).
    private static (string? Parameter, double?[] Xs) Abscissa(StudyDto study)
    {
        foreach (string p in study.Parameters)
        {
            var xs = study.Rows.Select(r => r.Changes.TryGetValue(p, out var v) && v is JsonValue j && j.TryGetValue(out double d) ? d : (double?)null).ToArray();
            if (xs.All(x => x is not null)) return (p, xs);
        }
        return (null, study.Rows.Select(r => (double?)(r.Index + 1)).ToArray());
    }

    private static string Factor(double? achieved, double? required) => achieved is null ? "—" : $"{N(achieved)} (≥ {N(required)})";

    private static string Text(JsonNode? v) => v is JsonValue j && j.TryGetValue(out string? s) ? s : v is JsonValue n && n.TryGetValue(out double d) ? N(d) : v?.ToJsonString() ?? "null";
}
