using Seepage.Core.Geometry;

namespace Seepage.Core.Sections;

/// <summary>
/// A validated section: conductivities in m/s, lengths and elevations in metres, heads in metres of total head,
/// unit weight of water in kN/m³. Zone outlines are counter-clockwise without a closing point. Built only by
/// <see cref="SectionValidator"/>.
/// </summary>
public sealed record SectionModel(
    string Title,
    double WaterUnitWeight,
    IReadOnlyList<Soil> Soils,
    IReadOnlyList<Zone> Zones,
    IReadOnlyList<Structure> Structures,
    IReadOnlyList<Cutoff> Cutoffs,
    IReadOnlyList<HeadBoundary> Heads,
    IReadOnlyList<DrainBoundary> Drains,
    ExitCheck ExitCheck,
    double HeaveRequiredFactor,
    MeshSettings Mesh,
    double? StructureLength,
    IReadOnlyList<string> Warnings)
{
    /// <summary>Largest extent of the domain, metres.</summary>
    public double Extent
    {
        get
        {
            var pts = Zones.SelectMany(z => z.Outline).ToList();
            return Math.Max(pts.Max(p => p.X) - pts.Min(p => p.X), pts.Max(p => p.Y) - pts.Min(p => p.Y));
        }
    }

    /// <summary>Flow gauges (polylines across the section, m). Empty when none are given.</summary>
    public IReadOnlyList<Gauge> Gauges { get; init; } = [];

    /// <summary>Whether to check the truncation of the lateral boundaries by one extra solve on a wider section.
    /// Null means "automatically for small models".</summary>
    public bool? TruncationCheck { get; init; }

    /// <summary>Whether the phreatic surface is unknown (unconfined flow). Default false.</summary>
    public bool Unconfined { get; init; }

    /// <summary>Potential seepage faces: boundary polylines (m) where water may leave at h = y.</summary>
    public IReadOnlyList<SeepageFace> SeepageFaces { get; init; } = [];

    /// <summary>Head drops Nd of the flow net from <c>flowNet.headDrops</c>; null chooses Nd for square cells.</summary>
    public int? FlowNetHeadDrops { get; init; }

    /// <summary>The section document as analysed: in metres and kN/m³, every default the analysis uses filled in.</summary>
    public SectionDocument? Analysed { get; init; }

    /// <summary>Each value the analysis used for a member with a default, and whether it was given or defaulted.</summary>
    public IReadOnlyList<Assumption> Assumptions { get; init; } = [];

    /// <summary>Tolerance of the input geometry, metres (<see cref="GeometricTolerance.Input"/> of the extent).</summary>
    public double Tolerance => GeometricTolerance.Input * Extent;

    /// <summary>Tolerance for finding section polylines and points on the mesh, metres
    /// (<see cref="GeometricTolerance.Match"/> of the extent).</summary>
    public double MatchTolerance => GeometricTolerance.Match * Extent;
}

/// <summary>A soil. Kx, Ky in m/s along and across the bedding; BeddingAngle in degrees counter-clockwise from +x.</summary>
public sealed record Soil(string Id, double Kx, double Ky, double BeddingAngle, double? SpecificGravity, double? VoidRatio,
    double? SaturatedUnitWeight, string? CreepClass);

/// <summary>A zone of one soil (index into <see cref="SectionModel.Soils"/>); Size is an optional edge length in m.</summary>
public sealed record Zone(int Soil, IReadOnlyList<Point2> Outline, double? Size);

/// <summary>The base of an impervious structure, a polyline on the domain boundary (m).</summary>
public sealed record Structure(string Name, IReadOnlyList<Point2> Base);

/// <summary>A zero-thickness impervious cutoff wall from Top to Tip (m).</summary>
public sealed record Cutoff(string Name, Point2 Top, Point2 Tip)
{
    /// <summary>Length of the wall, m.</summary>
    public double Length => Top.DistanceTo(Tip);
}

/// <summary>A fixed total head (m) along a boundary polyline.</summary>
public sealed record HeadBoundary(string Name, IReadOnlyList<Point2> Along, double Total);

/// <summary>A drain along a boundary polyline: pore pressure zero, so total head equals elevation.</summary>
public sealed record DrainBoundary(string Name, IReadOnlyList<Point2> Along)
{
    /// <summary>True when the drain runs (in part) inside the domain rather than along its boundary: an internal
    /// constraint of the mesh taking water from both sides (a chimney filter, a blanket on a zone interface).</summary>
    public bool Internal { get; init; }
}

/// <summary>The exit check: exit surface (polyline, m), averaging depth (m), required factor against piping.</summary>
public sealed record ExitCheck(IReadOnlyList<Point2> Along, double Depth, double RequiredFactor, bool AlongGiven);

/// <summary>Mesh request: target edge length (m) and smallest angle (degrees).</summary>
public sealed record MeshSettings(double Size, double MinAngle)
{
    /// <summary>Element order: 1 (linear, default) or 2 (quadratic).</summary>
    public int Order { get; init; } = 1;

    /// <summary>Whether to solve on two uniform refinements and report the convergence of the key figures.</summary>
    public bool ConvergenceCheck { get; init; }
}

/// <summary>A flow gauge: a named polyline (m) across the section.</summary>
public sealed record Gauge(string Name, IReadOnlyList<Point2> Along);
