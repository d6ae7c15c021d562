namespace Seepage.Core.Solvers;

/// <summary>Thrown when the iterative solve stops before reaching its tolerance.</summary>
public sealed class SolverNotConvergedException(string method, int iterations, double residual, double tolerance, string reason)
    : Exception(FormattableString.Invariant(
        $"{method} did not converge: {reason} after {iterations} iterations, relative residual {residual:E3} (target {tolerance:E1})."))
{
    public string Method { get; } = method;
    public int Iterations { get; } = iterations;
    public double Residual { get; } = residual;
    public double Tolerance { get; } = tolerance;

    /// <summary>Why the solve stopped, e.g. "iteration cap reached" (NaN residuals above mean "not measured").</summary>
    public string Reason { get; } = reason;
}
