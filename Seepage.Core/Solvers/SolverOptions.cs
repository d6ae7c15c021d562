namespace Seepage.Core.Solvers;

/// <summary>Stopping rule and limits of the linear solve.</summary>
public sealed record SolverOptions
{
    /// <summary>Target of ‖b − A x‖₂ / ‖b‖₂. Default 1e-10, which converges the flow rate (a sum of
    /// reactions) to better than 1e-6 relative on the sections tested.</summary>
    public double RelativeTolerance { get; init; } = 1e-10;

    /// <summary>Iteration cap. Default 20,000.</summary>
    public int MaxIterations { get; init; } = 20_000;

    /// <summary>Wall-clock budget; the solve throws when it is exceeded. Default none.</summary>
    public TimeSpan? TimeBudget { get; init; }
}
