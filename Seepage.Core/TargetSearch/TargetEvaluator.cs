using System.Text.Json.Nodes;
using Seepage.Core.Studies;

namespace Seepage.Core.TargetSearch;

/// <summary>Evaluates one point of a target search: the base section with the member set to the value, validated and
/// analysed like a study alternative (<see cref="StudyRunner.RunOne"/>), and its margins against the requirements.</summary>
public static class TargetEvaluator
{
    public static (TargetPoint Point, AnalysisResult? Result) Evaluate(JsonNode baseSection, TargetSearch search, double value,
        AnalysisOptions? options, CancellationToken cancellation)
    {
        var alternative = new StudyAlternative(FormattableString.Invariant($"{search.Member} = {value:G6}"),
            [new(search.Member, JsonValue.Create(value))]);
        var (row, result) = StudyRunner.RunOne(baseSection, 0, alternative, options, cancellation);
        return (new TargetPoint(value, row, search.Require.Margins(row)), result);
    }
}
