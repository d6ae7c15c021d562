using Seepage.Core.Geometry;
using Seepage.Core.Meshing;

namespace Seepage.Core.Tests.Meshing;

public class SizeControlTests
{
    // Refinement stops when √3·R ≤ h at the centroid, and the longest edge of a triangle is at most 2R,
    // so every edge is at most 2/√3 ≈ 1.155 times the wanted size there (elementary geometry).
    // Zone 1 (below y = −6) asks for zoneSize; zone 0 grades from zoneSize at the interface by (G − 1)·distance.
    private static double Wanted(double x, double y, int zone, double size, double zoneSize, Point2 target, double targetSize, double grading)
    {
        double h = zone == 1 ? Math.Min(size, zoneSize) : Math.Min(size, zoneSize + (grading - 1) * Math.Abs(y + 6));
        return Math.Min(h, targetSize + (grading - 1) * new Point2(x, y).DistanceTo(target));
    }

    [Fact]
    public void Build_ZoneSizeAndTarget_EdgesWithinWantedSize()
    {
        var section = new LayeredSection { Left = -20, Right = 20, Bottom = -12, Interfaces = { -6 }, Cutoffs = { (0, -3) } };
        var g = section.Build();
        var target = new Point2(0, -3);
        var regions = g.Regions.Select(r => r.Zone == 1 ? r with { Size = 0.5 } : r).ToList();
        g = g with { Regions = regions, RefineNear = new[] { new SizeTarget(target, 0.05) } };
        var options = new MeshOptions { Size = 2.0 };
        var mesh = QualityMesher.Build(g, options);
        double worstRatio = 0, smallestNearTip = double.MaxValue;
        for (int t = 0; t < mesh.TriangleCount; t++)
        {
            var p = Enumerable.Range(0, 3).Select(i => new Point2(mesh.X[mesh.Triangles[3 * t + i]], mesh.Y[mesh.Triangles[3 * t + i]])).ToArray();
            double cx = p.Average(q => q.X), cy = p.Average(q => q.Y);
            double longest = Enumerable.Range(0, 3).Max(i => p[i].DistanceTo(p[(i + 1) % 3]));
            worstRatio = Math.Max(worstRatio, longest / Wanted(cx, cy, mesh.Zones[t], 2.0, 0.5, target, 0.05, options.Grading));
            if (p.Any(q => q.DistanceTo(target) < 1e-12)) smallestNearTip = Math.Min(smallestNearTip, longest);
        }
        Assert.True(worstRatio <= 2 / Math.Sqrt(3) + 1e-9, $"edge/size ratio {worstRatio}");
        Assert.True(smallestNearTip <= 0.06, $"edges at the tip {smallestNearTip}");
        // Graded, not jumping: just above the interface zone 0 is nearly as fine as zone 1.
        double nearInterface = 0;
        for (int t = 0; t < mesh.TriangleCount; t++)
        {
            if (mesh.Zones[t] != 0) continue;
            var idx = Enumerable.Range(0, 3).Select(i => mesh.Triangles[3 * t + i]).ToArray();
            if (!idx.Any(v => Math.Abs(mesh.Y[v] + 6) < 1e-12)) continue;
            nearInterface = Math.Max(nearInterface, Enumerable.Range(0, 3).Max(i => Math.Sqrt(Math.Pow(mesh.X[idx[i]] - mesh.X[idx[(i + 1) % 3]], 2) + Math.Pow(mesh.Y[idx[i]] - mesh.Y[idx[(i + 1) % 3]], 2))));
        }
        Assert.True(nearInterface <= 1.0, $"zone 0 edges at the interface {nearInterface}");
    }
}
