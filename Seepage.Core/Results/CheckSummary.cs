using Seepage.Core.Sections;

namespace Seepage.Core.Results;

/// <summary>
/// The checks of one analysis in one list, and the overall verdict: <c>pass</c> is false when any of
/// <see cref="Verdicts"/> fails, true when every one that gave a verdict passes, null when none gave one; it covers
/// the checks returned by <see cref="Overall"/> (those with a verdict). The truncation, convergence and independent-variable
/// comparisons are reports, not verdicts, but say when and why they did not run.
/// </summary>
public static class CheckSummary
{
    /// <summary>The checks that give a pass/fail verdict, in the order of a study row's columns.</summary>
    public static readonly IReadOnlyList<string> Verdicts = ["exit", "heave", "lane", "bligh"];

    public static IReadOnlyList<CheckVerdict> Of(AnalysisResult r) =>
    [
        Exit(r), Heave(r), Creep(r.Creep?.Lane, r, "Lane"), Creep(r.Creep?.Bligh, r, "Bligh"),
        new("truncation", null, r.Truncation is not null ? null : TruncationSkipped(r)),
        new("convergence", null, r.Convergence is not null ? null : "not requested (mesh.convergenceCheck: true runs it)."),
        new("independentVariables", null, r.IndependentVariables is not null ? null : IndependentSkipped(r.Section)),
    ];

    /// <summary>The overall verdict over the verdict checks, and the checks it covers.</summary>
    public static (bool? Pass, IReadOnlyList<string> Covers) Overall(IReadOnlyList<CheckVerdict> checks)
    {
        var known = checks.Where(c => Verdicts.Contains(c.Check) && c.Pass is not null).ToList();
        return (known.Count == 0 ? null : known.All(c => c.Pass == true), known.Select(c => c.Check).ToList());
    }

    private static CheckVerdict Exit(AnalysisResult r)
    {
        if (r.Exit is not { } e) return new("exit", null, "no station of the exit surface has soil over the averaging depth below it.");
        if (e.MaxGradient <= 0)
            return new("exit", null, "the exit surface receives inflow (no upward gradient anywhere on it); it is not where water leaves.");
        return new("exit", e.Pass, e.Pass is null ? "the exit soil has neither specificGravity with voidRatio nor saturatedUnitWeight." : null);
    }

    private static CheckVerdict Heave(AnalysisResult r)
    {
        if (r.Section.Cutoffs.Count == 0) return new("heave", null, "the section has no cutoff.");
        var counted = r.Heave.Where(h => h.Pass is not null).ToList();
        if (counted.Count > 0) return new("heave", counted.All(h => h.Pass == true), null);
        string why = r.Heave.Select(h => h.Skipped).FirstOrDefault(s => s is not null)
            ?? "no cutoff has a prism in soil with specificGravity and voidRatio (or saturatedUnitWeight); see warnings.";
        return new("heave", null, why);
    }

    private static CheckVerdict Creep(CreepCheck? c, AnalysisResult r, string method)
    {
        string name = method.ToLowerInvariant();
        if (c is null)
            return new(name, null, r.Section.Structures.Count == 0 && r.Section.Cutoffs.Count == 0
                ? "the section has no structure or cutoff, so no contact path." : "the fixed heads give no head difference.");
        return new(name, c.Pass, c.Pass is null ? c.Skipped ?? $"{method}'s table gives no ratio for the exit soil." : null);
    }

    private static string TruncationSkipped(AnalysisResult r)
    {
        if (r.Section.TruncationCheck == false) return "truncationCheck is false.";
        if (r.Section.TruncationCheck is null && r.Mesh.TriangleCount >= TruncationCheck.AutomaticBelowTriangles)
            return FormattableString.Invariant(
                $"the first-order estimate does not apply to this section (drains, or more than two head levels) and the mesh has {r.Mesh.TriangleCount:N0} triangles; the wider solve runs by itself below {TruncationCheck.AutomaticBelowTriangles:N0} (truncationCheck: true runs it).");
        return "the section has no structure or cutoff to measure the lateral boundaries from, one reaches a lateral boundary, or there is no flow.";
    }

    private static string IndependentSkipped(SectionModel s)
    {
        if (s.Structures.Count != 1)
            return $"the method applies to one floor; the section has {s.Structures.Count} structures.";
        if (s.Cutoffs.Count is 0 or > 3) return $"the method applies to a floor with one to three cutoffs; the section has {s.Cutoffs.Count}.";
        return "the section is not one floor with vertical cutoffs hanging from its underside, flow in +x (see warnings).";
    }
}
