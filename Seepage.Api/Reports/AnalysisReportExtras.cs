using Seepage.Api.Contracts;
using static Seepage.Api.Reports.ReportFormat;

namespace Seepage.Api.Reports;

/// <summary>The parts of the memo that exist only when the analysis computed them: the method of independent variables
/// beside the FE values, flow gauges, the convergence check over refinements and the truncation check of the lateral
/// boundaries.</summary>
public static class AnalysisReportExtras
{
    public static IEnumerable<ReportBlock> Blocks(AnalysisResultDto r)
    {
        if (r.IndependentVariables is { } iv)
        {
            yield return new ReportParagraph($"Method of independent variables for {iv.Structure} (floor length {N(iv.FloorLength)} m, " +
                (iv.FloorThickness > 0 ? $"underside {N(iv.FloorThickness)} m below the ground, " : "") +
                $"head difference {N(iv.HeadDifference)} m), beside the FE values; pressures in per cent of the head difference. Source: {iv.Source}.");
            yield return new ReportTable("Key points: independent variables and finite elements",
                ["Cutoff", "Point", "Closed form (%)", "Correction (%)", "Corrected (%)", "FE (%)", "FE − corrected (%)"],
                iv.Piles.SelectMany(p => new[] { ("E", p.E), ("D", p.D), ("C", p.C) }.Select(k => (IReadOnlyList<string>)
                    [$"{p.Cutoff} ({p.Position}, x = {N(p.X)} m, d = {N(p.Depth)} m below the ground)", k.Item1, N(k.Item2.Basic), N(k.Item2.Correction),
                     N(k.Item2.Corrected), N(k.Item2.Fe), N(k.Item2.Difference)])).ToList());
            var notes = new List<string>();
            if (iv.ExitGradient is not null) notes.Add($"Exit gradient G_E by the method: {N(iv.ExitGradient)}; FE averaged: {N(iv.FeExitGradient)}; FE element row: {N(iv.FeRowExitGradient)}.");
            if (iv.CorrectionsApplied.Count > 0) notes.Add("Corrections applied: " + string.Join("; ", iv.CorrectionsApplied) + ".");
            if (iv.CorrectionsNotApplied.Count > 0) notes.Add("Corrections not applied: " + string.Join("; ", iv.CorrectionsNotApplied) + ".");
            notes.AddRange(iv.Notes);
            if (notes.Count > 0) yield return new ReportList(notes);
        }
        if (r.Gauges is { Count: > 0 } gauges)
            yield return new ReportTable("Flow gauges", ["Gauge", "Flow (m³/s per m)", "Read from", "Velocity line integral (m³/s per m)", "Length in soil (m)"],
                gauges.Select(g => (IReadOnlyList<string>)[g.Name, N(g.Flow), g.Method, N(g.LineIntegral), N(g.Length)]).ToList());
        if (r.Convergence is { } c)
            yield return new ReportTable($"Convergence over two uniform refinements ({string.Join(" / ", c.Triangles)} triangles)",
                ["Figure", "Unit", "Coarse", "Medium", "Fine", "Observed order", "Richardson estimate", "Estimated relative error"],
                c.Figures.Select(f => (IReadOnlyList<string>)[f.Name, f.Unit, N(At(f.Values, 0)), N(At(f.Values, 1)), N(At(f.Values, 2)),
                    N(f.ObservedOrder), N(f.Extrapolated), N(f.EstimatedError)]).ToList());
        if (r.Truncation is { } t)
            yield return new ReportTable("Truncation check of the lateral boundaries", ["Boundaries x (m)", "Flow (m³/s per m)"],
            [
                [$"{N(t.LeftX)} … {N(t.RightX)}", N(t.Flow)],
                [$"{N(t.ExtendedLeftX)} … {N(t.ExtendedRightX)} (pushed out)", N(t.ExtendedFlow)],
                ["relative change", N(t.Change)],
                // Results stored before the method was recorded were all wider solves.
                ["method", t.Method == "sensitivity" ? "first-order estimate from the one solution (an upper bound)"
                    : "the wider section meshed and solved"],
            ]);
    }

    /// <summary>Extra rows of the figures-and-checks table: total flow, element-row exit gradient, heave prism forces.</summary>
    public static IEnumerable<IReadOnlyList<string>> CheckRows(AnalysisResultDto r, PresentationUnits? units = null)
    {
        var u = units ?? PresentationUnits.Si;
        if (r.Flow.Total is { } total)
        {
            // Total flow: the per-metre rate times the length; in US terms ft³/day and gal/min.
            double? length = r.Flow.StructureLength;
            string rate = u.IsSi ? $"{N(total)}" : N(u.Flow(total / length) * u.Length(length));
            string other = u.IsSi ? $"{N(r.Flow.TotalPerDay)} m³/day" : $"{N(u.FlowAlt(total / length) * u.Length(length))} gal/min";
            string unit = u.IsSi ? "m³/s" : "ft³/day";
            yield return [$"Total discharge over {N(u.Length(length))} {u.LengthUnit} of structure ({unit})", "perMetre × length", rate, "—", other];
        }
        if (r.Exit is { MaxRowGradient: > 0 } e)
            yield return [$"Exit gradient of the element row at the exit (max at {PointIn(e.MaxRowAt, u)} {u.LengthUnit})", "boundary triangle gradient, not averaged",
                N(e.MaxRowGradient), "—", $"{N(e.RowGradientAtMax)} at the averaged maximum"];
        foreach (var h in r.Heave.Where(h => h.EffectiveWeight is not null))
            yield return [$"Heave prism at {h.Cutoff}: W′ and U ({u.ForceUnit})", "γ′·D·D/2 against γw·h_a·D/2", N(u.Force(h.EffectiveWeight)), "—",
                $"U = {N(u.Force(h.PrismUpliftForce))}"];
    }

    private static string PointIn(double[]? p, PresentationUnits u) => p is { Length: >= 2 } ? Point([u.Length(p[0])!.Value, u.Length(p[1])!.Value]) : "—";

    private static double? At(double[] values, int i) => i < values.Length ? values[i] : null;
}
