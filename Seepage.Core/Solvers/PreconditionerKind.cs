namespace Seepage.Core.Solvers;

/// <summary>Which preconditioner <see cref="LinearSolver"/> puts under conjugate gradients.</summary>
public enum PreconditionerKind
{
    /// <summary>The default: smoothed-aggregation AMG (iterations nearly independent of mesh size).</summary>
    Auto = 0,
    /// <summary>Smoothed-aggregation algebraic multigrid, V(1,1) cycle.</summary>
    AlgebraicMultigrid,
    /// <summary>Incomplete Cholesky without fill, IC(0): a serial fallback, iterations grow with the mesh.</summary>
    IncompleteCholesky,
    /// <summary>Diagonal scaling: the cheapest fallback, slowest to converge.</summary>
    Jacobi,
}
