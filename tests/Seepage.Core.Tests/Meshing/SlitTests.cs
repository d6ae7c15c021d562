using Seepage.Core.Meshing;

namespace Seepage.Core.Tests.Meshing;

public class SlitTests
{
    // Sheet pile from the ground at x = 0 to −6 m in a 40 m × 15 m section (invented geometry).
    private static LayeredSection SheetPile(double tip) =>
        new() { Left = -20, Right = 20, Bottom = -15, Cutoffs = { (0, tip) }, TipSize = 0.1 };

    [Fact]
    public void Build_SheetPile_NoEdgeCrossesAndFacesAreDistinctExceptTip()
    {
        var graph = SheetPile(-6).Build();
        var mesh = QualityMesher.Build(graph, new MeshOptions { Size = 1.0 });
        Assert.Empty(MeshChecks.SlitOpen(mesh, 0, -6, tipShared: true));
        // The tip is one node used on both sides; the top at the ground is two nodes.
        int tipNodes = Enumerable.Range(0, mesh.NodeCount).Count(v => Math.Abs(mesh.X[v]) < 1e-12 && Math.Abs(mesh.Y[v] + 6) < 1e-12);
        int topNodes = Enumerable.Range(0, mesh.NodeCount).Count(v => Math.Abs(mesh.X[v]) < 1e-12 && Math.Abs(mesh.Y[v]) < 1e-12);
        Assert.Equal(1, tipNodes);
        Assert.Equal(2, topNodes);
        Assert.Empty(mesh.Warnings);
    }

    [Fact]
    public void Build_SheetPile_WallFacesAreBoundaryEdges()
    {
        var mesh = QualityMesher.Build(SheetPile(-6).Build(), new MeshOptions { Size = 1.0 });
        // Count how many triangles use each undirected edge; edges on the wall must be used once.
        var uses = new Dictionary<(int, int), int>();
        for (int t = 0; t < mesh.TriangleCount; t++)
            for (int i = 0; i < 3; i++)
            {
                int a = mesh.Triangles[3 * t + i], b = mesh.Triangles[3 * t + (i + 1) % 3];
                var key = (Math.Min(a, b), Math.Max(a, b));
                uses[key] = uses.GetValueOrDefault(key) + 1;
            }
        double wallLength = 0;
        foreach (var ((a, b), n) in uses)
        {
            bool onWall = Math.Abs(mesh.X[a]) < 1e-12 && Math.Abs(mesh.X[b]) < 1e-12 && mesh.Y[a] >= -6 - 1e-12 && mesh.Y[b] >= -6 - 1e-12;
            if (!onWall) continue;
            Assert.Equal(1, n);
            wallLength += Math.Abs(mesh.Y[a] - mesh.Y[b]);
        }
        Assert.Equal(12.0, wallLength, 1e-9); // both faces of the 6 m wall
    }

    [Fact]
    public void Build_CutoffDownToBottom_WarnsThatFlowPathIsClosed()
    {
        var mesh = QualityMesher.Build(SheetPile(-15).Build(), new MeshOptions { Size = 1.5 });
        Assert.Contains(mesh.Warnings, w => w.Contains("closes the flow path"));
        Assert.Empty(MeshChecks.SlitOpen(mesh, 0, -15, tipShared: false));
        Assert.Equal(600.0, MeshChecks.ZoneAreas(mesh, 1)[0], 1e-9);
    }
}
