namespace Seepage.Core.Solvers;

/// <summary>What the linear solve did: method, preconditioner levels and operator complexity (1 for
/// single-level preconditioners, dimensionless), iterations, final relative residual ‖b − A x‖₂/‖b‖₂,
/// wall time in seconds (setup and iterations) and the number of unknowns.</summary>
public sealed record SolveReport(
    string Method,
    int Levels,
    double OperatorComplexity,
    int Iterations,
    double Residual,
    double Seconds,
    int Unknowns)
{
    /// <summary>Wall time of the preconditioner setup, seconds (included in <see cref="Seconds"/>).</summary>
    public double SetupSeconds { get; init; }
}
