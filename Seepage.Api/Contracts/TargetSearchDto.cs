using System.Text.Json.Nodes;

namespace Seepage.Api.Contracts;

/// <summary>The body of POST /api/v1/target-searches: the base section, the member to vary (JSON pointer, RFC 6901), its
/// range (the first value is the least-cost end), the requirements (any of exitFactor, heaveFactor, maxFlow in m³/s per m,
/// maxUpliftForce in kN/m; default: the section's own required factors against piping and heave), the tolerance of the
/// answer in the member's unit (default 0.05 or 1 % of the range, whichever is smaller) and the coarse-scan points
/// (default 9).</summary>
public sealed record TargetSearchRequestDto(JsonObject Base, string Member, double[] Range, TargetRequirementsDto? Require,
    double? Tolerance, int? ScanPoints);

/// <summary>Requirements of a target search; null members are not required.</summary>
public sealed record TargetRequirementsDto(double? ExitFactor, double? HeaveFactor, double? MaxFlow, double? MaxUpliftForce);

/// <summary>
/// A target search: <c>status</c> (running, done, failed, cancelled, interrupted), <c>done</c>/<c>total</c> points
/// (total is an estimate while running), the echo of the definition with defaults, and the answer: <c>value</c> (the member
/// value found, null when none in the range meets every requirement), <c>feasible</c>, <c>governing</c> (the requirement
/// that sets it), <c>margins</c> (per requirement, relative, positive when met), <c>intervals</c> (every feasible stretch),
/// <c>monotone</c>, <c>bestMargin</c>/<c>bestValue</c> (the best point reached, also when infeasible), <c>message</c> in
/// words and every evaluated <c>points</c> (each stored as an analysis with its memo).
/// </summary>
public sealed record TargetSearchDto(
    string Id, string Title, DateTimeOffset CreatedAt, string Status, int Done, int Total,
    string Member, double[] Range, TargetRequirementsDto Require, double Tolerance, int ScanPoints, double LeastCostEnd,
    double? Value, bool? Feasible, string? Governing, IReadOnlyDictionary<string, double?> Margins,
    IReadOnlyList<TargetIntervalDto> Intervals, bool? Monotone, double? BestMargin, double? BestValue, string? Message,
    IReadOnlyList<string> Notes, IReadOnlyList<TargetPointDto> Points, string Caution, double Seconds);

/// <summary>A feasible stretch of the member's range, from the end nearer the least-cost end.</summary>
public sealed record TargetIntervalDto(double From, double To);

/// <summary>One evaluated point: the member value, its key figures (flow m³/s per m, uplift force kN/m, max exit gradient,
/// factors against piping and heave), the margin of each requirement, whether all are met, and its stored analysis.</summary>
public sealed record TargetPointDto(double Value, double? Flow, double? UpliftForce, double? MaxExitGradient, double? ExitFactor,
    double? HeaveFactor, IReadOnlyDictionary<string, double?> Margins, bool Pass, string? AnalysisId,
    IReadOnlyDictionary<string, string[]> Problems);
