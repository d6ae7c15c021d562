using System.Text.Json.Nodes;
using Seepage.Api.Contracts;
using static Seepage.Api.Reports.ReportFormat;

namespace Seepage.Api.Reports;

/// <summary>The memo's account of what the analysis assumed and what it did not check: the verdict and the checks it covers,
/// every check that did not run (or gave no verdict) with the reason, and the table of values used with their origin
/// (given or default), from the result document's <c>checks</c>, <c>passCovers</c> and <c>assumptions</c>.</summary>
public static class AssumptionBlocks
{
    public static IEnumerable<ReportBlock> Blocks(AnalysisResultDto r)
    {
        if (r.Checks is not { } checks) yield break;
        string covers = r.PassCovers is { Count: > 0 } c ? string.Join(", ", c) : "no check";
        yield return new ReportParagraph($"Overall verdict: {Verdict(r.Pass)}, covering {covers}.");
        var skipped = checks.Where(x => x.Skipped is not null).Select(x => $"{x.Check}: {x.Skipped}").ToList();
        if (skipped.Count > 0)
        {
            yield return new ReportHeading("Checks not run or without a verdict");
            yield return new ReportList(skipped);
        }
        if (r.Assumptions is { Count: > 0 } assumptions)
            yield return new ReportTable("Values used by the analysis (given or default)", ["Member", "Value", "Unit", "Origin", "Note"],
                assumptions.Select(a => (IReadOnlyList<string>)[a.Member, Value(a.Value), a.Unit, a.Origin, a.Note]).ToList());
    }

    private static string Value(JsonNode? v) => v switch
    {
        JsonValue j when j.TryGetValue(out double d) => N(d),
        JsonValue j when j.TryGetValue(out string? s) => s ?? "",
        JsonArray { Count: > 4 } a => $"{a.Count} points from {a[0]?.ToJsonString()} to {a[^1]?.ToJsonString()}",
        null => "—",
        _ => v.ToJsonString(),
    };
}
