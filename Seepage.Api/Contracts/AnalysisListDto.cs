namespace Seepage.Api.Contracts;

/// <summary>One page of stored analyses, newest first: the page number (from 1), the page size, how many analyses match
/// the filter in all, and the page's items.</summary>
public sealed record AnalysisListDto(int Page, int PageSize, int Total, IReadOnlyList<AnalysisListItemDto> Items);

/// <summary>A stored analysis in a listing: id, title, when it was made (UTC) and its key figures (null for analyses stored
/// before listings kept them).</summary>
public sealed record AnalysisListItemDto(string Id, string Title, DateTimeOffset CreatedAt, AnalysisFiguresDto? Figures);

/// <summary>Key figures of one analysis: flow in m³/s per m, uplift force summed over the structures in kN/m, the largest
/// averaged exit gradient and the factor against piping, the smallest heave factor at the cutoffs, the required factors,
/// and <c>pass</c> (every check with a factor passes; null when none has one).</summary>
public sealed record AnalysisFiguresDto(double? Flow, double? UpliftForce, double? MaxExitGradient, double? ExitFactor,
    double? ExitRequiredFactor, double? HeaveFactor, double? HeaveRequiredFactor, bool? Pass)
{
    public static AnalysisFiguresDto From(Seepage.Core.Studies.StudyRow row) => new(row.Flow, row.UpliftForce, row.MaxExitGradient,
        row.ExitFactor, row.ExitRequiredFactor, row.HeaveFactor, row.HeaveRequiredFactor, row.Pass);
}
