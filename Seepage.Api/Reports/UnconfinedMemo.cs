using Seepage.Api.Contracts;
using Seepage.Core.Sections;
using static Seepage.Api.Reports.ReportFormat;

namespace Seepage.Api.Reports;

/// <summary>The memo's parts for an unconfined section: the phreatic surface, seepage faces and drains on the flow-net
/// figure, the flow into each drain and out of each seepage face, and the hand methods beside the FE.</summary>
public static class UnconfinedMemo
{
    /// <summary>Adds the phreatic surface (solid), seepage faces and drains to a figure's items; returns their legend.</summary>
    public static IEnumerable<LegendEntry> FigureItems(SectionDocument section, UnconfinedFieldDto field, List<FigureItem> items)
    {
        foreach (var line in field.PhreaticSurface) items.Add(new FigureItem(AnalysisFigures.Points(line), AnalysisFigures.Phreatic, 2.2));
        foreach (var f in section.SeepageFaces ?? []) items.Add(new FigureItem(AnalysisFigures.Line(f.Along), AnalysisFigures.SeepageFace, 2.5, Dashed: true));
        foreach (var d in section.Drains ?? []) items.Add(new FigureItem(AnalysisFigures.Line(d.Along), AnalysisFigures.Drain, 3));
        return [new(AnalysisFigures.Phreatic, "phreatic surface (pore pressure zero); soil above it unsaturated, no flow net drawn"),
            new(AnalysisFigures.SeepageFace, "potential seepage face", Dashed: true), new(AnalysisFigures.Drain, "drain")];
    }

    public static IEnumerable<ReportBlock> Blocks(AnalysisResultDto r)
    {
        if (r.Unconfined is not { } u) yield break;
        yield return new ReportParagraph($"Unconfined flow: the phreatic surface was found by {u.Method}; {u.Iterations} iterations, " +
            $"last head change {N(u.Change)} m. The flow net is drawn in the saturated soil only.");
        var rows = r.Flow.Boundaries.Where(b => b.Kind != "head").Select(b =>
        {
            var face = r.SeepageFaces?.FirstOrDefault(f => f.Name == b.Name && b.Kind == "seepage face");
            return (IReadOnlyList<string>)[b.Name, b.Kind, N(-b.Flow), face is null ? "—" : Point(face.ExitPoint), face is null ? "—" : N(face.WettedLength)];
        }).ToList();
        yield return new ReportTable("Water leaving the soil", ["Boundary", "Kind", "Flow out (m³/s per m)", "Exit point (x, y) m", "Wetted length (m)"], rows);
        if (r.HandMethods is { } hm)
            yield return new ReportTable($"Hand methods beside the FE (reservoir depth h = {N(hm.ReservoirDepth)} m above the base)",
                ["Method", "Applies", "Flow (m³/s per m)", "Exit point (x, y) m", "Hand / FE − 1", "Note", "Source"],
                hm.Estimates.Select(e => (IReadOnlyList<string>)[e.Method, e.Applies ? "yes" : "no", N(e.Flow), Point(e.ExitPoint),
                    e.Difference is { } d ? $"{N(100 * d, 3)} %" : "—", e.Note, e.Source]).ToList());
    }
}
