using Seepage.Core.Imports;

namespace Seepage.Api.Contracts;

/// <summary>The rows of a target search's points or an uncertainty study's samples as a table (header with units first),
/// written as CSV or as a one-sheet workbook.</summary>
public static class DesignTables
{
    public const string XlsxType = "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet";

    public static List<IReadOnlyList<object?>> Samples(UncertaintyStudyDto study, IReadOnlyList<SampleRowDto> rows)
    {
        var header = new List<object?> { "sample" };
        header.AddRange(study.Variables.Select(v => (object?)v.Member));
        header.AddRange(["flow (m³/s per m)", "upliftForce (kN/m)", "maxExitGradient", "exitFactor", "heaveFactor", "exit", "heave", "problem"]);
        var table = new List<IReadOnlyList<object?>> { header };
        foreach (var r in rows.OrderBy(r => r.Index))
        {
            var cells = new List<object?> { r.Index + 1 };
            cells.AddRange(r.Values.Select(v => (object?)v));
            cells.AddRange([r.Flow, r.UpliftForce, r.MaxExitGradient, r.ExitFactor, r.HeaveFactor, Verdict(r.ExitFails), Verdict(r.HeaveFails), r.Problem]);
            table.Add(cells);
        }
        return table;
    }

    public static List<IReadOnlyList<object?>> Points(TargetSearchDto search)
    {
        var requirements = search.Points.SelectMany(p => p.Margins.Keys).Distinct().ToList();
        var header = new List<object?> { search.Member, "flow (m³/s per m)", "upliftForce (kN/m)", "maxExitGradient", "exitFactor", "heaveFactor" };
        header.AddRange(requirements.Select(r => (object?)$"margin {r}"));
        header.AddRange(["pass", "analysisId", "problems"]);
        var table = new List<IReadOnlyList<object?>> { header };
        foreach (var p in search.Points.OrderBy(p => p.Value))
        {
            var cells = new List<object?> { p.Value, p.Flow, p.UpliftForce, p.MaxExitGradient, p.ExitFactor, p.HeaveFactor };
            cells.AddRange(requirements.Select(r => (object?)(p.Margins.TryGetValue(r, out var m) ? m : null)));
            cells.AddRange([p.Pass ? "pass" : "fail", p.AnalysisId,
                p.Problems.Count == 0 ? null : string.Join("; ", p.Problems.SelectMany(q => q.Value.Select(m => $"{q.Key}: {m}")))]);
            table.Add(cells);
        }
        return table;
    }

    public static string Csv(IEnumerable<IReadOnlyList<object?>> table) => CsvText.Write(table.Select(r => (IReadOnlyList<object?>)r.Select(Cell).ToList()));

    public static byte[] Xlsx(string sheet, IEnumerable<IReadOnlyList<object?>> table) =>
        XlsxWorkbook.Write([new SheetGrid(sheet, table.Select(r => (IReadOnlyList<object?>)r.Select(Cell).ToList()).ToList())]);

    private static object? Cell(object? v) => v is int i ? (double)i : v;

    private static string? Verdict(bool? fails) => fails switch { true => "fail", false => "pass", null => null };
}
