namespace Seepage.Api.Contracts;

/// <summary>The result document of one analysis (public contract; key names fixed).</summary>
public sealed record AnalysisResultDto(
    string Id,
    string Title,
    DateTimeOffset CreatedAt,
    FlowDto Flow,
    IReadOnlyList<UpliftDto> Uplift,
    ExitDto? Exit,
    IReadOnlyList<HeaveDto> Heave,
    CreepDto? Creep,
    MeshStatsDto Mesh,
    SolverStatsDto Solver,
    IReadOnlyList<string> Warnings,
    string Caution,
    double Seconds,
    IndependentVariablesDto? IndependentVariables = null,
    IReadOnlyList<GaugeDto>? Gauges = null,
    ConvergenceDto? Convergence = null,
    TruncationDto? Truncation = null,
    IReadOnlyList<CheckDto>? Checks = null,
    bool? Pass = null,
    IReadOnlyList<string>? PassCovers = null,
    System.Text.Json.Nodes.JsonNode? AnalysedSection = null,
    IReadOnlyList<AssumptionDto>? Assumptions = null,
    IReadOnlyList<PhreaticLineDto>? PhreaticSurface = null,
    IReadOnlyList<SeepageFaceDto>? SeepageFaces = null,
    UnconfinedDto? Unconfined = null,
    HandMethodsDto? HandMethods = null);


/// <summary>One check and its verdict (<c>pass</c> true/false, null without one), or <c>skipped</c>: why it did not run or
/// gave no verdict. The result's <c>pass</c> is false when any verdict fails, true when all pass, and covers the checks
/// listed in <c>passCovers</c> (those of exit, heave, lane, bligh that gave a verdict).</summary>
public sealed record CheckDto(string Check, bool? Pass, string? Skipped);

/// <summary>A value the analysis used: the member (JSON pointer), the value in <c>unit</c>, <c>origin</c> "given" or
/// "default", and a note.</summary>
public sealed record AssumptionDto(string Member, System.Text.Json.Nodes.JsonNode? Value, string Unit, string Origin, string Note);

/// <summary>Seepage discharge per metre of structure. <c>perMetre</c>, <c>inflow</c>, <c>outflow</c> in m³/s per m;
/// <c>balance</c> = (inflow − outflow) / inflow, dimensionless;
/// <c>structureLength</c> (m, from the section) gives <c>total</c> in m³/s and <c>totalPerDay</c> in m³/day.</summary>
public sealed record FlowDto(double PerMetre, string Unit, double Inflow, double Outflow, double Balance,
    double PerMetrePerDay, double LitresPerMinutePerMetre, IReadOnlyList<BoundaryFlowDto> Boundaries,
    double? StructureLength = null, double? Total = null, double? TotalPerDay = null);

/// <summary>Flow through one head, drain or seepage-face boundary (<c>kind</c>), m³/s per m, positive into the soil.</summary>
public sealed record BoundaryFlowDto(string Name, string Kind, double Flow);

/// <summary>Uplift under one structure: stations (x, y in m, total head in m, pore pressure in kPa),
/// resultant force in kN/m, its x position in m, moment about the downstream toe in kN·m/m;
/// <c>junctions</c>: the head at each cutoff meeting the base, per cent of the head difference, on both faces.</summary>
public sealed record UpliftDto(string Structure, IReadOnlyList<UpliftStationDto> Stations, double Force, double CentroidX,
    double MomentAboutDownstreamToe, double DownstreamToeX = 0, IReadOnlyList<UpliftJunctionDto>? Junctions = null);

public sealed record UpliftJunctionDto(string Cutoff, double X, double UpstreamFacePercent, double DownstreamFacePercent);

public sealed record UpliftStationDto(double X, double Y, double Head, double Pressure);

/// <summary>Exit gradient check (criticalGradient, factor, pass are null when the exit soil lacks Gs and e). Gradients dimensionless; <c>at</c> = [x, y] in m; <c>depth</c> in m.</summary>
/// <remarks><c>rowGradientAtMax</c>: the single-element-row gradient (boundary triangle's gradient · inward normal) at the
/// maximum; <c>maxRowGradient</c> at <c>maxRowAt</c>: the largest such value on the exit surface.
/// <c>allowableGradient</c> = criticalGradient / requiredFactor (null without a critical gradient).</remarks>
public sealed record ExitDto(double MaxGradient, double[] At, double? CriticalGradient, double? Factor, double RequiredFactor,
    bool? Pass, double Depth, string Method, IReadOnlyList<ExitProfilePointDto> Profile,
    double RowGradientAtMax = 0, double MaxRowGradient = 0, double[]? MaxRowAt = null, double? AllowableGradient = null);

/// <summary>Profile point: x in m, gradient averaged over the depth, rowGradient of the element row (dimensionless).</summary>
public sealed record ExitProfilePointDto(double X, double Gradient, double RowGradient = 0);

/// <summary>Heave check at a cutoff (Terzaghi's prism, width D/2): depth D in m, average excess head in m;
/// <c>prism</c> = [fromX, toX, surfaceY] in m;
/// <c>effectiveWeight</c> W′ = γ′·D·D/2 and <c>prismUpliftForce</c> U = γw·h_a·D/2 in kN/m, the water force on the
/// prism (not the uplift of a structure, which is <c>uplift[].force</c>). <c>upliftForce</c> is the same U under its
/// former name, kept readable for a deprecation period; read <c>prismUpliftForce</c>.</summary>
/// <remarks><c>skipped</c>: why the factor is not a heave verdict (a prism under a structure is not at an exit).</remarks>
public sealed record HeaveDto(string Cutoff, double Depth, double AverageExcessHead, double? Factor, double RequiredFactor, bool? Pass,
    double? EffectiveWeight = null,
    [property: Obsolete("The water force on the heave prism is prismUpliftForce; upliftForce is kept for a deprecation period.")]
    double UpliftForce = 0,
    double[]? Prism = null,
    double? PrismUpliftForce = null,
    string? Skipped = null)
{
    /// <summary>U = γw·h_a·D/2 on the prism, kN/m. A result stored before the name existed reads its upliftForce.</summary>
    public double? PrismUpliftForce { get; init; } = PrismUpliftForce ?? UpliftForce;
}

/// <summary>Hand creep checks beside the FE results (lengths in m, ratios dimensionless).</summary>
public sealed record CreepDto(CreepCheckDto Lane, CreepCheckDto Bligh);

/// <summary>A creep check: length in m, ratio, required ratio from the cited table; <c>skipped</c> says why there is none.</summary>
public sealed record CreepCheckDto(double WeightedLength, double Ratio, double? Required, bool? Pass, string Source, string? Skipped = null);

/// <summary>Mesh statistics: counts, angles in degrees, mesh time in seconds.</summary>
public sealed record MeshStatsDto(int Nodes, int Triangles, double MinAngle, double MaxAngle, int[] MinAngleHistogram, double Seconds);

/// <summary>Linear solver report: iterations, final relative residual, wall time in seconds.</summary>
public sealed record SolverStatsDto(string Method, int Levels, double OperatorComplexity, int Unknowns, int Iterations, double Residual, double Seconds);

/// <summary>Flow across a gauge polyline, m³/s per m (positive along the normal 90° counter-clockwise from the
/// walking direction); length of the polyline inside the soil in m. <c>method</c>: a gauge that parts the section is read
/// from the boundary fluxes of one side (conservative, balances with the boundary flows); one that ends inside the
/// soil from the element velocities along it. <c>lineIntegral</c>: the element-velocity integral, m³/s per m, for comparison.</summary>
public sealed record GaugeDto(string Name, double Flow, double Length, string Method, double LineIntegral);

/// <summary>Convergence over two uniform refinements: triangles of the three meshes and, per figure, the three values
/// (unit as named), the observed order, the Richardson estimate and the estimated relative error of the reported value.</summary>
public sealed record ConvergenceDto(int[] Triangles, IReadOnlyList<ConvergenceFigureDto> Figures);

public sealed record ConvergenceFigureDto(string Name, string Unit, double[] Values, double? ObservedOrder, double? Extrapolated, double EstimatedError);

/// <summary>Truncation check: lateral boundaries (x, m) before and after pushing them out, the flows (m³/s per m)
/// and the relative change; <c>method</c> says how: <c>sensitivity</c> (first-order estimate from the one solution, an
/// upper bound; extendedFlow = flow × (1 + change)) or <c>widerSolve</c> (the wider section meshed and solved).</summary>
public sealed record TruncationDto(double LeftX, double RightX, double ExtendedLeftX, double ExtendedRightX, double Flow,
    double ExtendedFlow, double Change, string Method);
