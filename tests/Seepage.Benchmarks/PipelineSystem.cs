using Seepage.Core;
using Seepage.Core.Fem;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;

namespace Seepage.Benchmarks;

/// <summary>The head system of the shared design example section (two layers, two cutoffs, heads on the
/// ground line) built by the real pipeline stages — quality mesher, P1 assembly, condensation — at a mesh
/// size chosen for about the requested number of unknowns. Used by <c>solve --source pipeline</c>.</summary>
internal static class PipelineSystem
{
    /// <summary>Mesh size 0.42 m gave 51,872 unknowns on this section; unknowns scale as size⁻².</summary>
    private const double ReferenceSize = 0.42, ReferenceUnknowns = 51_872;

    public static (CsrMatrix Matrix, double[] Rhs) Build(int unknowns, string sectionPath)
    {
        var doc = SectionParser.Parse(File.ReadAllText(sectionPath), out var problems)
            ?? throw new InvalidOperationException($"section not readable: {string.Join("; ", problems)}");
        var model = SectionValidator.Validate(doc).Model ?? throw new InvalidOperationException("section not valid");
        double size = ReferenceSize * Math.Sqrt(ReferenceUnknowns / unknowns);
        model = model with { Mesh = model.Mesh with { Size = size } };
        var mesh = Analysis.MakeMesh(model, new List<string>());
        var tensors = model.Zones.Select(z => ConductivityTensor.Of(model.Soils[z.Soil])).ToList();
        var boundary = new MeshBoundary(mesh);
        var fixedHeads = FixedHeadBuilder.Build(mesh, boundary, model, 1e-6 * model.Extent, null);
        var system = LinearSystem.Condense(GlobalAssembler.Assemble(mesh, SparsityPattern.Of(mesh), tensors), fixedHeads);
        return (system.Matrix, system.Rhs);
    }
}
