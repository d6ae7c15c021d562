namespace Seepage.Core.Solvers;

/// <summary>Thrown when a system is refused before the first iteration: a diagonal entry that is not positive and
/// finite (so the matrix cannot be symmetric positive definite), or a right-hand side that is not finite.
/// Unlike <see cref="SolverNotConvergedException"/> no iteration ran; the fault is in the assembled system, not
/// the solve.</summary>
public sealed class MatrixRefusedException(string method, string reason)
    : Exception($"{method} refused the system before solving: {reason}.")
{
    /// <summary>The solver that refused the system.</summary>
    public string Method { get; } = method;

    /// <summary>Why, naming the row or entry concerned.</summary>
    public string Reason { get; } = reason;
}
