using Seepage.Core.Geometry;

namespace Seepage.Core.Results;

/// <summary>One equipotential: total head (m) and its polylines.</summary>
public sealed record Equipotential(double Head, IReadOnlyList<IReadOnlyList<Point2>> Paths);

/// <summary>One flow line: the share of the discharge passing on its near side, and its polylines.</summary>
public sealed record FlowLine(double Fraction, IReadOnlyList<IReadOnlyList<Point2>> Paths);

/// <summary>A flow net: equipotentials at Nd equal head drops, flow lines bounding channels that each carry
/// k·ΔH/Nd (k the reference conductivity √(kx·ky), m/s), so the cells are curvilinear squares in the section
/// transformed for the reference soil's anisotropy. <see cref="FlowChannels"/> is the whole number of channels
/// drawn (the last may be a part channel); <see cref="FlowChannelsExact"/> = Nf with its fraction = shape factor ×
/// Nd; <see cref="ShapeFactor"/> = q/(k·ΔH) from the FE discharge.</summary>
public sealed record FlowNet(IReadOnlyList<Equipotential> Equipotentials, IReadOnlyList<FlowLine> FlowLines,
    int FlowChannels, int HeadDrops, double ShapeFactor, double HeadDifference, double ReferenceConductivity,
    double[]? StreamFunction)
{
    /// <summary>Nf with its fractional part: shape factor × Nd.</summary>
    public double FlowChannelsExact => ShapeFactor * HeadDrops;

    /// <summary>"section" when Nd came from the section's <c>flowNet.headDrops</c>, "automatic" when chosen here.</summary>
    public string HeadDropsSource { get; init; } = "automatic";

    /// <summary>Id of the soil whose √(kx·ky) is the reference conductivity.</summary>
    public string? ReferenceSoil { get; init; }

    /// <summary>True when every zone has the reference soil's conductivity and it is isotropic: only then is
    /// q = k·H·Nf/Nd exact for the drawn net; otherwise it is approximate.</summary>
    public bool UniformIsotropic { get; init; }
}
