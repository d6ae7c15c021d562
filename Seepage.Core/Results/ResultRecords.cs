namespace Seepage.Core.Results;

/// <summary>Flow through one head or drain boundary, m³/s per metre, positive into the soil.</summary>
public sealed record BoundaryFlow(string Name, string Kind, double Flow);

/// <summary>Seepage discharge: inflow and outflow in m³/s per metre of structure (from the nodal reactions on
/// fixed-head boundaries), balance = (inflow − outflow)/inflow.</summary>
public sealed record FlowSummary(double Inflow, double Outflow, double Balance, IReadOnlyList<BoundaryFlow> Boundaries)
{
    /// <summary>The discharge, m³/s per m: the mean of inflow and outflow.</summary>
    public double PerMetre => 0.5 * (Inflow + Outflow);
}

/// <summary>One uplift station: position (m), total head (m), pore pressure (kPa).</summary>
public sealed record UpliftStation(double X, double Y, double Head, double Pressure);

/// <summary>Uplift under a structure: stations, resultant force (kN/m), its x position (m), and its moment
/// about the downstream toe (kN·m/m).</summary>
public sealed record UpliftResult(string Structure, IReadOnlyList<UpliftStation> Stations, double Force, double CentroidX,
    double MomentAboutDownstreamToe, double DownstreamToeX);

/// <summary>One point of the exit gradient profile: station x (m), averaged upward gradient.</summary>
public sealed record ExitProfilePoint(double X, double Y, double Gradient);

/// <summary>The exit gradient check; CriticalGradient/Factor/Pass are null when the exit soil lacks the data.</summary>
public sealed record ExitResult(double MaxGradient, double AtX, double AtY, double? CriticalGradient, double? Factor,
    double RequiredFactor, bool? Pass, double Depth, string Method, IReadOnlyList<ExitProfilePoint> Profile);

/// <summary>Heave at one cutoff by Terzaghi's prism (depth D m, width D/2): average excess head (m) at the prism
/// base over the head at its top, factor = γ′D/(γw·h_a).</summary>
public sealed record HeaveResult(string Cutoff, double Depth, double AverageExcessHead, double? Factor, double RequiredFactor,
    bool? Pass, double PrismFromX, double PrismToX);

/// <summary>A creep check: (weighted) creep length in m, ratio = length / head difference, required ratio
/// from the cited table when the soil's creep class is known.</summary>
public sealed record CreepCheck(double WeightedLength, double Ratio, double? Required, bool? Pass, string Source);

public sealed record CreepResult(CreepCheck Lane, CreepCheck Bligh);
