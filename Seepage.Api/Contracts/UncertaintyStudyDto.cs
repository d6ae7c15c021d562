using System.Text.Json.Nodes;

namespace Seepage.Api.Contracts;

/// <summary>The body of POST /api/v1/uncertainty-studies: the base section, the random variables, optional rank
/// correlations, the number of samples (default 1000), the seed (default 1; the same seed gives the same samples) and the
/// sampling (latinHypercube, default, or random).</summary>
public sealed record UncertaintyRequestDto(JsonObject Base, IReadOnlyList<VariableDto> Variables, int? Samples, long? Seed,
    string? Sampling, IReadOnlyList<CorrelationDto>? Correlations);

/// <summary>A random variable keyed by JSON pointer, in the member's unit. <c>lognormal</c>: median and cov, or range
/// [5 %, 95 %]; <c>normal</c>: mean and sd, or range [5 %, 95 %]; <c>uniform</c>: range [low, high]. keepAnisotropy (a
/// soil's kx; default true) scales ky with kx. The answer echoes mean, sd, p05 and p95 of each.</summary>
public sealed record VariableDto(string Member, string Distribution, double? Median, double? Cov, double? Mean, double? Sd,
    double[]? Range, bool? KeepAnisotropy, double? P05 = null, double? P95 = null);

/// <summary>A rank (Spearman) correlation between two variables named by their members.</summary>
public sealed record CorrelationDto(string[] Between, double Rank);

/// <summary>
/// An uncertainty study: <c>status</c> (running, done, failed, cancelled, interrupted), <c>done</c>/<c>total</c> samples,
/// the echo of the definition, how samples were evaluated (<c>method</c>), and the statistics so far: <c>figures</c>
/// (flow m³/s per m, upliftForce kN/m, maxExitGradient, exitFactor, heaveFactor: mean, sd, p05, p50, p95, histogram),
/// <c>checks</c> (exit, heave: probabilityOfFailure, standardError, beta = −Φ⁻¹(p_f)), <c>fosm</c> (first-order
/// second-moment mean and sd of each figure) and <c>sensitivity</c> (rank correlation of each variable with each figure).
/// </summary>
public sealed record UncertaintyStudyDto(
    string Id, string Title, DateTimeOffset CreatedAt, string Status, int Done, int Total, long Seed, string Sampling,
    IReadOnlyList<VariableDto> Variables, IReadOnlyList<CorrelationDto> Correlations, string? Method, int Analysed, int Failed,
    IReadOnlyList<string> FailureReasons, IReadOnlyDictionary<string, FigureStatisticsDto> Figures,
    IReadOnlyDictionary<string, CheckProbabilityDto> Checks, IReadOnlyDictionary<string, FosmDto> Fosm,
    IReadOnlyDictionary<string, IReadOnlyDictionary<string, double?>> Sensitivity, string Caution, double Seconds);

/// <summary>Statistics of one figure over the analysed samples, in its <c>unit</c>; the histogram has 20 equal bins.</summary>
public sealed record FigureStatisticsDto(string Unit, int Count, double Mean, double Sd, double? Cov, double P05, double P50, double P95,
    double Min, double Max, HistogramDto Histogram);

/// <summary>Bin limits (one more than the counts) and the number of samples in each bin.</summary>
public sealed record HistogramDto(IReadOnlyList<double> Edges, IReadOnlyList<int> Counts);

/// <summary>Probability of failure of a check (factor below requiredFactor) over the samples that had the check, its
/// binomial standard error, β = −Φ⁻¹(p_f) (null when no or every sample failed) and, with no failure, the 95 % upper
/// bound 3/n.</summary>
public sealed record CheckProbabilityDto(double ProbabilityOfFailure, double StandardError, double? Beta, int Failures, int Samples,
    double RequiredFactor, double? UpperBound);

/// <summary>The FOSM estimate of one figure: the value at the means, its standard deviation and the derivative with respect
/// to each variable (figure unit per member unit), by central differences of 0.1 sd.</summary>
public sealed record FosmDto(double Mean, double Sd, IReadOnlyDictionary<string, double> Derivatives);
