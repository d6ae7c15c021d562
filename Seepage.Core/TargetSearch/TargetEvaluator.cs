using System.Text.Json.Nodes;
using Seepage.Core.Studies;

namespace Seepage.Core.TargetSearch;

/// <summary>Evaluates one point of a target search: the base section with the member set to the value, validated and
/// analysed like a study alternative (<see cref="StudyRunner.RunOne"/>), and its margins against the requirements.</summary>
public static class TargetEvaluator
{
    /// <summary>The base is given as JSON text and parsed per point, since the scan evaluates points on several threads and
    /// a parsed JsonNode is not safe to read concurrently.</summary>
    public static (TargetPoint Point, AnalysisResult? Result) Evaluate(string baseSection, TargetSearch search, double value,
        AnalysisOptions? options, CancellationToken cancellation)
    {
        var alternative = new StudyAlternative(FormattableString.Invariant($"{search.Member} = {value:G6}"),
            [new(search.Member, JsonValue.Create(value))]);
        var (row, result) = StudyRunner.RunOne(JsonNode.Parse(baseSection)!, 0, alternative, options, cancellation);
        return (new TargetPoint(value, row, search.Require.Margins(row)), result);
    }
}
