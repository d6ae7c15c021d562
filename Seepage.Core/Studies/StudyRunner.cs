using System.Diagnostics;
using System.Text.Json.Nodes;
using Seepage.Core.Meshing;
using Seepage.Core.Results;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;

namespace Seepage.Core.Studies;

/// <summary>
/// Runs a study: for each alternative, applies its changes to a copy of the base section (as JSON), parses and validates
/// the result and analyses it. Alternatives run in parallel within the machine's cores; an alternative that cannot be
/// analysed reports its problems in its row instead of failing the study.
/// </summary>
public static class StudyRunner
{
    /// <summary>Runs every alternative; <paramref name="onRow"/> is called (from worker threads) as each finishes, with the
    /// analysis when there is one. Returns the rows in the alternatives' order.</summary>
    public static IReadOnlyList<StudyRow> Run(JsonNode baseSection, IReadOnlyList<StudyAlternative> alternatives,
        AnalysisOptions? options = null, Action<StudyRow, AnalysisResult?>? onRow = null, CancellationToken cancellation = default)
    {
        var rows = new StudyRow[alternatives.Count];
        var parallel = new ParallelOptions { MaxDegreeOfParallelism = Environment.ProcessorCount, CancellationToken = cancellation };
        Parallel.ForEach(Enumerable.Range(0, alternatives.Count), parallel, i =>
        {
            var (row, result) = RunOne(baseSection, i, alternatives[i], options, cancellation);
            rows[i] = row;
            onRow?.Invoke(row, result);
        });
        return rows;
    }

    /// <summary>Applies the changes, validates and analyses one alternative.</summary>
    public static (StudyRow Row, AnalysisResult? Result) RunOne(JsonNode baseSection, int index, StudyAlternative alternative,
        AnalysisOptions? options, CancellationToken cancellation)
    {
        var clock = Stopwatch.StartNew();
        var section = baseSection.DeepClone();
        var problems = new List<SectionProblem>();
        foreach (var (pointer, value) in alternative.Changes)
            if ((SectionContract.CheckPointer(pointer) ?? JsonPointer.Set(section, pointer, value)) is { } error)
                problems.Add(new SectionProblem(pointer, error));
        string json = section.ToJsonString();
        if (problems.Count > 0) return (Failed(index, alternative.Name, problems, clock, json), null);

        var document = SectionParser.Parse(json, out var parseProblems);
        if (document is null) return (Failed(index, alternative.Name, parseProblems, clock, json), null);
        var outcome = SectionValidator.Validate(document);
        if (!outcome.IsValid) return (Failed(index, alternative.Name, outcome.Problems, clock, json), null);
        if (options?.Admission?.Invoke(outcome.Model!) is { } refused) return (Failed(index, alternative.Name, [refused], clock, json), null);
        try
        {
            var result = Analysis.Run(outcome.Model!, options, cancellation);
            return (Figures(index, alternative.Name, result, clock, json), result);
        }
        catch (MeshingException ex)
        {
            return (Failed(index, alternative.Name, [new SectionProblem("", "The section could not be meshed: " + ex.Message)], clock, json), null);
        }
        catch (SolverNotConvergedException ex)
        {
            return (Failed(index, alternative.Name, [new SectionProblem("", "The linear solve did not converge: " + ex.Message)], clock, json), null);
        }
        catch (MatrixRefusedException ex)
        {
            return (Failed(index, alternative.Name, [new SectionProblem("", ex.Message)], clock, json), null);
        }
        catch (NonFiniteResultException ex)
        {
            return (Failed(index, alternative.Name, [new SectionProblem("", ex.Message)], clock, json), null);
        }
    }

    /// <summary>The key figures of one analysis.</summary>
    public static StudyRow Figures(int index, string name, AnalysisResult r, Stopwatch clock, string? json)
    {
        // The smallest heave factor among the prisms that are heave verdicts (not those under a structure).
        var heave = r.Heave.Where(h => h.Factor is not null && h.Skipped is null).OrderBy(h => h.Factor).FirstOrDefault();
        var checks = CheckSummary.Of(r);
        var (pass, covers) = CheckSummary.Overall(checks);
        bool? Verdict(string check) => checks.First(c => c.Check == check).Pass;
        return new StudyRow(index, name, [], r.Flow.PerMetre, r.Uplift.Count == 0 ? null : r.Uplift.Sum(u => u.Force),
            r.Exit?.MaxGradient, r.Exit?.Factor, r.Exit?.RequiredFactor, heave?.Factor,
            heave?.RequiredFactor ?? r.Heave.FirstOrDefault()?.RequiredFactor, pass, clock.Elapsed.TotalSeconds, json)
        {
            ExitPass = Verdict("exit"), HeavePass = Verdict("heave"), LanePass = Verdict("lane"), BlighPass = Verdict("bligh"), PassCovers = covers,
        };
    }

    private static StudyRow Failed(int index, string name, IReadOnlyList<SectionProblem> problems, Stopwatch clock, string json) =>
        new(index, name, problems, null, null, null, null, null, null, null, null, clock.Elapsed.TotalSeconds, json);
}
