namespace Seepage.Core.Solvers;

/// <summary>Stopping rule, limits and preconditioner choice of the linear solve.</summary>
public sealed record SolverOptions
{
    /// <summary>Target of ‖b − A x‖₂ / ‖b‖₂ (dimensionless). Default 1e-10. Convergence policy: the flow rate is
    /// a sum of reactions K_DI h_I + K_DD h_D. On a mostly no-flow test section (contrast 1e6, anisotropy 100)
    /// its error came out at about 0.3 × tolerance and the inflow/outflow imbalance at 1–2 × tolerance, so
    /// 1e-8 would already give the 1e-6 the results need. 1e-10 keeps a 10⁴ margin for sections not tried,
    /// at about 30 % more iterations. On layered sections it also reproduces Darcy's series formula to 1e-8.</summary>
    public double RelativeTolerance { get; init; } = 1e-10;

    /// <summary>Iteration cap. Default 20,000.</summary>
    public int MaxIterations { get; init; } = 20_000;

    /// <summary>Wall-clock budget for setup and iterations together; the solve throws
    /// <see cref="SolverNotConvergedException"/> when it is exceeded. Default none.</summary>
    public TimeSpan? TimeBudget { get; init; }

    /// <summary>Preconditioner. Default <see cref="PreconditionerKind.Auto"/> (smoothed-aggregation AMG).</summary>
    public PreconditionerKind Preconditioner { get; init; } = PreconditionerKind.Auto;

    /// <summary>AMG strength threshold θ on the finest level (dimensionless, halved on each coarser level).
    /// Default 0.08.</summary>
    public double StrengthThreshold { get; init; } = 0.08;

    /// <summary>AMG stops coarsening at this many rows and factors that level densely. Default 500;
    /// values above 4000 are not factored but smoothed.</summary>
    public int CoarsestSize { get; init; } = 500;
}
