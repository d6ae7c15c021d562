namespace Seepage.Core.Meshing;

/// <summary>Placeholder until the quality mesher lands on this branch.</summary>
public static class QualityMesher
{
    public static Mesh Build(PlanarGraph graph, MeshOptions options, CancellationToken cancellation = default) =>
        throw new MeshingException("The mesher is not on this branch yet.");
}
