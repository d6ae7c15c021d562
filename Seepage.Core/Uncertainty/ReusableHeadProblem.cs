using Seepage.Core.Fem;
using Seepage.Core.Meshing;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;

namespace Seepage.Core.Uncertainty;

/// <summary>
/// The head problem of one geometry, kept for many samples that change only conductivities and heads: the mesh, its
/// boundary, the unknown numbering and the CSR sparsity pattern are built once; each sample re-assembles the values of K
/// for its own zone tensors, fixes its heads, condenses K_FF h_F = −K_FD h_D and solves by CG to the usual tolerance.
/// The preconditioner is the AMG hierarchy of a centre section (the variables at their medians): any SPD
/// preconditioner gives the same converged answer, and one close to every sample's K costs a few more iterations instead of
/// a new setup per sample. A sample whose CG does not converge within <see cref="ReuseIterations"/> with it is solved again
/// with its own hierarchy.
/// </summary>
public sealed class ReusableHeadProblem
{
    private readonly SparsityPattern _pattern;
    // An AMG hierarchy holds work vectors, so each concurrent sample takes its own copy from the pool (built on demand
    // from the centre matrix: at most one per worker thread).
    private readonly System.Collections.Concurrent.ConcurrentBag<IPreconditioner> _pool = [];
    private CsrMatrix? _centre;
    private SolverOptions _centreOptions = new();
    private readonly double[][]? _unitValues;

    /// <summary>Largest number of stored unit-tensor values (3 per zone per nonzero) for assembly by linear combination.</summary>
    public const long MaxUnitValues = 20_000_000;

    /// <summary>Iteration cap of CG with the shared hierarchy before a sample gets its own.</summary>
    public const int ReuseIterations = 200;

    public ReusableHeadProblem(SectionModel section, CancellationToken cancellation = default)
    {
        Mesh = Analysis.MakeMesh(section, [], cancellation);
        Boundary = new MeshBoundary(Mesh);
        Quadratic = section.Mesh.Order == 2 ? new QuadraticDofs(Mesh) : null;
        _pattern = Quadratic is null ? SparsityPattern.Of(Mesh) : SparsityPattern.Of(Quadratic.Count, Quadratic.Elements, 6);
        // The element matrices are linear in the tensor, k_e(K) = Kxx k_e(1,0,0) + Kxy k_e(0,1,0) + Kyy k_e(0,0,1), so K of any
        // zone tensors is a combination of 3 per-zone unit assemblies, stored when they fit.
        int zones = section.Zones.Count;
        if (3L * zones * _pattern.Columns.Length > MaxUnitValues) return;
        _unitValues = new double[3 * zones][];
        for (int z = 0; z < zones; z++)
            for (int c = 0; c < 3; c++)
            {
                var unit = new ConductivityTensor(c == 0 ? 1 : 0, c == 1 ? 1 : 0, c == 2 ? 1 : 0);
                var tensors = Enumerable.Range(0, zones).Select(i => i == z ? unit : default).ToList();
                _unitValues[3 * z + c] = AssembleElements(tensors).Values;
            }
    }

    public Mesh Mesh { get; }
    public MeshBoundary Boundary { get; }
    public QuadraticDofs? Quadratic { get; }

    /// <summary>The zone tensors of a section (m/s).</summary>
    public static IReadOnlyList<ConductivityTensor> Tensors(SectionModel section) =>
        section.Zones.Select(z => ConductivityTensor.Of(section.Soils[z.Soil])).ToList();

    /// <summary>The full K for the section's conductivities, values only (the pattern is shared).</summary>
    public CsrMatrix Assemble(IReadOnlyList<ConductivityTensor> tensors)
    {
        if (_unitValues is null) return AssembleElements(tensors);
        var values = new double[_pattern.Columns.Length];
        for (int z = 0; z < tensors.Count; z++)
        {
            var t = tensors[z];
            Span<double> coefficients = [t.Kxx, t.Kxy, t.Kyy];
            for (int c = 0; c < 3; c++)
            {
                double a = coefficients[c];
                if (a == 0) continue;
                var unit = _unitValues[3 * z + c];
                for (int k = 0; k < values.Length; k++) values[k] += a * unit[k];
            }
        }
        return new CsrMatrix(_pattern.Size, _pattern.RowStart, _pattern.Columns, values);
    }

    private CsrMatrix AssembleElements(IReadOnlyList<ConductivityTensor> tensors) => Quadratic is null
        ? GlobalAssembler.Assemble(Mesh, _pattern, tensors)
        : GlobalAssembler.AssembleQuadratic(Mesh, Quadratic, _pattern, tensors);

    /// <summary>The fixed heads of a section with this geometry.</summary>
    public FixedHeads FixedHeads(SectionModel section) =>
        FixedHeadBuilder.Build(Mesh, Boundary, section, section.MatchTolerance, Quadratic);

    private bool SolvedWithShared(LinearSystem system, double[] free, SolverOptions options, CancellationToken cancellation)
    {
        if (_centre is null) return false;
        if (!_pool.TryTake(out var shared)) shared = new AlgebraicMultigridPreconditioner(_centre, _centreOptions, cancellation);
        try
        {
            ConjugateGradient.Solve(system.Matrix, system.Rhs, free, shared, options with { MaxIterations = ReuseIterations }, cancellation);
            return true;
        }
        catch (SolverNotConvergedException) { return false; }
        finally { _pool.Add(shared); }
    }

    /// <summary>Builds the shared AMG hierarchy from the centre section's K_FF.</summary>
    public void SharePreconditioner(SectionModel centre, SolverOptions options, CancellationToken cancellation)
    {
        var system = LinearSystem.Condense(Assemble(Tensors(centre)), FixedHeads(centre));
        if (system.Matrix.Size == 0) return;
        _centre = system.Matrix;
        _centreOptions = options;
        _pool.Add(new AlgebraicMultigridPreconditioner(_centre, options, cancellation));
    }

    /// <summary>Assembles, solves and reads the figures of one sample with this geometry.</summary>
    public SampleFigures Evaluate(SectionModel section, SolverOptions options, CancellationToken cancellation)
    {
        var tensors = Tensors(section);
        var system = LinearSystem.Condense(Assemble(tensors), FixedHeads(section));
        var free = new double[system.Matrix.Size];
        if (!SolvedWithShared(system, free, options, cancellation))
        {
            Array.Clear(free);
            LinearSolver.Solve(system.Matrix, system.Rhs, free, options, cancellation);
        }
        return FigureReader.Read(section, Mesh, Boundary, Quadratic, system, system.Expand(free), tensors);
    }
}
