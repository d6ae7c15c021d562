namespace Seepage.Core.Solvers;

/// <summary>z = M⁻¹ r for a symmetric positive definite approximation M of A.</summary>
public interface IPreconditioner
{
    string Name { get; }
    int Levels { get; }
    double OperatorComplexity { get; }
    void Apply(ReadOnlySpan<double> r, Span<double> z);
}
