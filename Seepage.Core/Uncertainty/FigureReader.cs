using Seepage.Core.Fem;
using Seepage.Core.Meshing;
using Seepage.Core.Results;
using Seepage.Core.Sections;

namespace Seepage.Core.Uncertainty;

/// <summary>The key figures of a solved head field, by the same calculators as a full analysis (flow from the reactions,
/// uplift, averaged exit gradient, Terzaghi's prism) but without the flow net, hand methods and verification re-runs.</summary>
internal static class FigureReader
{
    public static SampleFigures Read(SectionModel section, Mesh mesh, MeshBoundary boundary, QuadraticDofs? quadratic,
        LinearSystem system, double[] heads, IReadOnlyList<ConductivityTensor> tensors)
    {
        double tolerance = section.MatchTolerance;
        var field = new HeadField(mesh, heads, tensors, quadratic);
        var (flow, _) = FlowCalculator.Compute(system, heads, boundary, section, tolerance, quadratic);
        var sampler = new FieldSampler(field);
        var notes = new List<string>();
        var uplift = UpliftCalculator.Compute(section, field, boundary, tolerance);
        var exit = ExitGradientCalculator.Compute(section, sampler, boundary, tolerance, notes);
        var heave = HeaveCalculator.Compute(section, sampler, notes).Where(h => h.Factor is not null).OrderBy(h => h.Factor).FirstOrDefault();
        return new SampleFigures(flow.PerMetre, uplift.Count == 0 ? null : uplift.Sum(u => u.Force), exit?.MaxGradient, exit?.Factor,
            section.ExitCheck.RequiredFactor, heave?.Factor, section.HeaveRequiredFactor);
    }
}
