using Seepage.Core.Uncertainty;

namespace Seepage.Api.Contracts;

/// <summary>Maps the Core statistics of an uncertainty study to contracts.</summary>
public static class UncertaintyMapper
{
    /// <summary>The echo of a variable: its definition with the mean, sd and 5–95 % points of its distribution.</summary>
    public static VariableDto Echo(VariableDto posted, Distribution d) => posted with
    {
        Mean = d.Mean, Sd = d.StandardDeviation, P05 = d.Quantile(0.05), P95 = d.Quantile(0.95),
        Median = d.Kind == DistributionKind.Uniform && posted.Median is null ? null : d.Median,
        KeepAnisotropy = posted.Member.EndsWith("/kx", StringComparison.Ordinal) && posted.Member.StartsWith("/soils/", StringComparison.Ordinal)
            ? posted.KeepAnisotropy ?? true : null,
    };

    public static Dictionary<string, FigureStatisticsDto> Figures(UncertaintySummary s) => s.Figures.ToDictionary(f => f.Key, f =>
        new FigureStatisticsDto(SampleFigures.Units[f.Key], f.Value.Count, f.Value.Mean, f.Value.StandardDeviation, Finite(f.Value.Cov),
            f.Value.P05, f.Value.P50, f.Value.P95, f.Value.Min, f.Value.Max, new HistogramDto(f.Value.Histogram.Edges, f.Value.Histogram.Counts)));

    public static Dictionary<string, CheckProbabilityDto> Checks(UncertaintySummary s) => s.Checks.ToDictionary(c => c.Key, c =>
        new CheckProbabilityDto(c.Value.ProbabilityOfFailure, c.Value.StandardError, c.Value.Beta, c.Value.Failures, c.Value.Samples,
            c.Value.RequiredFactor, c.Value.UpperBound));

    public static Dictionary<string, FosmDto> Fosm(IReadOnlyDictionary<string, FosmEstimate> fosm, IReadOnlyList<UncertainVariable> variables) =>
        fosm.ToDictionary(f => f.Key, f => new FosmDto(f.Value.Mean, f.Value.StandardDeviation,
            variables.Select((v, i) => (v.Member, f.Value.Derivatives[i])).ToDictionary(p => p.Member, p => p.Item2)));

    public static Dictionary<string, IReadOnlyDictionary<string, double?>> Sensitivity(UncertaintySummary s) =>
        s.Sensitivity.ToDictionary(v => v.Key, v => (IReadOnlyDictionary<string, double?>)v.Value.ToDictionary(f => f.Key, f => Finite(f.Value)));

    /// <summary>One sample as a row of the export.</summary>
    public static SampleRowDto Row(SampleOutcome o) => new(o.Index, o.Values.ToArray(), o.Figures?.Flow, o.Figures?.UpliftForce,
        o.Figures?.MaxExitGradient, o.Figures?.ExitFactor, o.Figures?.HeaveFactor, o.Figures?.ExitFails, o.Figures?.HeaveFails, o.Problem);

    private static double? Finite(double v) => double.IsFinite(v) ? v : null;
}

/// <summary>One sample: the variable values (in the order of the study's variables, members' units), its figures (flow
/// m³/s per m, uplift force kN/m, max exit gradient, factors), whether each check failed, or why it was not analysed.</summary>
public sealed record SampleRowDto(int Index, double[] Values, double? Flow, double? UpliftForce, double? MaxExitGradient,
    double? ExitFactor, double? HeaveFactor, bool? ExitFails, bool? HeaveFails, string? Problem);
