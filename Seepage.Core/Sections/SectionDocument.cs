using System.Text.Json.Serialization;

namespace Seepage.Core.Sections;

/// <summary>
/// The section document exactly as posted (public contract; names fixed by the design). Every member is
/// optional here so that the validator, not the parser, reports what is missing. Points are [x, y] in metres.
/// </summary>
public sealed record SectionDocument
{
    public string? Title { get; init; }
    /// <summary>Free text describing the scenario (optional).</summary>
    public string? Description { get; init; }
    /// <summary>Unit of kx, ky: "m/s" (default), "cm/s", "m/day", "ft/day" or "ft/min".</summary>
    public string? ConductivityUnit { get; init; }
    /// <summary>Unit of every coordinate, size, depth and head: "m" (default) or "ft". Converted to metres at validation.</summary>
    public string? LengthUnit { get; init; }
    /// <summary>Unit of waterUnitWeight and the saturated unit weights: "kN/m3" (default) or "pcf" (lbf/ft³).</summary>
    public string? UnitWeightUnit { get; init; }
    /// <summary>Unit weight of water in unitWeightUnit (kN/m³ by default). Default 9.81 kN/m³.</summary>
    [InUnitWeightUnit]
    public double? WaterUnitWeight { get; init; }
    public List<SoilDocument>? Soils { get; init; }
    public List<ZoneDocument>? Zones { get; init; }
    public List<StructureDocument>? Structures { get; init; }
    public List<CutoffDocument>? Cutoffs { get; init; }
    public List<HeadDocument>? Heads { get; init; }
    public List<DrainDocument>? Drains { get; init; }
    public ExitCheckDocument? ExitCheck { get; init; }
    public HeaveCheckDocument? HeaveCheck { get; init; }
    public MeshDocument? Mesh { get; init; }
    /// <summary>Length of the structure along its axis, metres (optional; gives total flow).</summary>
    [InLengthUnit]
    public double? StructureLength { get; init; }
    /// <summary>Flow gauges: polylines across the section whose crossing flow (m³/s per m) is reported (optional).</summary>
    public List<GaugeDocument>? Gauges { get; init; }
    /// <summary>When true, one extra solve on the section with its lateral boundaries pushed out by half their
    /// distance from the structures tells whether the truncation changes the flow by more than 1% (default false;
    /// done automatically for models of fewer than 20,000 triangles).</summary>
    public bool? TruncationCheck { get; init; }
    /// <summary>When true the upper limit of the saturated flow (the phreatic surface) is unknown and found by the
    /// analysis; soil above it carries no flow. Default false (confined flow, every soil saturated).</summary>
    public bool? Unconfined { get; init; }
    /// <summary>Boundary polylines where water may leave at atmospheric pressure (unconfined sections).</summary>
    public List<SeepageFaceDocument>? SeepageFaces { get; init; }
    /// <summary>Flow-net drawing options (optional).</summary>
    public FlowNetDocument? FlowNet { get; init; }
    /// <summary>Title block of the design memo: project, job number, prepared/checked by, revision (optional).</summary>
    public TitleBlockDocument? TitleBlock { get; init; }

    /// <summary>Extension members (names starting with "x-"): kept with the posted section, ignored by the analysis.
    /// Any other unknown member is refused by <see cref="SectionParser"/>.</summary>
    [JsonExtensionData]
    public Dictionary<string, object>? Extra { get; init; }
}

/// <summary>A soil: conductivities kx, ky in <see cref="SectionDocument.ConductivityUnit"/> (ky defaults to kx),
/// bedding angle in degrees counter-clockwise from +x, specific gravity of solids and void ratio for the
/// critical gradient, saturated unit weight kN/m³ (optional), creep class for the hand creep checks.</summary>
public sealed record SoilDocument
{
    public string? Id { get; init; }
    public double? Kx { get; init; }
    public double? Ky { get; init; }
    public double? BeddingAngle { get; init; }
    public double? SpecificGravity { get; init; }
    public double? VoidRatio { get; init; }
    [InUnitWeightUnit]
    public double? SaturatedUnitWeight { get; init; }
    public string? CreepClass { get; init; }
}

/// <summary>A zone: a soil id and a closed outline (list of [x, y], m; closing point optional);
/// optional size is the target edge length in m inside it.</summary>
public sealed record ZoneDocument
{
    public string? Soil { get; init; }
    public List<double[]>? Outline { get; init; }
    [InLengthUnit]
    public double? Size { get; init; }
}

/// <summary>Where an impervious structure meets soil: a polyline on the domain boundary.</summary>
public sealed record StructureDocument
{
    public string? Name { get; init; }
    public List<double[]>? Base { get; init; }
}

/// <summary>A cutoff wall from top to tip (m). Zero thickness and impervious unless thickness and kx are given.</summary>
public sealed record CutoffDocument
{
    public string? Name { get; init; }
    public double[]? Top { get; init; }
    public double[]? Tip { get; init; }
    [InLengthUnit]
    public double? Thickness { get; init; }
    public double? Kx { get; init; }
}

/// <summary>A fixed total head (m) along a polyline of the domain boundary.</summary>
public sealed record HeadDocument
{
    public string? Name { get; init; }
    public List<double[]>? Along { get; init; }
    [InLengthUnit]
    public double? Total { get; init; }
}

/// <summary>A drain: atmospheric pressure (h = y) along a polyline of the domain boundary.</summary>
public sealed record DrainDocument
{
    public string? Name { get; init; }
    public List<double[]>? Along { get; init; }
}

/// <summary>Exit gradient check: exit surface polyline (defaults to the tailwater boundary), averaging depth in m
/// (default 0.5 m), required factor of safety against piping (default 3.0).</summary>
public sealed record ExitCheckDocument
{
    public List<double[]>? Along { get; init; }
    [InLengthUnit]
    public double? Depth { get; init; }
    public double? RequiredFactor { get; init; }
}

/// <summary>Heave check at cutoffs: required factor (default 1.5).</summary>
public sealed record HeaveCheckDocument
{
    public double? RequiredFactor { get; init; }
}

/// <summary>Mesh request: target edge length in m (default: the domain's larger extent / 100, at most a third of the shortest cutoff),
/// minimum angle in degrees (default 28).</summary>
public sealed record MeshDocument
{
    [InLengthUnit]
    public double? Size { get; init; }
    public double? MinAngle { get; init; }
    /// <summary>Polynomial order of the elements: 1 (linear triangles, default) or 2 (quadratic triangles with
    /// mid-edge nodes, for accurate gradients).</summary>
    public int? Order { get; init; }
    /// <summary>When true, the section is also solved on two uniform refinements of the mesh (each triangle split
    /// into four) and the flow, the maximum exit gradient and the uplift force are reported with their observed
    /// order and a Richardson estimate of the error. Default false.</summary>
    public bool? ConvergenceCheck { get; init; }
}

/// <summary>A flow gauge: a polyline across the section (list of [x, y], m); the flow crossing it is reported in
/// m³/s per m, positive along the normal that points 90° counter-clockwise from the walking direction.</summary>
public sealed record GaugeDocument
{
    public string? Name { get; init; }
    public List<double[]>? Along { get; init; }
}
