using Seepage.Api.Contracts;
using static Seepage.Api.Reports.ReportFormat;

namespace Seepage.Api.Reports;

/// <summary>The memo of a target search: what was varied and required, the answer and its governing check, the table of
/// points and the curve of each figure against the member with the requirement line and the value found.</summary>
public static class TargetSearchReportBuilder
{
    private static readonly (string Name, string Label, Func<TargetPointDto, double?> Read, Func<TargetRequirementsDto, double?> Limit)[] Curves =
    [
        ("exitFactor", "factor against piping", p => p.ExitFactor, r => r.ExitFactor),
        ("heaveFactor", "factor against heave", p => p.HeaveFactor, r => r.HeaveFactor),
        ("maxFlow", "flow (m³/s per m)", p => p.Flow, r => r.MaxFlow),
        ("maxUpliftForce", "uplift force (kN/m)", p => p.UpliftForce, r => r.MaxUpliftForce),
    ];

    public static ReportDocument Build(TargetSearchDto s, DateTimeOffset printed)
    {
        var required = Curves.Where(c => c.Limit(s.Require) is not null).Select(c => $"{c.Name} {(c.Name.StartsWith("max") ? "≤" : "≥")} {N(c.Limit(s.Require))}");
        var blocks = new List<ReportBlock>
        {
            new ReportHeading("What was varied"),
            new ReportParagraph($"The member {s.Member} of the section (a JSON pointer, RFC 6901) was varied from {N(s.Range[0])} (the least-cost " +
                $"end) to {N(s.Range[1])}. A coarse scan of {s.ScanPoints} evenly spaced points was followed by bisection on the smallest " +
                $"margin (the governing check) until the bracket was narrower than the tolerance of {N(s.Tolerance)}. Every point is a " +
                "full finite element analysis of the changed section, stored with its own memo. Margins are relative: F/F_req − 1 for " +
                "the factors, 1 − q/q_max and 1 − U/U_max for the limits; positive when met."),
            new ReportList(["Requirements: " + string.Join("; ", required), $"Status: {s.Status}, {s.Done} points analysed."]),
            new ReportHeading("Answer"),
            new ReportParagraph(s.Message ?? "The search has not finished."),
        };
        if (s.Margins.Count > 0)
            blocks.Add(new ReportTable(s.Feasible == true ? "Margins at the value found" : "Margins at the best point reached",
                ["Requirement", "Margin"], s.Margins.Select(m => (IReadOnlyList<string>)[m.Key, m.Value is { } v ? $"{v * 100:F1} %" : "—"]).ToList()));
        if (s.Intervals.Count > 1 || s.Monotone == false)
            blocks.Add(new ReportList(s.Intervals.Select(i => $"Feasible from {N(i.From)} to {N(i.To)}").ToList()));
        blocks.AddRange(s.Notes.Select(n => new ReportParagraph(n)));
        blocks.Add(new ReportTable("Every point analysed", [s.Member, "Flow (m³/s per m)", "Uplift (kN/m)", "Max exit gradient", "Piping factor",
            "Heave factor", "Result"], s.Points.Select(p => (IReadOnlyList<string>)[N(p.Value), N(p.Flow), N(p.UpliftForce), N(p.MaxExitGradient),
                N(p.ExitFactor), N(p.HeaveFactor), p.Pass ? "meets all" : "fails"]).ToList()));
        blocks.Add(new ReportHeading("Figures against the member"));
        foreach (var c in Curves)
        {
            var points = s.Points.Where(p => c.Read(p) is not null).Select(p => (p.Value, c.Read(p)!.Value)).ToList();
            if (points.Count < 2) continue;
            double? limit = c.Limit(s.Require);
            blocks.Add(new ReportFigure($"{c.Label} against {s.Member}{(limit is null ? "" : $", with the requirement {N(limit)}")}.",
                DesignCharts.Against(s.Member, c.Label, points, limit, limit is null ? null : $"required {N(limit)}", s.Value)));
        }
        return new ReportDocument($"Seepage target search: {s.Title}", $"Target search {s.Id} of {s.CreatedAt:yyyy-MM-dd HH:mm} UTC", printed,
            s.Caution, blocks);
    }
}
