using Seepage.Core.Geometry;
using Seepage.Core.Meshing;

namespace Seepage.Core.Tests.Meshing;

public class MesherRobustnessTests
{
    private static PlanarGraph Polygon(IReadOnlyList<Point2> outline, Point2 seed)
    {
        var segments = Enumerable.Range(0, outline.Count).Select(i => new GraphSegment(i, (i + 1) % outline.Count)).ToList();
        return new PlanarGraph(outline, segments, new[] { new RegionSeed(seed, 0, null) }, Array.Empty<Slit>(), Array.Empty<SizeTarget>());
    }

    private static double Area(Mesh m) => MeshChecks.ZoneAreas(m, m.Zones.Max() + 1).Sum();

    [Trait("Category", "Slow")]
    [Fact]
    public void Build_ThinLayer_TerminatesWithValidMesh()
    {
        // A 1 mm layer between two thick ones.
        var section = new LayeredSection { Left = -10, Right = 10, Bottom = -10, Interfaces = { -5, -5.001 } };
        var mesh = QualityMesher.Build(section.Build(), new MeshOptions { Size = 1.0 });
        Assert.Empty(MeshChecks.CounterClockwise(mesh));
        Assert.Equal(20 * 0.001, MeshChecks.ZoneAreas(mesh, 3)[1], 1e-9);
        Assert.True(mesh.Quality.MinAngle >= 28);
    }

    [Fact]
    public void Build_NearlyCollinearBoundaryVertex_TerminatesWithValidMesh()
    {
        // The middle vertex of the bottom edge is 1e-11 m off the straight line.
        var outline = new[] { new Point2(0, 0), new Point2(5, -1e-11), new Point2(10, 0), new Point2(10, 4), new Point2(0, 4) };
        var mesh = QualityMesher.Build(Polygon(outline, new Point2(5, 2)), new MeshOptions { Size = 1.0 });
        Assert.Empty(MeshChecks.CounterClockwise(mesh));
        Assert.Empty(MeshChecks.NoNodeInside(mesh));
        Assert.Equal(40.0 + 5e-11, Area(mesh), 1e-9);
    }

    [Fact]
    public void Build_NearDuplicateVertices_MergedWithWarning()
    {
        var outline = new List<Point2> { new(0, 0), new(10, 0), new(10, 4), new(10 - 1e-12, 4 + 1e-12), new(0, 4) };
        var mesh = QualityMesher.Build(Polygon(outline, new Point2(5, 2)), new MeshOptions { Size = 1.0 });
        Assert.Contains(mesh.Warnings, w => w.Contains("merged") && w.Contains("2") && w.Contains("3"));
        Assert.Equal(40.0, Area(mesh), 1e-9);
        Assert.True(mesh.Quality.MinAngle >= 28);
    }

    [Fact]
    public void Build_CrossingSegments_ThrowsNamingBoth()
    {
        var vertices = new[] { new Point2(0, 0), new Point2(10, 0), new Point2(10, 10), new Point2(0, 10), new Point2(2, 2), new Point2(8, 8), new Point2(2, 8), new Point2(8, 2) };
        var segments = new List<GraphSegment> { new(0, 1), new(1, 2), new(2, 3), new(3, 0), new(4, 5), new(6, 7) };
        var graph = new PlanarGraph(vertices, segments, new[] { new RegionSeed(new Point2(1, 5), 0, null) }, Array.Empty<Slit>(), Array.Empty<SizeTarget>());
        var error = Assert.Throws<MeshingException>(() => QualityMesher.Build(graph, new MeshOptions()));
        Assert.Contains("segment 5", error.Message);
        Assert.Contains("segment 4", error.Message);
    }

    [Fact]
    public void Build_SeedOutsideOutline_Throws()
    {
        var outline = new[] { new Point2(0, 0), new Point2(10, 0), new Point2(10, 4), new Point2(0, 4) };
        var error = Assert.Throws<MeshingException>(() => QualityMesher.Build(Polygon(outline, new Point2(20, 2)), new MeshOptions()));
        Assert.Contains("seed 0", error.Message);
    }

    [Fact]
    public void Build_MoreTrianglesThanCap_Throws()
    {
        var outline = new[] { new Point2(0, 0), new Point2(10, 0), new Point2(10, 4), new Point2(0, 4) };
        Assert.Throws<MeshingException>(() => QualityMesher.Build(Polygon(outline, new Point2(5, 2)), new MeshOptions { Size = 0.1, MaxTriangles = 1000 }));
    }

    [Fact]
    public void Build_TenDegreeWedge_TerminatesAndKeepsBoundAwayFromApex()
    {
        // Wedge with a 10° apex at the origin, 10 m long sides.
        double a = 10 * Math.PI / 180;
        var outline = new[] { new Point2(0, 0), new Point2(10, 0), new Point2(10 * Math.Cos(a), 10 * Math.Sin(a)) };
        var mesh = QualityMesher.Build(Polygon(outline, new Point2(6, 0.4)), new MeshOptions { Size = 0.5, MinAngle = 28 });
        Assert.Empty(MeshChecks.CounterClockwise(mesh));
        Assert.True(mesh.Quality.MinAngle >= 10 - 1e-6, $"min angle {mesh.Quality.MinAngle}");
        // Away from the apex (triangles with no node at the apex and not touching both sides) the bound holds.
        var worst = AnglesAwayFromApex(mesh);
        Assert.True(worst >= 28 - 1e-9, $"worst angle away from apex {worst}");
    }

    private static double AnglesAwayFromApex(Mesh m)
    {
        double worst = 180;
        for (int t = 0; t < m.TriangleCount; t++)
        {
            var p = Enumerable.Range(0, 3).Select(i => new Point2(m.X[m.Triangles[3 * t + i]], m.Y[m.Triangles[3 * t + i]])).ToArray();
            if (p.Min(q => q.Length) < 2.0) continue; // the refinement near the apex is allowed to stop
            for (int i = 0; i < 3; i++)
            {
                var u = p[(i + 1) % 3] - p[i]; var w = p[(i + 2) % 3] - p[i];
                double ang = Math.Acos((u.X * w.X + u.Y * w.Y) / (u.Length * w.Length)) * 180 / Math.PI;
                worst = Math.Min(worst, ang);
            }
        }
        return worst;
    }

    [Fact]
    public void Build_TwiceSameInput_IdenticalArrays()
    {
        var section = new LayeredSection { Interfaces = { -7 }, FloorEnds = { -8, 8 }, Cutoffs = { (-8, -5), (8, -9) }, TipSize = 0.2 };
        var graph = section.Build();
        var one = QualityMesher.Build(graph, new MeshOptions { Size = 1.0 });
        var two = QualityMesher.Build(graph, new MeshOptions { Size = 1.0 });
        Assert.Equal(one.X, two.X);
        Assert.Equal(one.Y, two.Y);
        Assert.Equal(one.Triangles, two.Triangles);
        Assert.Equal(one.Zones, two.Zones);
    }
}
