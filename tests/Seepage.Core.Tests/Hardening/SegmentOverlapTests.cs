using Seepage.Core.Geometry;

namespace Seepage.Core.Tests.Hardening;

public class SegmentOverlapTests
{
    [Theory]
    [InlineData(0, 0, 10, 0, 5, 0, 15, 0, 5, 10)] // shifted along the line
    [InlineData(0, 0, 10, 0, 10, 0, 2, 0, 2, 10)] // reversed, inside
    [InlineData(0, 0, 0, -5, 0, -1, 0, -6, 1, 5)] // vertical, as cutoffs (lengths from the first end)
    public void Of_CollinearSegments_CommonStretch(double ax0, double ay0, double ax1, double ay1, double bx0, double by0,
        double bx1, double by1, double from, double to)
    {
        var common = SegmentOverlap.Of(new(ax0, ay0), new(ax1, ay1), new(bx0, by0), new(bx1, by1), 1e-9);
        Assert.NotNull(common);
        var a0 = new Point2(ax0, ay0);
        Assert.Equal(from, common!.Value.From.DistanceTo(a0), 9);
        Assert.Equal(to, common.Value.To.DistanceTo(a0), 9);
    }

    [Theory]
    [InlineData(0, 0, 10, 0, 10, 0, 20, 0)] // touching end to end
    [InlineData(0, 0, 10, 0, 5, -5, 5, 5)] // crossing
    [InlineData(0, 0, 10, 0, 0, 1e-3, 10, 1e-3)] // parallel, apart
    public void Of_NotSharingAStretch_Null(double ax0, double ay0, double ax1, double ay1, double bx0, double by0, double bx1, double by1) =>
        Assert.Null(SegmentOverlap.Of(new(ax0, ay0), new(ax1, ay1), new(bx0, by0), new(bx1, by1), 1e-9));
}
