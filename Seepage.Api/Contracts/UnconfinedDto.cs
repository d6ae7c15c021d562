namespace Seepage.Api.Contracts;

/// <summary>How the phreatic surface of an unconfined section was found: Picard <c>iterations</c>, the <c>method</c> in
/// words (band and floor of the relative conductivity), <c>change</c> = the largest nodal head change of the last
/// iteration (m); <c>band</c> (m) and <c>floor</c> (dimensionless) as used, <c>linearIterations</c> summed, <c>seconds</c>.</summary>
public sealed record UnconfinedDto(int Iterations, string Method, double Change, double Band, double Floor,
    int LinearIterations, double Seconds);

/// <summary>One polyline of the phreatic surface (pressure head zero), [x, y] in m, upstream first.</summary>
public sealed record PhreaticLineDto(double[][] Points);

/// <summary>Water leaving through one seepage face: <c>flow</c> m³/s per m out of the soil, <c>exitPoint</c> [x, y] in m
/// (the highest point where water leaves; null when none does), <c>wettedLength</c> in m.</summary>
public sealed record SeepageFaceDto(string Name, double Flow, double[]? ExitPoint, double WettedLength);

/// <summary>A hand method beside the FE: whether it <c>applies</c> and the <c>note</c> (why not, or its key figures),
/// <c>flow</c> m³/s per m, <c>exitPoint</c> [x, y] in m, <c>difference</c> = flow / FE flow − 1.</summary>
public sealed record HandEstimateDto(string Method, string Source, bool Applies, string Note, double? Flow, double[]? ExitPoint,
    double? Difference);

/// <summary>The hand methods for a homogeneous embankment on an impervious base: reservoir depth h above the base (m)
/// and one estimate per method.</summary>
public sealed record HandMethodsDto(double ReservoirDepth, IReadOnlyList<HandEstimateDto> Estimates);

/// <summary>Unconfined field data: nodal pressure head p = h − y (m), relative conductivity k_r of each triangle (1 =
/// saturated, down to the floor above the phreatic surface), and the phreatic polylines ([x, y], m).</summary>
public sealed record UnconfinedFieldDto(double[] PressureHeads, double[] RelativeConductivity, IReadOnlyList<double[][]> PhreaticSurface);
