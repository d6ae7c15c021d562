using System.Text.Json.Nodes;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;

namespace Seepage.Core.Uncertainty;

/// <summary>Everything an uncertainty study produced: every sample, the statistics, the FOSM estimates and how the samples
/// were evaluated.</summary>
public sealed record UncertaintyResult(IReadOnlyList<SampleOutcome> Samples, UncertaintySummary Summary,
    IReadOnlyDictionary<string, FosmEstimate> Fosm, string Method, int? Nodes);

/// <summary>
/// Runs an uncertainty study: draws the samples (<see cref="SampleDesign"/>), evaluates the FOSM points and then every
/// sample on the machine's cores (<see cref="SampleEvaluator"/>), and summarises. <c>onFosm</c> gets the FOSM
/// estimates and how samples are evaluated before the samples start. <c>onSample</c> is called from worker
/// threads as each sample finishes, so a caller can report progress and partial statistics.
/// </summary>
public static class UncertaintyRunner
{
    public static UncertaintyResult Run(JsonNode baseSection, SectionModel baseModel, UncertaintyStudy study, SolverOptions options,
        Action<IReadOnlyDictionary<string, FosmEstimate>, string>? onFosm = null, Action<SampleOutcome>? onSample = null,
        CancellationToken cancellation = default)
    {
        var values = SampleDesign.Draw(study.Variables, study.Samples, study.Seed, study.Sampling, study.RankCorrelations);
        var evaluator = new SampleEvaluator(baseSection, baseModel, study.Variables, options, cancellation);
        var parallel = new ParallelOptions { MaxDegreeOfParallelism = Environment.ProcessorCount, CancellationToken = cancellation };

        var points = Fosm.Points(study);
        var atPoints = new SampleFigures?[points.Length];
        Parallel.For(0, points.Length, parallel, i => atPoints[i] = evaluator.Evaluate(-1 - i, points[i], cancellation).Figures);
        var fosm = Fosm.Estimate(study, atPoints);
        onFosm?.Invoke(fosm, evaluator.Method);

        var outcomes = new SampleOutcome[study.Samples];
        Parallel.For(0, study.Samples, parallel, i =>
        {
            outcomes[i] = evaluator.Evaluate(i, values[i], cancellation);
            onSample?.Invoke(outcomes[i]);
        });
        return new UncertaintyResult(outcomes, UncertaintySummary.Of(study, outcomes), fosm, evaluator.Method, evaluator.Nodes);
    }
}
