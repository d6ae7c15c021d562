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

    public static ReportDocument Build(AnalysisResultDto r, FieldDto field, SectionDocument section, DateTimeOffset printed,
        PresentationUnits? units = null)
    {
        // The section as analysed is in metres and kN/m³ with every default filled, as the memo's units say.
        if (r.AnalysedSection is { } analysed && SectionParser.Parse(analysed.ToJsonString(), out _) is { } si) section = si;
        var u = units ?? PresentationUnits.Si;
        string k = u.IsSi ? section.ConductivityUnit ?? "m/s" : u.ConductivityUnit;
        string L = u.LengthUnit;
        // Conductivities are posted in the section's unit; US memos print them in ft/day.
        double? K(double? value) => u.IsSi ? value : u.Conductivity(value * ConductivityUnits.ToMetresPerSecond.GetValueOrDefault(section.ConductivityUnit ?? "m/s", 1.0));
        string P(double[]? p) => p is { Length: >= 2 } ? Point([u.Length(p[0])!.Value, u.Length(p[1])!.Value]) : "—";
        var blocks = new List<ReportBlock>();
        if (TitleBlock(section.TitleBlock) is { } titleBlock) blocks.Add(titleBlock);
        blocks.AddRange(
        [
            new ReportHeading("1. Inputs"),
            new ReportParagraph($"Section: {section.Title ?? r.Title}. {section.Description ?? ""} Lengths in {L}, elevations y positive up, " +
                $"heads are total heads in {L}, conductivity in {k}, unit weight of water " +
                $"{N(u.UnitWeight(section.WaterUnitWeight ?? SectionDefaults.WaterUnitWeight))} {u.UnitWeightUnit}." +
                (u.IsSi ? "" : " The analysis ran in SI units; this memo converts every figure to US customary units (NIST SP 811, 2008).")),
            new ReportTable("Soils", ["Soil", $"kx ({k})", $"ky ({k})", "Bedding angle (°)", "Gs", "Void ratio e", $"γsat ({u.UnitWeightUnit})", "Creep class"],
                (section.Soils ?? []).Select(s => Row(s.Id ?? "", N(K(s.Kx)), N(K(s.Ky ?? s.Kx)), N(s.BeddingAngle ?? 0), N(s.SpecificGravity),
                    N(s.VoidRatio), N(u.UnitWeight(s.SaturatedUnitWeight)), s.CreepClass ?? "—")).ToList()),
            new ReportTable("Head and drain boundaries", ["Boundary", $"Total head ({L})", $"From (x, y) {L}", $"To (x, y) {L}"],
                (section.Heads ?? []).Select(h => Row(h.Name ?? "", N(u.Length(h.Total)), P(h.Along?.FirstOrDefault()), P(h.Along?.LastOrDefault())))
                .Concat((section.Drains ?? []).Select(d => Row(d.Name ?? "drain", "h = y (drain)", P(d.Along?.FirstOrDefault()), P(d.Along?.LastOrDefault()))))
                .ToList()),
            new ReportTable("Structures and cutoffs", ["Item", "Kind", $"From (x, y) {L}", $"To (x, y) {L}"],
                (section.Structures ?? []).Select(s => Row(s.Name ?? "", "impervious base", P(s.Base?.FirstOrDefault()), P(s.Base?.LastOrDefault())))
                .Concat((section.Cutoffs ?? []).Select(c => Row(c.Name ?? "", c.Thickness is > 0
                    ? $"wall {N(u.Length(c.Thickness))} {L}, kx {N(K(c.Kx))} {k}" : "impervious cutoff", P(c.Top), P(c.Tip)))).ToList()),
            new ReportFigure($"Section geometry: soil zones (legend), structures and cutoffs, head boundaries; {L}.", AnalysisFigures.Geometry(section, u)),
            new ReportHeading("2. Results"),
            new ReportFigure((field.FlowNet.Caption ?? FlowNetCaption.Of(field.FlowNet)) + " Drawn from the finite element head field.",
                AnalysisFigures.FlowNet(section, field, u)),
            new ReportFigure($"Uplift pressure under the structures (pore pressure u = γw (h − y)), {u.PressureUnit}.", AnalysisFigures.Uplift(r, u)),
        ]);
        if (AnalysisFigures.ExitProfile(r, u) is { } exitFigure)
            blocks.Add(new ReportFigure("Upward exit gradient along the exit surface with the allowable gradient (critical gradient / required factor).", exitFigure));
        blocks.Add(new ReportTable(ChecksCaption, ChecksHeaders, [.. Checks(r, u), .. AnalysisReportExtras.CheckRows(r, u)]));
        blocks.AddRange(AnalysisReportExtras.Blocks(r));
        blocks.AddRange(AssumptionBlocks.Blocks(r));
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

    /// <summary>The title block from the section's optional <c>titleBlock</c>, or null when it gives nothing.</summary>
    private static ReportTable? TitleBlock(TitleBlockDocument? t)
    {
        if (t is null) return null;
        var rows = new (string Label, string? Value)[]
        {
            ("Project", t.Project), ("Job number", t.JobNumber), ("Prepared by", t.PreparedBy), ("Checked by", t.CheckedBy), ("Revision", t.Revision),
        }.Where(x => !string.IsNullOrWhiteSpace(x.Value)).Select(x => Row(x.Label, x.Value!)).ToList();
        return rows.Count == 0 ? null : new ReportTable("Title block", ["Item", "Entry"], rows);
    }

    /// <summary>One row per figure and check: the discharge, uplift resultants, piping, heave and the hand creep checks,
    /// every unit stated in the units asked for.</summary>
    public static List<IReadOnlyList<string>> Checks(AnalysisResultDto r, PresentationUnits? units = null)
    {
        var u = units ?? PresentationUnits.Si;
        string L = u.LengthUnit;
        string P(double[]? p) => p is { Length: >= 2 } ? Point([u.Length(p[0])!.Value, u.Length(p[1])!.Value]) : "—";
        var rows = new List<IReadOnlyList<string>>
        {
            Row($"Seepage discharge ({u.FlowUnit})", "FE, nodal reactions", N(u.Flow(r.Flow.PerMetre)), "—", $"{N(u.FlowAlt(r.Flow.PerMetre))} {u.FlowAltUnit}"),
        };
        foreach (var up in r.Uplift)
            rows.Add(Row($"Uplift force under {up.Structure} ({u.ForceUnit})", "∫ u ds along the base", N(u.Force(up.Force)), "—",
                $"resultant at x = {N(u.Length(up.CentroidX))} {L}"));
        if (r.Exit is { } e)
        {
            // The method text of the result document states its depth in m; a US memo states it in ft.
            string method = u.IsSi ? e.Method : $"upward gradient averaged over {N(u.Length(e.Depth))} {L} below the exit surface";
            rows.Add(Row($"Max exit gradient at {P(e.At)} {L}", method, N(e.MaxGradient), "—", $"i_c = {N(e.CriticalGradient)}"));
            rows.Add(Row("Factor against piping i_c / i_exit", "critical gradient (Gs − 1)/(1 + e)", N(e.Factor), N(e.RequiredFactor), Verdict(e.Pass)));
        }
        foreach (var h in r.Heave)
            rows.Add(Row($"Heave at {h.Cutoff} (D = {N(u.Length(h.Depth))} {L}, h_a = {N(u.Length(h.AverageExcessHead))} {L})",
                "Terzaghi's prism, width D/2",
                N(h.Factor), N(h.RequiredFactor), h.Skipped is null ? Verdict(h.Pass) : "not an exit: " + h.Skipped));
        if (r.Creep is { } c)
        {
            rows.Add(Row($"Lane weighted creep ratio (L_w = {N(u.Length(c.Lane.WeightedLength))} {L})", "Lane 1935", N(c.Lane.Ratio), N(c.Lane.Required), Verdict(c.Lane.Pass)));
            rows.Add(Row($"Bligh creep ratio (L = {N(u.Length(c.Bligh.WeightedLength))} {L})", "Bligh 1910", N(c.Bligh.Ratio), N(c.Bligh.Required), Verdict(c.Bligh.Pass)));
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
