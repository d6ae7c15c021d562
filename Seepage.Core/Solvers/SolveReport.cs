namespace Seepage.Core.Solvers;

/// <summary>What the linear solve did: method, preconditioner levels and operator complexity (1 for
/// single-level preconditioners), iterations, final relative residual and wall time in seconds.</summary>
public sealed record SolveReport(
    string Method,
    int Levels,
    double OperatorComplexity,
    int Iterations,
    double Residual,
    double Seconds,
    int Unknowns);
