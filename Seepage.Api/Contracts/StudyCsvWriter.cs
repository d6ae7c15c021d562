using Seepage.Core.Imports;

namespace Seepage.Api.Contracts;

/// <summary>A study's rows as CSV: name, the varied members, then the key figures with units in the header.</summary>
public static class StudyCsvWriter
{
    public static readonly string[] FigureColumns =
    [
        "flow (m³/s per m)", "upliftForce (kN/m)", "maxExitGradient", "exitFactor", "exitRequiredFactor", "heaveFactor",
        "heaveRequiredFactor", "exitPass", "heavePass", "lanePass", "blighPass", "pass", "passCovers", "analysisId", "problems",
    ];

    public static string Write(StudyDto study)
    {
        var rows = new List<IReadOnlyList<object?>> { new object?[] { "name" }.Concat(study.Parameters).Concat(FigureColumns).ToArray() };
        foreach (var r in study.Rows)
        {
            var cells = new List<object?> { r.Name };
            cells.AddRange(study.Parameters.Select(p => r.Changes.TryGetValue(p, out var v) ? (object?)Text(v) : null));
            cells.AddRange([r.Flow, r.UpliftForce, r.MaxExitGradient, r.ExitFactor, r.ExitRequiredFactor, r.HeaveFactor,
                r.HeaveRequiredFactor, Verdict(r.ExitPass), Verdict(r.HeavePass), Verdict(r.LanePass), Verdict(r.BlighPass), Verdict(r.Pass),
                r.PassCovers is { Count: > 0 } c ? string.Join(" ", c) : null, r.AnalysisId,
                r.Problems.Count == 0 ? null : string.Join("; ", r.Problems.SelectMany(p => p.Value.Select(m => $"{p.Key}: {m}")))]);
            rows.Add(cells);
        }
        return CsvText.Write(rows);
    }

    private static string? Verdict(bool? pass) => pass switch { true => "pass", false => "fail", null => null };

    private static string Text(System.Text.Json.Nodes.JsonNode? value) =>
        value is System.Text.Json.Nodes.JsonValue v && v.TryGetValue(out string? s) ? s : value?.ToJsonString() ?? "null";
}
