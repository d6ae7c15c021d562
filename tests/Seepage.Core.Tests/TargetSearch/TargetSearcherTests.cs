using Seepage.Core.Studies;
using Seepage.Core.TargetSearch;

namespace Seepage.Core.Tests.TargetSearch;

public class TargetSearcherTests
{
    // A synthetic response (no FE): the factor against piping as a given function of the member, so the search logic is
    // checked against roots known exactly.
    private static TargetPoint Point(double x, Func<double, double> factor)
    {
        var row = new StudyRow(0, "p", [], 1e-5, 100, 0.3, factor(x), 3, null, 1.5, null, 0, null);
        return new TargetPoint(x, row, new TargetRequirements(ExitFactor: 3).Margins(row));
    }

    private static Seepage.Core.TargetSearch.TargetSearch Range(double from, double to, int scan = 9) =>
        new("/x", from, to, new TargetRequirements(ExitFactor: 3), 1e-3, scan);

    [Fact]
    public void Run_MonotoneResponse_BisectsToTheRootWithinTolerance()
    {
        // factor = 1 + x: F = 3 at x = 2.
        var result = TargetSearcher.Run(Range(0, 10), x => Point(x, v => 1 + v));
        Assert.True(result.Feasible);
        Assert.True(result.Value >= 2 && result.Value - 2 <= 1e-3, $"{result.Value}");
        Assert.True(result.Monotone);
    }

    [Fact]
    public void Run_LeastCostEndFeasible_ReturnsTheEnd()
    {
        var result = TargetSearcher.Run(Range(5, 10), x => Point(x, v => 1 + v));
        Assert.Equal(5, result.Value);
        Assert.Equal(9, result.Points.Count); // the scan alone
    }

    [Fact]
    public void Run_NonMonotoneResponse_ReportsEveryFeasibleInterval()
    {
        // factor = 3 + 2 cos(x): met where cos x ≥ 0, i.e. [0, π/2] and [3π/2, 5π/2] over [0, 8].
        var result = TargetSearcher.Run(Range(0, 8, 17), x => Point(x, v => 3 + 2 * Math.Cos(v)));
        Assert.False(result.Monotone);
        Assert.Equal(0, result.Value);
        Assert.Equal(2, result.Intervals.Count);
        Assert.True(Math.Abs(result.Intervals[0].To - Math.PI / 2) <= 1e-3, $"{result.Intervals[0]}");
        Assert.True(Math.Abs(result.Intervals[1].From - 1.5 * Math.PI) <= 1e-3, $"{result.Intervals[1]}");
        Assert.True(Math.Abs(result.Intervals[1].To - 2.5 * Math.PI) <= 1e-3, $"{result.Intervals[1]}");
        Assert.Contains(result.Notes, n => n.Contains("not monotone"));
    }

    [Theory]
    [InlineData(new[] { 1.0, 2, 3, 4 }, true)]
    [InlineData(new[] { 4.0, 3, 3.01, 1 }, true)] // a wiggle within 2 % of the spread is noise
    [InlineData(new[] { 1.0, 3, 2, 4 }, false)]
    public void Monotone_Sequences_DetectsDirectionChanges(double[] values, bool expected) =>
        Assert.Equal(expected, TargetSearcher.Monotone(values.Select(v => (double?)v).ToList()));

    // The synthetic rows carry no heave factor: a default heave requirement is left out with a note, a posted one makes
    // every point fail, also with the note.
    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public void Run_RequirementTheSectionCannotCheck_DroppedOnlyWhenDefaulted(bool defaulted)
    {
        var require = new TargetRequirements(ExitFactor: 3, HeaveFactor: 1.5);
        var search = new Seepage.Core.TargetSearch.TargetSearch("/x", 0, 10, require, 1e-3, 5, defaulted);
        var result = TargetSearcher.Run(search, x =>
        {
            var row = new StudyRow(0, "p", [], 1e-5, 100, 0.3, 1 + x, 3, null, 1.5, null, 0, null);
            return new TargetPoint(x, row, require.Margins(row));
        });
        Assert.Contains(result.Notes, n => n.StartsWith("heaveFactor could not be checked"));
        Assert.Equal(defaulted, result.Feasible);
        Assert.Equal(defaulted ? null : 1.5, result.Require.HeaveFactor);
        if (defaulted) Assert.True(result.Value >= 2 && result.Value - 2 <= 1e-3, $"{result.Value}");
    }
}
