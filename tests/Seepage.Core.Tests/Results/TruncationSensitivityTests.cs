using Seepage.Core.Fem;
using Seepage.Core.Results;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Results;

public class TruncationSensitivityTests
{
    // A sheet pile (depth 5 m) in a 10 m layer between lateral boundaries at ±w: pushing them out by w/2 is the same
    // section at ±1.5w. The lateral disturbance decays with distance (Harr, "Groundwater and Seepage", 1962, ch. 5), so
    // the first-order estimate must bound the true change from above (less 0.2 %, the noise between two meshes) and
    // stay within three times it, from 19 % (w = 0.6T) down to a few tenths of a per cent.
    [Theory]
    [InlineData(6)]
    [InlineData(10)]
    [InlineData(15)]
    [InlineData(25)]
    public void Estimate_SheetPile_BoundsTheWiderSolveFromAbove(double halfWidth)
    {
        var model = Valid(SheetPile(5, 10, halfWidth, 4));
        var solution = FieldSolver.Solve(model, Seepage.Core.Analysis.MakeMesh(model, []), 1, new());
        double flow = KeyFigures.Of(model, solution).Flow;
        double? estimate = TruncationSensitivity.Estimate(model, solution, flow, -halfWidth, halfWidth, halfWidth / 2,
            halfWidth / 2, 1e-6 * model.Extent);
        var wide = Valid(SheetPile(5, 10, 1.5 * halfWidth, 4));
        double change = KeyFigures.Of(wide, FieldSolver.Solve(wide, Seepage.Core.Analysis.MakeMesh(wide, []), 1, new())).Flow / flow - 1;
        Assert.NotNull(estimate);
        Assert.True(estimate >= change - 0.002, $"estimate {estimate:E3} below the wider solve's change {change:E3}");
        Assert.True(estimate <= 3 * change + 0.002, $"estimate {estimate:E3} far above the wider solve's change {change:E3}");
    }

    // The design example's lateral boundaries are 68 m from the piles: the estimate answers without a second solve.
    [Fact]
    public void Run_DesignExample_SensitivityWithoutWarning()
    {
        var doc = Seepage.Core.Sections.SectionParser.Parse(File.ReadAllText("design-example.section.json"), out _)!;
        var result = Seepage.Core.Analysis.Run(Valid(doc));
        Assert.Equal(TruncationCheck.SensitivityMethod, result.Truncation!.Method);
        Assert.InRange(result.Truncation.Change, 0, TruncationCheck.WarningLevel);
    }

    // With a drain the energy is not the flow times one head difference: the check solves the wider section.
    [Fact]
    public void Run_WithDrain_FallsBackToWiderSolve()
    {
        var doc = SheetPile(5, 10, 40, 4, size: 1.0) with { TruncationCheck = true };
        doc = doc with { Drains = [new() { Name = "toe drain", Along = [P(30, 0), P(40, 0)] }],
            Heads = [doc.Heads![0], doc.Heads[1] with { Along = [P(0, 0), P(30, 0)] }] };
        var result = Seepage.Core.Analysis.Run(Valid(doc));
        Assert.Equal(TruncationCheck.WiderSolveMethod, result.Truncation!.Method);
    }
}
