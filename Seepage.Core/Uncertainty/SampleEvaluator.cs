using System.Text.Json.Nodes;
using Seepage.Core.Meshing;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;

namespace Seepage.Core.Uncertainty;

/// <summary>One evaluated sample: its index, the variable values (in the members' units), and its figures, or why it could
/// not be analysed.</summary>
public sealed record SampleOutcome(int Index, IReadOnlyList<double> Values, SampleFigures? Figures, string? Problem);

/// <summary>
/// Evaluates samples of one base section, reusing as much of the base problem as the varied members allow
/// (<see cref="MemberKind"/>): only heads and post-processing data → <see cref="HeadSuperposition"/> (no solve per sample);
/// conductivities → <see cref="ReusableHeadProblem"/> (mesh and sparsity pattern reused, values re-assembled); anything
/// else → a fresh analysis per sample. Samples never run the truncation or convergence re-analyses.
/// </summary>
public sealed class SampleEvaluator
{
    private readonly SampleSection _sections;
    private readonly SolverOptions _options;
    private readonly ReusableHeadProblem? _problem;
    private readonly HeadSuperposition? _superposition;

    public SampleEvaluator(JsonNode baseSection, SectionModel baseModel, IReadOnlyList<UncertainVariable> variables,
        SolverOptions options, CancellationToken cancellation)
    {
        _sections = new SampleSection(baseSection, variables);
        _options = options;
        Kind = variables.Count == 0 ? MemberKind.Figures : variables.Max(v => MemberKinds.Of(v.Member));
        if (Kind == MemberKind.Geometry) return;
        _problem = new ReusableHeadProblem(Prepare(baseModel), cancellation);
        if (Kind == MemberKind.Conductivity)
            _problem.SharePreconditioner(_sections.Make(variables.Select(v => v.Distribution.Median).ToList(), out _) ?? baseModel,
                options, cancellation);
        if (Kind <= MemberKind.Head) _superposition = new HeadSuperposition(_problem, Prepare(baseModel), options, cancellation);
    }

    /// <summary>How much of the base problem each sample reuses.</summary>
    public MemberKind Kind { get; }

    /// <summary>How samples are evaluated, in words (for the echo and the memo).</summary>
    public string Method => Kind switch
    {
        MemberKind.Geometry => "each sample meshed and analysed afresh (a varied member changes the geometry or the mesh)",
        MemberKind.Conductivity => "one mesh and sparsity pattern for all samples; K re-assembled per sample and solved by CG " +
            "preconditioned with one AMG hierarchy built at the medians",
        _ => "one AMG-preconditioned matrix for all samples; heads by superposition of unit-head solutions (linear in the heads)",
    };

    /// <summary>Nodes of the shared mesh, or null when every sample is meshed afresh.</summary>
    public int? Nodes => _problem?.Mesh.NodeCount;

    public SampleOutcome Evaluate(int index, IReadOnlyList<double> values, CancellationToken cancellation)
    {
        var model = _sections.Make(values, out var problems);
        if (model is null)
            return new SampleOutcome(index, values, null, string.Join("; ", problems.Select(p => $"{p.Pointer}: {p.Message}")));
        model = Prepare(model);
        try
        {
            var figures = Kind switch
            {
                MemberKind.Geometry => SampleFigures.Of(Analysis.Run(model, new AnalysisOptions { Solver = _options, FlowNet = false }, cancellation)),
                MemberKind.Conductivity => _problem!.Evaluate(model, _options, cancellation),
                _ => _superposition!.Evaluate(model),
            };
            return new SampleOutcome(index, values, figures, null);
        }
        catch (MeshingException ex) { return new SampleOutcome(index, values, null, "The section could not be meshed: " + ex.Message); }
        catch (SolverNotConvergedException ex) { return new SampleOutcome(index, values, null, "The linear solve did not converge: " + ex.Message); }
    }

    // Samples skip the verification re-analyses (truncation, convergence): they multiply the cost and are the base
    // analysis's business.
    private static SectionModel Prepare(SectionModel model) =>
        model with { TruncationCheck = false, Mesh = model.Mesh with { ConvergenceCheck = false } };
}
