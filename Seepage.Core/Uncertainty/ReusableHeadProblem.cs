using Seepage.Core.Fem;
using Seepage.Core.Meshing;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;

namespace Seepage.Core.Uncertainty;

/// <summary>
/// The head problem of one geometry, kept for many samples that change only conductivities and heads: the mesh, its
/// boundary, the unknown numbering and the CSR sparsity pattern are built once; each sample re-assembles the values of K
/// for its own zone tensors, fixes its heads, condenses K_FF h_F = −K_FD h_D and solves (AMG-preconditioned CG).
/// </summary>
public sealed class ReusableHeadProblem
{
    private readonly SparsityPattern _pattern;

    public ReusableHeadProblem(SectionModel section, CancellationToken cancellation = default)
    {
        Mesh = Analysis.MakeMesh(section, [], cancellation);
        Boundary = new MeshBoundary(Mesh);
        Quadratic = section.Mesh.Order == 2 ? new QuadraticDofs(Mesh) : null;
        _pattern = Quadratic is null ? SparsityPattern.Of(Mesh) : SparsityPattern.Of(Quadratic.Count, Quadratic.Elements, 6);
    }

    public Mesh Mesh { get; }
    public MeshBoundary Boundary { get; }
    public QuadraticDofs? Quadratic { get; }

    /// <summary>The zone tensors of a section (m/s).</summary>
    public static IReadOnlyList<ConductivityTensor> Tensors(SectionModel section) =>
        section.Zones.Select(z => ConductivityTensor.Of(section.Soils[z.Soil])).ToList();

    /// <summary>The full K for the section's conductivities, values only (the pattern is shared).</summary>
    public CsrMatrix Assemble(IReadOnlyList<ConductivityTensor> tensors) => Quadratic is null
        ? GlobalAssembler.Assemble(Mesh, _pattern, tensors)
        : GlobalAssembler.AssembleQuadratic(Mesh, Quadratic, _pattern, tensors);

    /// <summary>The fixed heads of a section with this geometry.</summary>
    public FixedHeads FixedHeads(SectionModel section) =>
        FixedHeadBuilder.Build(Mesh, Boundary, section, 1e-6 * section.Extent, Quadratic);

    /// <summary>Assembles, solves and reads the figures of one sample with this geometry.</summary>
    public SampleFigures Evaluate(SectionModel section, SolverOptions options, CancellationToken cancellation)
    {
        var tensors = Tensors(section);
        var system = LinearSystem.Condense(Assemble(tensors), FixedHeads(section));
        var free = new double[system.Matrix.Size];
        LinearSolver.Solve(system.Matrix, system.Rhs, free, options, cancellation);
        return FigureReader.Read(section, Mesh, Boundary, Quadratic, system, system.Expand(free), tensors);
    }
}
