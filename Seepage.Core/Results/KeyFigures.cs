using Seepage.Core.Fem;
using Seepage.Core.Sections;

namespace Seepage.Core.Results;

/// <summary>The key figures of one solution used to compare meshes or sections: discharge (m³/s per m), maximum
/// exit gradient averaged over the exit depth (dimensionless, null without an exit) and total uplift force on all
/// structures (kN/m, null without structures).</summary>
public sealed record KeyFigures(double Flow, double? ExitGradient, double? UpliftForce)
{
    public static KeyFigures Of(SectionModel section, FieldSolution s)
    {
        double tolerance = section.MatchTolerance;
        var (flow, _) = FlowCalculator.Compute(s.System, s.Field.Heads, s.Boundary, section, tolerance, s.Quadratic);
        var sampler = new FieldSampler(s.Field);
        var exit = ExitGradientCalculator.Compute(section, sampler, s.Boundary, tolerance, []);
        double? uplift = section.Structures.Count > 0
            ? UpliftCalculator.Compute(section, s.Field, s.Boundary, tolerance).Sum(u => u.Force) : null;
        return new KeyFigures(flow.PerMetre, exit?.MaxGradient, uplift);
    }
}
