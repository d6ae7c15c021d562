namespace Seepage.Core.Meshing;

/// <summary>
/// An unstructured triangle mesh of the flow domain. Immutable once built.
/// </summary>
/// <remarks>
/// Node coordinates are in metres. <see cref="Triangles"/> holds three node indices per triangle,
/// counter-clockwise. Nodes on the two faces of a cutoff are distinct (the wall is a slit), so the
/// faces are boundary edges of the mesh.
/// </remarks>
public sealed class Mesh
{
    public Mesh(double[] x, double[] y, int[] triangles, int[] zones, MeshQuality quality, IReadOnlyList<string>? warnings = null)
    {
        if (x.Length != y.Length) throw new ArgumentException("x and y differ in length.");
        if (triangles.Length % 3 != 0) throw new ArgumentException("Triangle array length is not a multiple of 3.");
        if (zones.Length != triangles.Length / 3) throw new ArgumentException("One zone per triangle is needed.");
        X = x; Y = y; Triangles = triangles; Zones = zones; Quality = quality;
        Warnings = warnings ?? Array.Empty<string>();
    }

    /// <summary>What the mesher changed or noticed in the input (merged near-duplicate vertices, vertices
    /// found on segments, a cutoff that closes the flow path...). Empty when nothing was noticed.</summary>
    public IReadOnlyList<string> Warnings { get; }

    /// <summary>Node x coordinates, metres.</summary>
    public double[] X { get; }
    /// <summary>Node y coordinates (elevation), metres.</summary>
    public double[] Y { get; }
    /// <summary>Three node indices per triangle, counter-clockwise.</summary>
    public int[] Triangles { get; }
    /// <summary>Zone index (into the section's zones) of each triangle.</summary>
    public int[] Zones { get; }
    /// <summary>Quality report of the mesher.</summary>
    public MeshQuality Quality { get; }

    public int NodeCount => X.Length;
    public int TriangleCount => Zones.Length;
}
