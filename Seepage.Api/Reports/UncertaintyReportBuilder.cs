using Seepage.Api.Contracts;
using static Seepage.Api.Reports.ReportFormat;

namespace Seepage.Api.Reports;

/// <summary>The memo of an uncertainty study: the variables and how they were sampled, the statistics of each figure with
/// the FOSM estimate beside them, p_f and β of each check, the histograms with the allowable lines, the sensitivities,
/// and the caution about assumed distributions.</summary>
public static class UncertaintyReportBuilder
{
    /// <summary>The caution every uncertainty memo carries beside the general one.</summary>
    public const string ProbabilityCaution =
        "A probability of failure is only as good as the distributions assumed for the soil data and heads: other, equally " +
        "defensible distributions (especially in their tails) can change it by orders of magnitude. It supports, and never " +
        "replaces, review by a licensed geotechnical engineer; local codes govern the required factors of safety and any " +
        "acceptable probability of failure.";

    private static readonly Dictionary<string, string> Labels = new()
    {
        ["flow"] = "flow (m³/s per m)", ["upliftForce"] = "uplift force (kN/m)", ["maxExitGradient"] = "max exit gradient",
        ["exitFactor"] = "factor against piping", ["heaveFactor"] = "factor against heave",
    };

    public static ReportDocument Build(UncertaintyStudyDto u, DateTimeOffset printed)
    {
        var blocks = new List<ReportBlock>
        {
            new ReportHeading("What was varied and how"),
            new ReportTable("Random variables (members' units: conductivity in the section's unit, heads in m)",
                ["Member", "Distribution", "Median", "Mean", "sd", "5 %", "95 %", "ky/kx kept"],
                u.Variables.Select(v => (IReadOnlyList<string>)[v.Member, v.Distribution + (v.Cov is { } c ? $", cov {N(c)}" : ""), N(v.Median),
                    N(v.Mean), N(v.Sd), N(v.P05), N(v.P95), v.KeepAnisotropy switch { true => "yes", false => "no", null => "—" }]).ToList()),
            new ReportParagraph($"{u.Total} samples ({(u.Sampling == "random" ? "plain random sampling" : "Latin hypercube sampling, McKay, Beckman & Conover, Technometrics 21, 1979")}), " +
                $"seed {u.Seed}: the same seed gives the same samples. " + (u.Correlations.Count == 0 ? "The variables are independent. "
                    : "Rank correlations imposed by the method of Iman & Conover (1982): " +
                      string.Join("; ", u.Correlations.Select(c => $"{c.Between[0]} with {c.Between[1]}: {N(c.Rank)}")) + ". ") +
                $"Evaluation: {u.Method ?? "in progress"}. Status: {u.Status}, {u.Done} of {u.Total} samples, {u.Analysed} analysed, {u.Failed} not."),
            new ReportHeading("Figures"),
            new ReportTable("Monte Carlo statistics, with the first-order second-moment estimate (FOSM: central differences of 0.1 sd about " +
                "the means; Baecher & Christian, Reliability and Statistics in Geotechnical Engineering, 2003)",
                ["Figure", "Mean", "sd", "5 %", "50 %", "95 %", "FOSM mean", "FOSM sd"],
                u.Figures.Select(f => (IReadOnlyList<string>)[Labels[f.Key], N(f.Value.Mean), N(f.Value.Sd), N(f.Value.P05), N(f.Value.P50),
                    N(f.Value.P95), N(u.Fosm.GetValueOrDefault(f.Key)?.Mean), N(u.Fosm.GetValueOrDefault(f.Key)?.Sd)]).ToList()),
        };
        if (u.Checks.Count > 0)
            blocks.Add(new ReportTable("Probability of failure (factor below the required one); β = −Φ⁻¹(p_f)",
                ["Check", "Required factor", "Failures", "p_f", "Standard error", "β"],
                u.Checks.Select(c => (IReadOnlyList<string>)[c.Key == "exit" ? "piping (exit gradient)" : "heave", N(c.Value.RequiredFactor),
                    $"{c.Value.Failures} of {c.Value.Samples}", c.Value.UpperBound is { } ub ? $"0 (< {N(ub)} at 95 %)" : N(c.Value.ProbabilityOfFailure),
                    N(c.Value.StandardError), c.Value.Beta is { } b ? N(b) : "—"]).ToList()));
        blocks.Add(new ReportParagraph(ProbabilityCaution));
        blocks.Add(new ReportHeading("Histograms"));
        foreach (var (name, f) in u.Figures)
        {
            double? allowable = name switch
            {
                "exitFactor" => u.Checks.GetValueOrDefault("exit")?.RequiredFactor,
                "heaveFactor" => u.Checks.GetValueOrDefault("heave")?.RequiredFactor,
                _ => null,
            };
            string check = name == "exitFactor" ? "exit" : "heave";
            string pf = allowable is null ? "" : $"; p_f = {N(u.Checks[check].ProbabilityOfFailure)}, β = {(u.Checks[check].Beta is { } b ? N(b) : "—")}";
            blocks.Add(new ReportFigure($"Histogram of the {Labels[name]} over {f.Count} samples{(allowable is null ? "" : $", with the required factor {N(allowable)}")}{pf}.",
                DesignCharts.Histogram(Labels[name], f.Histogram.Edges, f.Histogram.Counts, allowable, allowable is null ? null : $"required {N(allowable)}")));
        }
        if (u.Sensitivity.Count > 0)
        {
            var names = u.Figures.Keys.ToList();
            blocks.Add(new ReportHeading("Sensitivity"));
            blocks.Add(new ReportTable("Rank correlation (Spearman) of each variable with each figure",
                ["Variable", .. names.Select(n => Labels[n])],
                u.Sensitivity.Select(s => (IReadOnlyList<string>)[s.Key, .. names.Select(n => N(s.Value.GetValueOrDefault(n)))]).ToList()));
        }
        return new ReportDocument($"Seepage uncertainty study: {u.Title}", $"Uncertainty study {u.Id} of {u.CreatedAt:yyyy-MM-dd HH:mm} UTC",
            printed, u.Caution, blocks);
    }
}
