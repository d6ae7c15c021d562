namespace Seepage.Core.Meshing;

/// <summary>Thrown by <see cref="QualityMesher"/> for input it cannot resolve (crossing segments, seeds
/// outside every closed region, a mesh larger than <see cref="MeshOptions.MaxTriangles"/>). The message
/// names the offending features by their vertex or segment indices in the <see cref="PlanarGraph"/>.</summary>
public sealed class MeshingException : Exception
{
    public MeshingException(string message) : base(message) { }
}
