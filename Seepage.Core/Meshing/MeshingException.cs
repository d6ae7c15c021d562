namespace Seepage.Core.Meshing;

/// <summary>Placeholder until the quality mesher lands on this branch.</summary>
public sealed class MeshingException(string message) : Exception(message);
