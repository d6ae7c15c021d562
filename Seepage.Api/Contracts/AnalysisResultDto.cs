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
    double Seconds);

/// <summary>Seepage discharge per metre of structure. <c>perMetre</c>, <c>inflow</c>, <c>outflow</c> in m³/s per m;
/// <c>balance</c> = (inflow − outflow) / inflow, dimensionless.</summary>
public sealed record FlowDto(double PerMetre, string Unit, double Inflow, double Outflow, double Balance,
    double PerMetrePerDay, double LitresPerMinutePerMetre, IReadOnlyList<BoundaryFlowDto> Boundaries);

/// <summary>Flow through one head or drain boundary, m³/s per m, positive into the soil.</summary>
public sealed record BoundaryFlowDto(string Name, string Kind, double Flow);

/// <summary>Uplift under one structure: stations (x, y in m, total head in m, pore pressure in kPa),
/// resultant force in kN/m, its x position in m.</summary>
public sealed record UpliftDto(string Structure, IReadOnlyList<UpliftStationDto> Stations, double Force, double CentroidX,
    double MomentAboutDownstreamToe);

public sealed record UpliftStationDto(double X, double Y, double Head, double Pressure);

/// <summary>Exit gradient check. Gradients dimensionless; <c>at</c> = [x, y] in m; <c>depth</c> in m.</summary>
public sealed record ExitDto(double MaxGradient, double[] At, double CriticalGradient, double Factor, double RequiredFactor,
    bool Pass, double Depth, string Method, IReadOnlyList<ExitProfilePointDto> Profile);

public sealed record ExitProfilePointDto(double X, double Gradient);

/// <summary>Heave check at a cutoff (Terzaghi's prism, width D/2): depth D in m, average excess head in m.</summary>
public sealed record HeaveDto(string Cutoff, double Depth, double AverageExcessHead, double Factor, double RequiredFactor, bool Pass);

/// <summary>Hand creep checks beside the FE results (lengths in m, ratios dimensionless).</summary>
public sealed record CreepDto(CreepCheckDto Lane, CreepCheckDto Bligh);

public sealed record CreepCheckDto(double WeightedLength, double Ratio, double? Required, bool? Pass, string Source);

/// <summary>Mesh statistics: counts, angles in degrees, mesh time in seconds.</summary>
public sealed record MeshStatsDto(int Nodes, int Triangles, double MinAngle, double MaxAngle, int[] MinAngleHistogram, double Seconds);

/// <summary>Linear solver report: iterations, final relative residual, wall time in seconds.</summary>
public sealed record SolverStatsDto(string Method, int Levels, double OperatorComplexity, int Unknowns, int Iterations, double Residual, double Seconds);
