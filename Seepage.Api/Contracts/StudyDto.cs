using System.Text.Json.Nodes;

namespace Seepage.Api.Contracts;

/// <summary>A study of design alternatives: its state (<c>running</c>, <c>done</c>, or <c>cancelled</c> when the client of a waiting study left; a background study
/// cut off by a stopped server is picked up again by the job engine), how many
/// of the <c>total</c> alternatives are <c>done</c>, the varied members (JSON pointers) and the rows finished so far, in the
/// alternatives' order. <c>seconds</c> is the wall time so far.</summary>
public sealed record StudyDto(
    string Id,
    string Title,
    DateTimeOffset CreatedAt,
    string Status,
    int Done,
    int Total,
    IReadOnlyList<string> Parameters,
    IReadOnlyList<StudyRowDto> Rows,
    string Caution,
    double Seconds);

/// <summary>One alternative's key figures: flow in m³/s per m, uplift force (sum over the structures) in kN/m, the largest
/// averaged exit gradient and the factor against piping, the smallest heave factor at the cutoffs, required factors, the
/// verdict of each check (<c>exitPass</c>, <c>heavePass</c>, <c>lanePass</c>, <c>blighPass</c>; null where a check gave none) and
/// <c>pass</c> over them, with <c>passCovers</c> naming the checks it covers. An alternative that could not be analysed has <c>valid</c> false and its
/// <c>problems</c> keyed by JSON pointer into the changed section. <c>analysisId</c> names its stored analysis (with report).</summary>
public sealed record StudyRowDto(
    int Index,
    string Name,
    IReadOnlyDictionary<string, JsonNode?> Changes,
    bool Valid,
    IReadOnlyDictionary<string, string[]> Problems,
    string? AnalysisId,
    double? Flow,
    double? UpliftForce,
    double? MaxExitGradient,
    double? ExitFactor,
    double? ExitRequiredFactor,
    double? HeaveFactor,
    double? HeaveRequiredFactor,
    bool? Pass,
    double Seconds,
    bool? ExitPass = null,
    bool? HeavePass = null,
    bool? LanePass = null,
    bool? BlighPass = null,
    IReadOnlyList<string>? PassCovers = null);
