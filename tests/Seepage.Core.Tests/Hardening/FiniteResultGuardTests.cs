using Seepage.Core.Results;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Hardening;

/// <summary>A result whose figures are not all finite is never reported: the guard names the first figure that is not.</summary>
public class FiniteResultGuardTests
{
    [Trait("Category", "Slow")] // a full analysis with its checks
    [Fact]
    public void Check_FiniteAnalysis_Passes()
    {
        var result = Analysis.Run(Valid(SheetPile(5, 10, 40, 4, size: 2)));
        FiniteResultGuard.Check(result);
    }

    [Fact]
    public void Check_InfiniteFigureDeepInTheResult_NamesIt()
    {
        var result = Analysis.Run(Valid(SheetPile(5, 10, 40, 4, size: 2)));
        var overflow = result with { Flow = result.Flow with { Inflow = double.PositiveInfinity } };
        Assert.Equal("/flow/inflow", Assert.Throws<NonFiniteResultException>(() => FiniteResultGuard.Check(overflow)).Member);
        var stations = result.Heave.Select(h => h with { AverageExcessHead = double.NaN }).ToList();
        if (stations.Count > 0)
            Assert.StartsWith("/heave/0/", Assert.Throws<NonFiniteResultException>(() => FiniteResultGuard.Check(result with { Heave = stations })).Member);
        result.Field.Heads[3] = double.NaN;
        Assert.Equal("/field/heads/3", Assert.Throws<NonFiniteResultException>(() => FiniteResultGuard.Check(result)).Member);
    }
}
