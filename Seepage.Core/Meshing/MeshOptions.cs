namespace Seepage.Core.Meshing;

/// <summary>Options of the mesher.</summary>
public sealed record MeshOptions
{
    /// <summary>Target edge length in metres away from refined spots. Default 1.0 m.
    /// A region seed's own size wins where it is smaller.</summary>
    public double Size { get; init; } = 1.0;

    /// <summary>Smallest triangle angle in degrees, 20–33 accepted. Default 28°. Not enforced at vertices
    /// where two input segments meet at a smaller angle.</summary>
    public double MinAngle { get; init; } = Sections.SectionDefaults.MinAngle;

    /// <summary>Edge length at singular points (cutoff tips, structure corners, ends of head boundaries)
    /// as a fraction of <see cref="Size"/>. Default 0.15.</summary>
    public double SingularRefinement { get; init; } = 0.15;

    /// <summary>Largest ratio of sizes of neighbouring triangles in the grading. Default 1.5.</summary>
    public double Grading { get; init; } = 1.5;

    /// <summary>Safety cap on the number of triangles. Default 6,000,000.</summary>
    public int MaxTriangles { get; init; } = 6_000_000;
}
