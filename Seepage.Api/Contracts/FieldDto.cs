namespace Seepage.Api.Contracts;

/// <summary>
/// Field data for drawing an analysis (served apart from the summary): node coordinates (m), triangles
/// (node indices, counter-clockwise), zone index per triangle, total head per node (m), equipotentials at
/// equal head drops and flow lines bounding equal-flow channels (polylines of [x, y] in m); per triangle, the
/// head gradient [∂h/∂x, ∂h/∂y] (dimensionless) and the Darcy velocity [vx, vy] = −K∇h (m/s) at its centroid.
/// <c>zoneSoils</c> names the soil of each zone index: the section's zones first, then any pieces a permeable wall
/// split off them and the walls themselves. <c>waterUnitWeight</c> (kN/m³) is the unit weight of water the analysis
/// used (the section's, or its default), for pore pressures u = γw(h − y) under the cursor. <c>unconfined</c>
/// (unconfined sections only): pressure heads, the saturated part of the mesh and the phreatic surface; the flow net
/// is then drawn in the saturated triangles only.
/// </summary>
public sealed record FieldDto(
    string Id,
    double[][] Nodes,
    int[][] Triangles,
    int[] Zones,
    double[] Heads,
    IReadOnlyList<EquipotentialDto> Equipotentials,
    IReadOnlyList<FlowLineDto> FlowLines,
    FlowNetDto FlowNet,
    IReadOnlyList<double[][]> Walls,
    double[][] Gradients,
    double[][] Velocities,
    IReadOnlyList<string>? ZoneSoils = null,
    double? WaterUnitWeight = null,
    UnconfinedFieldDto? Unconfined = null);

/// <summary>One equipotential: its total head in m and the polylines where the field takes it.</summary>
public sealed record EquipotentialDto(double Head, IReadOnlyList<double[][]> Paths);

/// <summary>One flow line, traced from the inflow boundary; <c>fraction</c> is the share of the flow passing
/// between it and the first flow line.</summary>
public sealed record FlowLineDto(double Fraction, double[][] Points);

/// <summary>Flow-net counts: <c>flowChannels</c> whole channels drawn (the last may be a part channel),
/// <c>flowChannelsExact</c> Nf with its fraction, Nd head drops (<c>headDropsSource</c>: "automatic" for square
/// cells and at least four channels, or "section" from <c>flowNet.headDrops</c>), shape factor
/// q/(k·H) = Nf/Nd with k = <c>referenceConductivity</c> = √(kx·ky) of <c>referenceSoil</c> (m/s), H the head
/// difference (m). <c>uniformIsotropic</c> false means q = k·H·Nf/Nd holds only approximately for the drawn net
/// (layered or anisotropic section). <c>caption</c> says all this in words (the page and the memo show it).</summary>
public sealed record FlowNetDto(int FlowChannels, int HeadDrops, double ShapeFactor, double HeadDifference,
    double FlowChannelsExact = 0, string? HeadDropsSource = null, double ReferenceConductivity = 0,
    string? ReferenceSoil = null, bool UniformIsotropic = false, string? Caption = null);
