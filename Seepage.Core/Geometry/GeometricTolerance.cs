namespace Seepage.Core.Geometry;

/// <summary>The two geometric tolerances of the pipeline, as fractions of a section's extent (the larger side of the
/// bounding box of its zones, m). Each is used for one job; no other fraction of the extent is written in Core.</summary>
public static class GeometricTolerance
{
    /// <summary>Input geometry, 1e-7 of the extent: the validator and the section graph treat points closer than this
    /// as one and a polyline this close to the domain boundary as lying on it. Far above the rounding of coordinates
    /// (about 1e-16 relative), far below any detail a section draws.</summary>
    public const double Input = 1e-7;

    /// <summary>Matching the mesh to the section, 1e-6 of the extent: boundary edges on a head, drain, exit or base
    /// polyline, a cutoff top on a floor, a point on a structure. Ten times <see cref="Input"/>, so everything the
    /// validator accepted as lying on a line is found on the mesh, whose nodes carry the rounding of refinement
    /// splits and of the slit duplication.</summary>
    public const double Match = 1e-6;
}
