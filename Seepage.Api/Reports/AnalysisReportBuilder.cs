using Seepage.Api.Contracts;
using Seepage.Core.Sections;
using static Seepage.Api.Reports.ReportFormat;

namespace Seepage.Api.Reports;

/// <summary>Builds the design memo of one analysis from its stored JSON: the section as posted, the result document and the
/// field data (so it works after a restart). The writers turn it into HTML or PDF.</summary>
public static class AnalysisReportBuilder
{
    public const string ChecksCaption = "Figures and checks";
    public static readonly string[] ChecksHeaders = ["Figure or check", "Method", "Achieved", "Required", "Result"];

    public static ReportDocument Build(AnalysisResultDto r, FieldDto field, SectionDocument section, DateTimeOffset printed)
    {
        string unit = section.ConductivityUnit ?? "m/s";
        var blocks = new List<ReportBlock>
        {
            new ReportHeading("1. Inputs"),
            new ReportParagraph($"Section: {section.Title ?? r.Title}. {section.Description ?? ""} Lengths in m, elevations y positive up, " +
                $"heads are total heads in m, conductivity in {unit}, unit weight of water {N(section.WaterUnitWeight ?? 9.81)} kN/m³."),
            new ReportTable("Soils", ["Soil", $"kx ({unit})", $"ky ({unit})", "Bedding angle (°)", "Gs", "Void ratio e", "γsat (kN/m³)", "Creep class"],
                (section.Soils ?? []).Select(s => Row(s.Id ?? "", N(s.Kx), N(s.Ky ?? s.Kx), N(s.BeddingAngle ?? 0), N(s.SpecificGravity),
                    N(s.VoidRatio), N(s.SaturatedUnitWeight), s.CreepClass ?? "—")).ToList()),
            new ReportTable("Head and drain boundaries", ["Boundary", "Total head (m)", "From (x, y) m", "To (x, y) m"],
                (section.Heads ?? []).Select(h => Row(h.Name ?? "", N(h.Total), Point(h.Along?.FirstOrDefault()), Point(h.Along?.LastOrDefault())))
                .Concat((section.Drains ?? []).Select(d => Row(d.Name ?? "drain", "h = y (drain)", Point(d.Along?.FirstOrDefault()), Point(d.Along?.LastOrDefault()))))
                .ToList()),
            new ReportTable("Structures and cutoffs", ["Item", "Kind", "From (x, y) m", "To (x, y) m"],
                (section.Structures ?? []).Select(s => Row(s.Name ?? "", "impervious base", Point(s.Base?.FirstOrDefault()), Point(s.Base?.LastOrDefault())))
                .Concat((section.Cutoffs ?? []).Select(c => Row(c.Name ?? "", c.Thickness is > 0 ? $"wall {N(c.Thickness)} m, kx {N(c.Kx)} {unit}" : "impervious cutoff",
                    Point(c.Top), Point(c.Tip)))).ToList()),
            new ReportFigure("Section geometry: soil zones, structures and cutoffs, head boundaries.", AnalysisFigures.Geometry(section)),
            new ReportHeading("2. Results"),
            new ReportFigure((field.FlowNet.Caption ?? FlowNetCaption.Of(field.FlowNet)) + " Drawn from the finite element head field.",
                AnalysisFigures.FlowNet(section, field)),
            new ReportFigure("Uplift pressure under the structures (pore pressure u = γw (h − y)).", AnalysisFigures.Uplift(r)),
        };
        if (AnalysisFigures.ExitProfile(r) is { } exitFigure)
            blocks.Add(new ReportFigure("Upward exit gradient along the exit surface with the allowable gradient (critical gradient / required factor).", exitFigure));
        blocks.Add(new ReportTable(ChecksCaption, ChecksHeaders, [.. Checks(r), .. AnalysisReportExtras.CheckRows(r)]));
        blocks.AddRange(AnalysisReportExtras.Blocks(r));
        blocks.AddRange(UnconfinedMemo.Blocks(r));
        if (r.Warnings.Count > 0) { blocks.Add(new ReportHeading("Warnings")); blocks.Add(new ReportList(r.Warnings)); }
        blocks.Add(new ReportHeading("3. Methods and sources"));
        blocks.Add(new ReportList(Methods(r, section)));
        blocks.Add(new ReportHeading("4. Mesh and solver"));
        blocks.Add(new ReportTable("Mesh and solver statistics", ["Quantity", "Value"],
        [
            Row("Nodes", r.Mesh.Nodes.ToString()), Row("Triangles", r.Mesh.Triangles.ToString()),
            Row("Smallest / largest angle (°)", $"{N(r.Mesh.MinAngle)} / {N(r.Mesh.MaxAngle)}"), Row("Mesh time (s)", N(r.Mesh.Seconds)),
            Row("Solver", r.Solver.Method), Row("Unknowns", r.Solver.Unknowns.ToString()), Row("Multigrid levels", r.Solver.Levels.ToString()),
            Row("Iterations", r.Solver.Iterations.ToString()), Row("Relative residual", N(r.Solver.Residual)), Row("Solve time (s)", N(r.Solver.Seconds)),
            Row("Flow balance (inflow − outflow) / inflow", N(r.Flow.Balance)), Row("Analysis time (s)", N(r.Seconds)),
        ]));
        return new ReportDocument($"Seepage design memo: {r.Title}", $"Analysis {r.Id} of {r.CreatedAt:yyyy-MM-dd HH:mm} UTC", printed, r.Caution, blocks);
    }

    /// <summary>One row per figure and check: the discharge, uplift resultants, piping, heave and the hand creep checks.</summary>
    public static List<IReadOnlyList<string>> Checks(AnalysisResultDto r)
    {
        var rows = new List<IReadOnlyList<string>>
        {
            Row("Seepage discharge (m³/s per m)", "FE, nodal reactions", N(r.Flow.PerMetre), "—", $"{N(r.Flow.PerMetrePerDay)} m³/day per m"),
        };
        foreach (var u in r.Uplift)
            rows.Add(Row($"Uplift force under {u.Structure} (kN/m)", "∫ u ds along the base", N(u.Force), "—", $"resultant at x = {N(u.CentroidX)} m"));
        if (r.Exit is { } e)
        {
            rows.Add(Row($"Max exit gradient at {Point(e.At)}", e.Method, N(e.MaxGradient), "—", $"i_c = {N(e.CriticalGradient)}"));
            rows.Add(Row("Factor against piping i_c / i_exit", "critical gradient (Gs − 1)/(1 + e)", N(e.Factor), N(e.RequiredFactor), Verdict(e.Pass)));
        }
        foreach (var h in r.Heave)
            rows.Add(Row($"Heave at {h.Cutoff} (D = {N(h.Depth)} m, h_a = {N(h.AverageExcessHead)} m)", "Terzaghi's prism, width D/2",
                N(h.Factor), N(h.RequiredFactor), Verdict(h.Pass)));
        if (r.Creep is { } c)
        {
            rows.Add(Row($"Lane weighted creep ratio (L_w = {N(c.Lane.WeightedLength)} m)", "Lane 1935", N(c.Lane.Ratio), N(c.Lane.Required), Verdict(c.Lane.Pass)));
            rows.Add(Row($"Bligh creep ratio (L = {N(c.Bligh.WeightedLength)} m)", "Bligh 1910", N(c.Bligh.Ratio), N(c.Bligh.Required), Verdict(c.Bligh.Pass)));
        }
        return rows;
    }

    private static List<string> Methods(AnalysisResultDto r, SectionDocument section)
    {
        string elements = section.Mesh?.Order == 2 ? "quadratic (P2)" : "linear (P1)";
        var list = new List<string>
        {
            $"Steady seepage: div(K grad h) = 0 with the zone's conductivity tensor, solved by the finite element method with {elements} " +
                "triangles on a quality constrained Delaunay mesh; impervious cutoffs are slits with distinct nodes on their two faces, " +
                "permeable walls are strips meshed as zones of their own conductivity.",
            $"Discharge from the consistent nodal reactions on the fixed-head boundaries; linear solve by {r.Solver.Method}.",
            "Flow lines are level lines of the stream function; equipotentials are level lines of the total head.",
            "Exit gradient: upward gradient averaged over the stated depth below the exit surface; critical gradient i_c = (Gs − 1)/(1 + e) " +
                "(Terzaghi, K., Theoretical Soil Mechanics, 1943).",
            "Heave: Terzaghi's prism of depth D and width D/2 beside the cutoff, factor γ′D/(γw h_a) (Terzaghi, K., Theoretical Soil Mechanics, 1943).",
            "Creep checks beside the FE results, as a reviewer applies them by hand: Lane, E. W., \"Security from under-seepage: masonry dams " +
                "on earth foundations\", Trans. ASCE 100, 1935; Bligh, W. G., \"Dams, barrages and weirs on porous foundations\", Engineering News 64, 1910.",
        };
        if (r.Creep is { } c) list.Add($"Creep ratio tables used: {c.Lane.Source}; {c.Bligh.Source}.");
        return list;
    }

    private static IReadOnlyList<string> Row(params string[] cells) => cells;
}
