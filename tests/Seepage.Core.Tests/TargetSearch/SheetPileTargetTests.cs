using System.Text.Json;
using System.Text.Json.Nodes;
using Seepage.Core.Sections;
using Seepage.Core.Studies;
using Seepage.Core.TargetSearch;
using Seepage.Core.Tests.Support;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.TargetSearch;

public class SheetPileTargetTests(Xunit.Abstractions.ITestOutputHelper output)
{
    // Single sheet pile of penetration s in a layer of thickness T (Harr, "Groundwater and Seepage", 1962, ch. 5): the exit
    // gradient at the downstream face is i_E = πH / (4T·K(m)·m), m = sin(πs/2T). With Gs = 2.65, e = 0.65 the critical
    // gradient is (Gs − 1)/(1 + e) = 1.0 (Terzaghi 1943), so a required factor F needs i_E(s) = 1/F; the depth is solved
    // here independently as the root of the closed form by bisection. The FE uses quadratic elements and averages over
    // 0.1 m (the averaged gradient differs from the point value by O((d/T)²)).
    private const double T = 10, H = 4, Width = 80, Required = 2.2;

    private static double ClosedFormGradient(double s)
    {
        double m = Math.Sin(Math.PI * s / (2 * T));
        return Math.PI * H / (4 * T * Elliptic.K(m) * m);
    }

    private static double ClosedFormDepth(double factor)
    {
        double lo = 0.1, hi = 9.9; // i_E falls as s grows
        for (int i = 0; i < 200; i++)
        {
            double mid = 0.5 * (lo + hi);
            if (ClosedFormGradient(mid) > 1 / factor) lo = mid; else hi = mid;
        }
        return 0.5 * (lo + hi);
    }

    private static JsonNode Base(int order, double size) => JsonSerializer.SerializeToNode(SheetPile(3, T, Width, H, size: size) with
    {
        Mesh = new() { Size = size, Order = order },
        ExitCheck = new() { Along = [P(0, 0), P(Width, 0)], Depth = 0.1, RequiredFactor = Required },
        TruncationCheck = false,
    }, new JsonSerializerOptions(JsonSerializerDefaults.Web) { DefaultIgnoreCondition = System.Text.Json.Serialization.JsonIgnoreCondition.WhenWritingNull })!;

    private static TargetSearchResult Search(JsonNode section, TargetRequirements require, int scan)
    {
        var search = new Seepage.Core.TargetSearch.TargetSearch("/cutoffs/0/tip/1", -1, -6, require,
            Seepage.Core.TargetSearch.TargetSearch.DefaultTolerance(-1, -6), scan);
        var options = new AnalysisOptions { FlowNet = false };
        string json = section.ToJsonString();
        return TargetSearcher.Run(search, v => TargetEvaluator.Evaluate(json, search, v, options, default).Point);
    }

    [Trait("Category", "Slow")] // a long design run
    [Fact]
    public void Run_RequiredExitFactor_FindsClosedFormDepthWithinTolerance()
    {
        double exact = ClosedFormDepth(Required);
        var result = Search(Base(2, 0.5), new TargetRequirements(ExitFactor: Required), 5);

        Assert.True(result.Feasible, result.Message);
        Assert.Equal("exitFactor", result.Governing);
        Assert.Equal(0.05, result.Tolerance, 12);
        double found = -result.Value!.Value;
        Assert.True(Math.Abs(found - exact) <= result.Tolerance,
            $"search {found:F4} m, closed-form root {exact:F4} m, difference {found - exact:F4} m; {result.Message}");
        // The reported value was analysed and passes; a point within the tolerance shallower fails.
        output.WriteLine(FormattableString.Invariant(
            $"closed-form depth {exact:F4} m, search {found:F4} m ({result.Points.Count} analyses), difference {found - exact:F4} m"));
        var at = result.Points.Single(p => p.Value == result.Value);
        Assert.True(at.Feasible && at.Row.ExitFactor >= Required);
        Assert.Contains(result.Points, p => !p.Feasible && p.Value > result.Value && p.Value - result.Value <= result.Tolerance + 1e-12);
        Assert.True(result.Monotone);
        Assert.Single(result.Intervals);
    }

    [Fact]
    public void Run_RequirementNoDepthMeets_AnswersInfeasibleWithBestMargin()
    {
        var result = Search(Base(1, 1.0), new TargetRequirements(ExitFactor: 50), 3);

        Assert.False(result.Feasible);
        Assert.Null(result.Value);
        Assert.Empty(result.Intervals);
        Assert.Equal("exitFactor", result.Governing);
        Assert.NotNull(result.BestMargin);
        Assert.True(result.BestMargin < 0);
        Assert.Equal(-6, result.BestValue!.Value, 9); // the deepest pile comes closest
        Assert.Contains("No value of /cutoffs/0/tip/1", result.Message);
        Assert.Contains("best margin", result.Message);
    }
}
