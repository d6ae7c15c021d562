using Seepage.Core.Sections;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Analytic;

public class ConvergenceOrderTests
{
    // A smooth problem: a convex pentagon with fixed heads on its two vertical sides and no flow elsewhere; every
    // corner where a fixed head meets a no-flow side is at most 90°, so the head has no gradient singularity. The
    // discharge from consistent reactions then converges at O(h²) for linear elements (the flux error is of the
    // order of the energy error squared; e.g. Carey, Chow & Seager, "Approximate boundary-flux calculations",
    // Comput. Methods Appl. Mech. Eng. 50, 1985). The observed order over two uniform refinements must be 2 ± 0.3.
    [Fact]
    public void ConvergenceCheck_SmoothProblemLinearElements_FlowOrderNearTwo()
    {
        var doc = new SectionDocument
        {
            Soils = [new() { Id = "sand", Kx = 1e-5 }],
            Zones = [new() { Soil = "sand", Outline = [P(0, 0), P(0, -4), P(5, -7), P(10, -4), P(10, 0)] }],
            Heads = [new() { Name = "left", Along = [P(0, 0), P(0, -4)], Total = 3 }, new() { Name = "right", Along = [P(10, -4), P(10, 0)], Total = 0 }],
            Mesh = new() { Size = 1.0, ConvergenceCheck = true },
        };
        var options = new AnalysisOptions { Solver = new Seepage.Core.Solvers.SolverOptions { RelativeTolerance = 1e-12 } };
        var result = Seepage.Core.Analysis.Run(Valid(doc), options);
        var flow = Assert.Single(result.Convergence!.Figures, f => f.Name == "flow");
        Assert.True(flow.ObservedOrder is > 1.7 and < 2.3,
            $"observed order {flow.ObservedOrder:F3}; values {string.Join(", ", flow.Values.Select(v => v.ToString("E8")))}");
        Assert.True(flow.EstimatedError < 0.02);
    }
}
