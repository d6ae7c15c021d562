using Seepage.Core.Uncertainty;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Uncertainty;

public class HomogeneousSoilTests(Xunit.Abstractions.ITestOutputHelper output)
{
    // One homogeneous soil: the head field does not depend on k, so the flow is exactly proportional to k (Darcy's law;
    // Harr, "Groundwater and Seepage", 1962, ch. 1) and a lognormal k gives a lognormal flow with the same coefficient of
    // variation, while the exit gradient does not vary at all (its spread is round-off).
    [Trait("Category", "Slow")] // Monte Carlo design run
    [Fact]
    public void Run_LognormalK_FlowHasTheCovOfKAndExitGradientDoesNotVary()
    {
        var doc = SheetPile(4, 10, 40, 3, size: 1.0) with { TruncationCheck = false };
        const int n = 400;
        const double cov = 0.5;
        var study = new UncertaintyStudy([new UncertainVariable("/soils/0/kx", Distribution.LognormalOfMedian(1e-5, cov))], n, 11);
        var result = UncertaintySupport.Run(doc, study);

        Assert.Equal(n, result.Summary.Analysed);
        Assert.Equal(MemberKind.Conductivity, new SampleEvaluator(System.Text.Json.JsonSerializer.SerializeToNode(doc)!, Valid(doc),
            study.Variables, new(), default).Kind);
        var ratio = result.Samples.Select(s => s.Figures!.Flow / s.Values[0]).ToList();
        double spread = (ratio.Max() - ratio.Min()) / ratio.Average();
        Assert.True(spread < 1e-8, $"q/k varies by {spread:E2}");

        var k = FigureStatistics.Of(result.Samples.Select(s => s.Values[0]).ToList());
        var flow = result.Summary.Figures["flow"];
        Assert.Equal(k.Cov, flow.Cov, 1e-8);
        // The sample cov of k against the assumed 0.5: the standard error of a lognormal sample's cov at N = 400 is about
        // 5 %, so 15 % is three of them (Latin hypercube does better).
        output.WriteLine($"sample cov of k {k.Cov:F4}, of flow {flow.Cov:F4}, assumed {cov}");
        Assert.True(Math.Abs(flow.Cov / cov - 1) < 0.15, $"flow cov {flow.Cov:F4}");

        var gradient = result.Summary.Figures["maxExitGradient"];
        output.WriteLine($"exit gradient sd / mean {gradient.StandardDeviation / gradient.Mean:E2}");
        Assert.True(gradient.StandardDeviation / gradient.Mean < 1e-9, $"exit gradient sd/mean {gradient.StandardDeviation / gradient.Mean:E2}");
    }

    // The response is linear in the heads, so the superposition path must give what a full analysis gives.
    [Fact]
    public void Run_HeadVariable_SuperpositionMatchesFullAnalysis()
    {
        var doc = SheetPile(4, 10, 40, 3, size: 1.0) with { TruncationCheck = false };
        var study = new UncertaintyStudy([new UncertainVariable("/heads/0/total", Distribution.NormalOf(3, 0.5))], 5, 3);
        var result = UncertaintySupport.Run(doc, study);
        foreach (var s in result.Samples)
        {
            var changed = doc with { Heads = [doc.Heads![0] with { Total = s.Values[0] }, doc.Heads[1]] };
            var full = Analysis.Run(Valid(changed), new AnalysisOptions { FlowNet = false,
                Solver = new Seepage.Core.Solvers.SolverOptions { RelativeTolerance = 1e-12 } });
            Assert.Equal(1.0, s.Figures!.Flow / full.Flow.PerMetre, 1e-8);
            Assert.Equal(1.0, s.Figures.MaxExitGradient!.Value / full.Exit!.MaxGradient, 1e-8);
            Assert.Equal(1.0, s.Figures.HeaveFactor!.Value / full.Heave[0].Factor!.Value, 1e-8);
        }
    }
}
