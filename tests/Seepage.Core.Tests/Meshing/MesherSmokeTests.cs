using Seepage.Core.Meshing;

namespace Seepage.Core.Tests.Meshing;

public class MesherSmokeTests
{
    [Fact]
    public void Build_Rectangle_ProducesValidMesh()
    {
        var section = new LayeredSection { Left = -10, Right = 10, Bottom = -5 };
        var graph = section.Build();
        var mesh = QualityMesher.Build(graph, new MeshOptions { Size = 1.0 });
        Assert.Empty(MeshChecks.CounterClockwise(mesh));
        Assert.Equal(100.0, MeshChecks.ZoneAreas(mesh, 1)[0], 1e-9);
        Assert.True(mesh.Quality.MinAngle >= 28, $"min angle {mesh.Quality.MinAngle}");
    }
}
