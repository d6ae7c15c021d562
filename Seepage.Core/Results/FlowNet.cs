using Seepage.Core.Geometry;

namespace Seepage.Core.Results;

/// <summary>One equipotential: total head (m) and its polylines.</summary>
public sealed record Equipotential(double Head, IReadOnlyList<IReadOnlyList<Point2>> Paths);

/// <summary>One flow line: the share of the discharge passing on its near side, and its polylines.</summary>
public sealed record FlowLine(double Fraction, IReadOnlyList<IReadOnlyList<Point2>> Paths);

/// <summary>A flow net: equipotentials at Nd equal head drops, flow lines bounding Nf equal-flow channels, and
/// the exact shape factor q/(k·ΔH) from the FE discharge (k the reference conductivity, m/s).</summary>
public sealed record FlowNet(IReadOnlyList<Equipotential> Equipotentials, IReadOnlyList<FlowLine> FlowLines,
    int FlowChannels, int HeadDrops, double ShapeFactor, double HeadDifference, double ReferenceConductivity,
    double[]? StreamFunction);
