using Seepage.Core.Fem;
using Seepage.Core.Results;
using Seepage.Core.Solvers;
using Seepage.Core.Unconfined;
using Xunit.Abstractions;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Unconfined;

public class DupuitExperimentTests(ITestOutputHelper output)
{
    [Theory]
    [InlineData(0.5, 1e-5, 0.005)]
    [InlineData(0.25, 1e-5, 0.005)]
    [InlineData(0.25, 1e-5, 0.0)]
    public void Experiment(double size, double floor, double band)
    {
        var section = Valid(Dams.Rectangular(10, 2, 10, 1e-5, size));
        var mesh = Seepage.Core.Analysis.MakeMesh(section, []);
        var clock = System.Diagnostics.Stopwatch.StartNew();
        var u = UnconfinedSolver.Solve(section, mesh, new UnconfinedOptions { Floor = floor, BandFraction = band }, new SolverOptions());
        var s = u.Solution;
        var (flow, _) = FlowCalculator.Compute(s.System, s.Field.Heads, s.Boundary, section, 1e-6 * section.Extent);
        double q = 1e-5 * (100 - 4) / 20;
        output.WriteLine($"nodes {mesh.NodeCount} iters {u.Report.Iterations} lin {u.Report.LinearIterations} q {flow.PerMetre:E6} err {(flow.PerMetre / q - 1):P3} bal {flow.Balance:E2} {clock.Elapsed.TotalSeconds:F2}s");
    }
}
