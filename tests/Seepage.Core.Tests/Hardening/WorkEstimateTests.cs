using Seepage.Core.Sections;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Hardening;

/// <summary>The work estimate that admission control budgets must follow the real mesh: within a factor of 1.4 of the
/// triangles the mesher makes, zone sizes included (a tiny zones[].size used to slip past the estimate).</summary>
public class WorkEstimateTests
{
    private static SectionModel Design(Func<SectionDocument, SectionDocument> change)
    {
        string json = File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "design-example.section.json"));
        return Valid(change(SectionParser.Parse(json, out _)!));
    }

    [Theory]
    [InlineData(2.0, null)]
    [InlineData(0.6, null)]
    [InlineData(2.0, 0.4)]
    public void Of_DesignExample_WithinAFactorOfTheMesh(double size, double? zoneSize)
    {
        var section = Design(d => d with
        {
            Mesh = d.Mesh! with { Size = size },
            Zones = zoneSize is null ? d.Zones : [d.Zones![0] with { Size = zoneSize }, .. d.Zones!.Skip(1)],
        });
        var estimate = WorkEstimate.Of(section);
        int actual = Analysis.MakeMesh(section, []).TriangleCount;
        double ratio = estimate.Triangles / actual;
        Assert.True(ratio is > 1 / 1.4 and < 1.4, $"estimate {estimate.Triangles:N0} against {actual:N0} triangles (ratio {ratio:F2})");
    }

    [Fact]
    public void Exceeds_TinyZoneSize_NamesTheZone()
    {
        var section = Design(d => d with { Zones = [d.Zones![0] with { Size = 0.01 }, .. d.Zones!.Skip(1)] });
        var problem = WorkEstimate.Of(section).Exceeds(6e6, 2e6);
        Assert.Equal("/zones/0/size", problem?.Pointer);
    }

    [Fact]
    public void Of_ConvergenceCheckAndOrder2_MultiplyTheWork()
    {
        var plain = WorkEstimate.Of(Design(d => d with { Mesh = d.Mesh! with { Size = 1.0 }, TruncationCheck = false }));
        var order2 = WorkEstimate.Of(Design(d => d with { Mesh = d.Mesh! with { Size = 1.0, Order = 2 }, TruncationCheck = false }));
        var checkedRun = WorkEstimate.Of(Design(d => d with { Mesh = d.Mesh! with { Size = 1.0, ConvergenceCheck = true }, TruncationCheck = false }));
        Assert.Equal(4, order2.SolveUnknowns / plain.SolveUnknowns, 6);
        Assert.Equal(16, checkedRun.LargestSolveUnknowns / plain.SolveUnknowns, 6);
        Assert.True(checkedRun.TotalUnknowns > 20 * plain.SolveUnknowns);
        Assert.Equal("/mesh/convergenceCheck", checkedRun.Exceeds(15 * plain.SolveUnknowns, 1e12)?.Pointer);
    }
}
