using Seepage.Core.Solvers;

namespace Seepage.Core;

/// <summary>Options of one analysis run.</summary>
public sealed record AnalysisOptions
{
    /// <summary>Linear solver stopping rule and limits.</summary>
    public SolverOptions Solver { get; init; } = new();

    /// <summary>Whether to compute the flow net (equipotentials and the stream function). Default true.</summary>
    public bool FlowNet { get; init; } = true;

    /// <summary>Settings of the free-surface iteration of unconfined sections.</summary>
    public Unconfined.UnconfinedOptions Unconfined { get; init; } = new();

    /// <summary>Number of equal head drops of the flow net; wins over the section's <c>flowNet.headDrops</c>.
    /// Default null: the section's value, or chosen for square cells (<see cref="Results.FlowNetBuilder.ChooseHeadDrops"/>).</summary>
    public int? HeadDrops { get; init; }

    /// <summary>Called on the analysing thread after each stage with its name (mesh, assembly, solve, figures,
    /// convergence, truncation, streamFunction, flowNet), e.g. for a benchmark to read a clock. Default none.</summary>
    public Action<string>? StageDone { get; init; }

    /// <summary>A check of each validated section before a study analyses it (the server's work budget); a problem it
    /// returns refuses that alternative. Default none.</summary>
    public Func<Sections.SectionModel, Sections.SectionProblem?>? Admission { get; init; }
}
