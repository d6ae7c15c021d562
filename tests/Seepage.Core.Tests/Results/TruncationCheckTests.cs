using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Results;

public class TruncationCheckTests
{
    // The lateral disturbance of a sheet pile in a layer of thickness T decays like exp(−πW/2T) (Harr, "Groundwater
    // and Seepage", 1962, ch. 5): with the boundaries 0.6T from the pile, pushing them out by half changes the flow
    // by far more than 1 %; at 8T the change is the discretisation noise between two meshes.
    [Theory]
    [InlineData(6, true)]
    [InlineData(80, false)]
    public void Run_LateralBoundaryDistance_WarnsOnlyWhenClose(double halfWidth, bool warns)
    {
        var doc = SheetPile(5, 10, halfWidth, 4) with { TruncationCheck = true };
        var result = Seepage.Core.Analysis.Run(Valid(doc));
        Assert.NotNull(result.Truncation);
        Assert.Equal(-1.5 * halfWidth, result.Truncation!.ExtendedLeftX, 1e-9);
        Assert.Equal(warns, result.Warnings.Any(w => w.StartsWith("Truncation:", StringComparison.Ordinal)));
        Assert.Equal(warns, Math.Abs(result.Truncation.Change) > 0.01);
    }

    // With quadratic elements the extra solve must use them too: at 8T the wider section's flow lies within 0.2 %
    // of the exact k·H/2 for s/T = 1/2 (Harr 1962, K(m′)/(2K(m)) = 1/2), where linear elements on this mesh are
    // about 0.7 % high; at 0.6T the check still warns.
    [Trait("Category", "Slow")]
    [Theory]
    [InlineData(6, true)]
    [InlineData(80, false)]
    public void Run_QuadraticElements_ExtraSolveAtOrderTwo(double halfWidth, bool warns)
    {
        var doc = SheetPile(5, 10, halfWidth, 4) with { TruncationCheck = true };
        doc = doc with { Mesh = new() { Size = 0.5, Order = 2 } };
        var result = Seepage.Core.Analysis.Run(Valid(doc));
        Assert.NotNull(result.Truncation);
        Assert.Equal(warns, result.Warnings.Any(w => w.StartsWith("Truncation:", StringComparison.Ordinal)));
        if (!warns)
            Assert.True(Math.Abs(result.Truncation!.ExtendedFlow / (1e-5 * 4 / 2) - 1) < 0.002, $"wider flow {result.Truncation.ExtendedFlow:E6}");
    }
}
