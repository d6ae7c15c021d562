using Seepage.Core.Fem;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;

namespace Seepage.Core.Uncertainty;

/// <summary>
/// Samples that change only heads (and data that do not enter K, such as unit weights) on fixed conductivities: the head
/// field is linear in the boundary heads, h = h₀ + Σⱼ Hⱼ (hⱼ − h₀), where h₀ solves the problem with every head boundary at
/// 0 (drains keep h = y) and hⱼ with boundary j at 1. The one matrix K_FF gets one AMG setup for these J + 1 solves; a
/// sample then costs a linear combination and the figures, no solve.
/// </summary>
public sealed class HeadSuperposition
{
    private readonly ReusableHeadProblem _problem;
    private readonly LinearSystem _system;
    private readonly double[] _zero;
    private readonly double[][] _unit;
    private readonly IReadOnlyList<ConductivityTensor> _tensors;

    public HeadSuperposition(ReusableHeadProblem problem, SectionModel section, SolverOptions options, CancellationToken cancellation)
    {
        _problem = problem;
        _tensors = ReusableHeadProblem.Tensors(section);
        var full = problem.Assemble(_tensors);
        int heads = section.Heads.Count;
        var zeroHeads = WithTotals(section, j => 0.0);
        _system = LinearSystem.Condense(full, problem.FixedHeads(zeroHeads));
        var preconditioner = new AlgebraicMultigridPreconditioner(_system.Matrix, options, cancellation);
        _zero = Solve(_system, preconditioner, options, cancellation);
        _unit = new double[heads][];
        for (int j = 0; j < heads; j++)
        {
            int unit = j;
            var system = LinearSystem.Condense(full, problem.FixedHeads(WithTotals(section, i => i == unit ? 1.0 : 0.0)));
            _unit[j] = Solve(system, preconditioner, options, cancellation);
        }
    }

    /// <summary>Figures of a sample that differs from the base section only in head totals and post-processing data.</summary>
    public SampleFigures Evaluate(SectionModel section)
    {
        var fixedHeads = _problem.FixedHeads(section);
        var heads = (double[])_zero.Clone();
        for (int j = 0; j < _unit.Length; j++)
        {
            double total = section.Heads[j].Total;
            var u = _unit[j];
            for (int i = 0; i < heads.Length; i++) heads[i] += total * (u[i] - _zero[i]);
        }
        // Fixed nodes take the sample's own values exactly; free nodes the superposed solution.
        for (int i = 0; i < heads.Length; i++) if (fixedHeads.IsFixed[i]) heads[i] = fixedHeads.Value[i];
        // The reactions need K and which nodes are fixed, both the same as the base system's.
        return FigureReader.Read(section, _problem.Mesh, _problem.Boundary, _problem.Quadratic, _system, heads, _tensors);
    }

    private static SectionModel WithTotals(SectionModel section, Func<int, double> total) =>
        section with { Heads = section.Heads.Select((h, j) => h with { Total = total(j) }).ToList() };

    // Full nodal heads (fixed values included) of one condensed system, preconditioned by the shared AMG hierarchy.
    private static double[] Solve(LinearSystem system, IPreconditioner preconditioner, SolverOptions options, CancellationToken cancellation)
    {
        var free = new double[system.Matrix.Size];
        ConjugateGradient.Solve(system.Matrix, system.Rhs, free, preconditioner, options, cancellation);
        return system.Expand(free);
    }
}
