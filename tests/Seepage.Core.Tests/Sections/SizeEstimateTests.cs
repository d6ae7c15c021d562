using Seepage.Core.Sections;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Sections;

public class SizeEstimateTests
{
    [Theory]
    [InlineData(0.5)]
    [InlineData(1.0)]
    [InlineData(0.25)]
    public void Of_SheetPile_WithinFifteenPercentOfTheMesh(double size)
    {
        var model = Valid(SheetPile(5, 10, 40, 4, size: size));
        var estimate = SizeEstimate.Of(model);
        var result = Seepage.Core.Analysis.Run(model, new AnalysisOptions { FlowNet = false });
        double ratio = (double)estimate.Triangles / result.Mesh.TriangleCount;
        Assert.True(ratio is > 0.85 and < 1.15, $"estimate {estimate.Triangles}, mesh {result.Mesh.TriangleCount}");
        Assert.True(Math.Abs((double)estimate.Unknowns / result.Mesh.NodeCount - 1) < 0.2, $"{estimate.Unknowns} vs {result.Mesh.NodeCount} nodes");
        Assert.Equal(1, estimate.Multiplier, 2);
    }

    [Fact]
    public void Of_OrderTwoWithConvergenceCheck_MultipliesTheLargestSolveBySixtyFour()
    {
        // Quadratic triangles: about 4 unknowns per P1 node; two uniform refinements: 16 times the triangles.
        var doc = SheetPile(5, 10, 40, 4, size: 0.5);
        var estimate = SizeEstimate.Of(Valid(doc with { Mesh = doc.Mesh! with { Order = 2, ConvergenceCheck = true } }));
        Assert.InRange(estimate.Multiplier, 60, 68);
    }
}
