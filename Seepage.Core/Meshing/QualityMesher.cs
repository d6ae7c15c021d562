using System.Diagnostics;

namespace Seepage.Core.Meshing;

/// <summary>
/// Quality triangular mesher: constrained Delaunay triangulation of the planar graph, Delaunay refinement
/// to the smallest angle and sizes asked for, slits opened into two faces, nodes in Hilbert order.
/// </summary>
/// <remarks>
/// Guarantees: every triangle is counter-clockwise with positive area (exact orientation test); every
/// segment is a union of mesh edges; each triangle's smallest angle is at least
/// <see cref="MeshOptions.MinAngle"/> except where input segments meet at a smaller angle (there the
/// triangles in that corner keep angles no smaller than the input angle allows); the same input gives the
/// same mesh node for node. Vertices closer than 1e-9 × the larger side of the bounding box are merged with
/// a warning in <see cref="Mesh.Warnings"/>.
/// </remarks>
public static class QualityMesher
{
    /// <summary>Meshes <paramref name="graph"/>. Throws <see cref="MeshingException"/> for input it cannot
    /// resolve and <see cref="ArgumentOutOfRangeException"/> for options outside their ranges.</summary>
    public static Mesh Build(PlanarGraph graph, MeshOptions options, CancellationToken cancellation = default)
    {
        ArgumentNullException.ThrowIfNull(graph);
        ArgumentNullException.ThrowIfNull(options);
        Validate(options);
        var clock = Stopwatch.StartNew();
        var clean = CleanGraph.From(graph);
        var warnings = new List<string>(clean.Warnings);
        var tri = InitialTriangulation.Build(clean, graph, warnings);
        cancellation.ThrowIfCancellationRequested();
        var size = new SizeField(graph, options);
        size.AddZoneInterfaces(tri, clean);
        var rules = new TriangleRules(tri, clean, size, options);
        double estimate = 0;
        for (int t = 0; t < tri.TriangleSlots; t++)
            if (tri.IsAlive(t)) estimate += size.EstimateTriangles(tri, t);
        tri.Reserve((int)Math.Min(1.25 * estimate + 64, Math.Min(options.MaxTriangles + 64.0, 1 << 26)));
        new Refiner(tri, rules, clean, options, cancellation).Run();
        SlitSplitter.Split(tri, clean, warnings);
        return MeshAssembler.Assemble(tri, warnings, 0, clock);
    }

    private static void Validate(MeshOptions options)
    {
        if (!(options.Size > 0) || !double.IsFinite(options.Size)) throw new ArgumentOutOfRangeException(nameof(options), options.Size, "Size must be a positive length in metres.");
        if (!(options.MinAngle >= 0 && options.MinAngle <= 33)) throw new ArgumentOutOfRangeException(nameof(options), options.MinAngle, "MinAngle must lie in 0–33 degrees.");
        if (!(options.Grading >= 1.05)) throw new ArgumentOutOfRangeException(nameof(options), options.Grading, "Grading must be at least 1.05.");
        if (options.MaxTriangles < 1) throw new ArgumentOutOfRangeException(nameof(options), options.MaxTriangles, "MaxTriangles must be positive.");
    }
}
