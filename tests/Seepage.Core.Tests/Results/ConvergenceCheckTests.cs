using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Results;

public class ConvergenceCheckTests(Xunit.Abstractions.ITestOutputHelper output)
{
    // A sheet pile driven to half the depth of a layer (s/T = 1/2): the exact shape factor is
    // K(m′)/(2K(m)) = 1/2, so q = k·H/2 (Harr, "Groundwater and Seepage", 1962, ch. 5; m = m′ = sin 45°).
    // With quadratic elements the convergence check must run at order 2, and its error estimate must be honest:
    // the Richardson estimate lies closer to kH/2 than the analysis-mesh value, and the estimated error of the
    // analysis-mesh flow is within a factor of three of its true error against kH/2.
    [Trait("Category", "Slow")]
    [Fact]
    public void Run_QuadraticElements_ErrorEstimateMatchesExactFlow()
    {
        var doc = SheetPile(5, 10, 80, 4, size: 1.5) with { TruncationCheck = false };
        doc = doc with { Mesh = new() { Size = 1.5, Order = 2, ConvergenceCheck = true } };
        var result = Seepage.Core.Analysis.Run(Valid(doc));
        double exact = 1e-5 * 4 / 2;
        var flow = Assert.Single(result.Convergence!.Figures, f => f.Name == "flow");
        Print(result);
        double trueError = Math.Abs(flow.Values[0] / exact - 1);
        Assert.NotNull(flow.Extrapolated);
        Assert.True(Math.Abs(flow.Extrapolated!.Value / exact - 1) < trueError, "Richardson estimate closer to the exact flow");
        Assert.InRange(flow.EstimatedError / trueError, 1.0 / 3, 3);
    }

    // The same section with a coarse linear mesh: the check must warn, naming the figure, exactly for the figures
    // whose estimated error exceeds 2 % (the rule stated in the output; common practice for a mesh-sensitivity
    // study), and the estimate must again bracket the true flow error within a factor of three.
    [Fact]
    public void Run_CoarseLinearMesh_WarnsForFiguresOverTwoPercent()
    {
        var doc = SheetPile(5, 10, 80, 4, size: 8) with { TruncationCheck = false };
        doc = doc with { Mesh = new() { Size = 8, ConvergenceCheck = true } };
        var result = Seepage.Core.Analysis.Run(Valid(doc));
        Print(result);
        var figures = result.Convergence!.Figures;
        Assert.Contains(figures, f => f.EstimatedError > 0.02);
        foreach (var f in figures)
            Assert.Equal(f.EstimatedError > 0.02, result.Warnings.Any(w => w.StartsWith($"Convergence: the estimated error of {f.Name} ", StringComparison.Ordinal)));
        double exact = 1e-5 * 4 / 2;
        var flow = figures.Single(f => f.Name == "flow");
        Assert.InRange(flow.EstimatedError / Math.Abs(flow.Values[0] / exact - 1), 1.0 / 3, 3);
    }

    private void Print(AnalysisResult result)
    {
        output.WriteLine(string.Join(" / ", result.Convergence!.Triangles));
        foreach (var f in result.Convergence.Figures)
            output.WriteLine($"{f.Name}: {string.Join(", ", f.Values.Select(v => v.ToString("E6")))}; order {f.ObservedOrder:F3}; extrapolated {f.Extrapolated:E6}; error {f.EstimatedError:P3}");
    }
}
