using Seepage.Core.Geometry;

namespace Seepage.Core.Meshing;

/// <summary>
/// The planar straight-line graph handed to the mesher: vertices, constraint segments that the mesh must
/// contain as unions of edges, region seeds that tag zones, and slits (cutoff walls) whose nodes are split.
/// </summary>
/// <remarks>
/// Segments never cross each other except at shared vertices, and no vertex lies in the interior of a
/// segment (the builder splits them). Triangles reachable from a seed without crossing a segment get that
/// seed's zone; triangles reachable from no seed (outside the zones) are removed.
/// </remarks>
public sealed record PlanarGraph(
    IReadOnlyList<Point2> Vertices,
    IReadOnlyList<GraphSegment> Segments,
    IReadOnlyList<RegionSeed> Regions,
    IReadOnlyList<Slit> Slits,
    IReadOnlyList<SizeTarget> RefineNear)
{
    /// <summary>Internal constraint lines (chains of vertex indices, each consecutive pair also a segment) that lie
    /// inside a zone, such as a drain in an embankment: the mesh carries them as edges, but they part no zones
    /// (a region cut off only by them takes the zone across them) and their nodes are not split.</summary>
    public IReadOnlyList<InternalLine> InternalLines { get; init; } = [];
}

/// <summary>A constraint segment between two vertex indices of <see cref="PlanarGraph.Vertices"/>.</summary>
public readonly record struct GraphSegment(int A, int B);

/// <summary>A seed point inside a zone; <paramref name="Size"/> (metres, optional) caps the edge length there.</summary>
public sealed record RegionSeed(Point2 Point, int Zone, double? Size);

/// <summary>
/// A zero-thickness impervious wall given as a chain of vertex indices from its top to its tip; every
/// consecutive pair is also a segment of the graph. After triangulation the nodes along the chain are split
/// into two faces. The end vertices are split only where they lie on the outer boundary of the domain
/// (a cutoff's top at the ground or under a floor); an end inside the domain (the tip) stays shared.
/// </summary>
public sealed record Slit(IReadOnlyList<int> Chain);

/// <summary>A local size request: edge length <paramref name="Size"/> metres at <paramref name="Point"/>.</summary>
public sealed record SizeTarget(Point2 Point, double Size);

/// <summary>An internal constraint line inside a zone: a chain of vertex indices (see
/// <see cref="PlanarGraph.InternalLines"/>).</summary>
public sealed record InternalLine(IReadOnlyList<int> Chain);
