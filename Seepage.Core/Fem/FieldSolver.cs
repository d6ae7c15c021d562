using Seepage.Core.Meshing;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;

namespace Seepage.Core.Fem;

/// <summary>One solved head problem on one mesh: the boundary, the unknowns (linear or quadratic), the fixed heads,
/// the condensed system K_FF h_F = −K_FD h_D with the full K for reactions, the head field and the solver report.</summary>
public sealed record FieldSolution(Mesh Mesh, MeshBoundary Boundary, QuadraticDofs? Quadratic, FixedHeads FixedHeads,
    LinearSystem System, HeadField Field, SolveReport Report);

/// <summary>The assembled, not yet solved head problem: boundary, unknowns, fixed heads, condensed system, zone tensors.</summary>
public sealed record AssembledProblem(MeshBoundary Boundary, QuadraticDofs? Quadratic, FixedHeads FixedHeads, LinearSystem System,
    IReadOnlyList<ConductivityTensor> Tensors);

/// <summary>Assembles and solves the head problem of a section on a given mesh with elements of order 1 or 2.</summary>
public static class FieldSolver
{
    public static FieldSolution Solve(SectionModel section, Mesh mesh, int order, SolverOptions options,
        CancellationToken cancellation = default) =>
        Solve(Assemble(section, mesh, order), mesh, options, cancellation);

    /// <summary>Solves an assembled head problem on its mesh.</summary>
    public static FieldSolution Solve(AssembledProblem problem, Mesh mesh, SolverOptions options, CancellationToken cancellation = default)
    {
        var (boundary, quadratic, fixedHeads, system, tensors) = problem;
        var free = new double[system.Matrix.Size];
        var report = LinearSolver.Solve(system.Matrix, system.Rhs, free, options, cancellation);
        var heads = system.Expand(free);
        return new FieldSolution(mesh, boundary, quadratic, fixedHeads, system, new HeadField(mesh, heads, tensors, quadratic), report);
    }

    /// <summary>Builds K (all unknowns), fixes the heads and condenses to the SPD system K_FF h_F = −K_FD h_D.</summary>
    public static AssembledProblem Assemble(SectionModel section, Mesh mesh, int order)
    {
        var tensors = section.Zones.Select(z => ConductivityTensor.Of(section.Soils[z.Soil])).ToList();
        var boundary = new MeshBoundary(mesh);
        double tolerance = section.MatchTolerance;
        var quadratic = order == 2 ? new QuadraticDofs(mesh) : null;
        var fixedHeads = FixedHeadBuilder.Build(mesh, boundary, section, tolerance, quadratic);
        var full = quadratic is null
            ? GlobalAssembler.Assemble(mesh, SparsityPattern.Of(mesh), tensors)
            : GlobalAssembler.AssembleQuadratic(mesh, quadratic, SparsityPattern.Of(quadratic.Count, quadratic.Elements, 6), tensors);
        return new AssembledProblem(boundary, quadratic, fixedHeads, LinearSystem.Condense(full, fixedHeads), tensors);
    }
}
