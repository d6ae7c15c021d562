using Seepage.Core.Sections;
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
    double MomentAboutDownstreamToe, double DownstreamToeX)
{
    /// <summary>The uplift at each cutoff that meets this base, as a percentage of the head difference.</summary>
    public IReadOnlyList<UpliftJunction> Junctions { get; init; } = [];
}

/// <summary>Uplift where a cutoff meets a base (the key points of the independent-variable method): x (m) and the
/// head on the upstream and downstream faces as a percentage of the head difference H above the lowest fixed head
/// (0 % = tailwater, 100 % = headwater).</summary>
public sealed record UpliftJunction(string Cutoff, double X, double UpstreamFacePercent, double DownstreamFacePercent);

/// <summary>One point of the exit gradient profile: position (m), upward gradient averaged over the stated depth, and
/// the gradient of the single element row at the exit (the boundary triangle's gradient · inward normal), both
/// dimensionless. Their difference shows how much the averaging matters.</summary>
public sealed record ExitProfilePoint(double X, double Y, double Gradient, double RowGradient);

/// <summary>The exit gradient check; CriticalGradient/Factor/Pass are null when the exit soil lacks the data.</summary>
/// <remarks>RowGradientAtMax is the element-row gradient at the station of the maximum averaged gradient;
/// MaxRowGradient (at MaxRowX, MaxRowY, m) is the largest element-row gradient anywhere on the exit surface.</remarks>
public sealed record ExitResult(double MaxGradient, double AtX, double AtY, double? CriticalGradient, double? Factor,
    double RequiredFactor, bool? Pass, double Depth, string Method, IReadOnlyList<ExitProfilePoint> Profile,
    double RowGradientAtMax, double MaxRowGradient, double MaxRowX, double MaxRowY)
{
    /// <summary>Allowable exit gradient i_c / F_required, dimensionless; null without a critical gradient.</summary>
    public double? AllowableGradient => SectionDefaults.AllowableGradient(CriticalGradient, RequiredFactor);
}

/// <summary>Heave at one cutoff by Terzaghi's prism (depth D m from the downstream surface to the tip, width D/2):
/// average excess head (m) at the prism base over the head at its top, factor = γ′D/(γw·h_a). EffectiveWeight
/// W′ = γ′·D·D/2 and PrismUpliftForce U = γw·h_a·D/2 (the water force on the prism, not the uplift of a structure) in kN/m (null without the soil's unit weight data); SurfaceY (m)
/// is the elevation of the prism's top.</summary>
public sealed record HeaveResult(string Cutoff, double Depth, double AverageExcessHead, double? Factor, double RequiredFactor,
    bool? Pass, double PrismFromX, double PrismToX, double? EffectiveWeight, double PrismUpliftForce, double SurfaceY)
{
    /// <summary>Why the factor is not a heave verdict (e.g. the prism lies under a structure, not at an exit); null when it is.</summary>
    public string? Skipped { get; init; }
}

/// <summary>A creep check: (weighted) creep length in m, ratio = length / head difference, required ratio
/// from the cited table when the soil's creep class is known.</summary>
public sealed record CreepCheck(double WeightedLength, double Ratio, double? Required, bool? Pass, string Source)
{
    /// <summary>Why there is no required ratio (no creepClass, or none in the table for it); null when there is one.</summary>
    public string? Skipped { get; init; }
}

public sealed record CreepResult(CreepCheck Lane, CreepCheck Bligh);

/// <summary>The flow crossing one gauge polyline, m³/s per m, positive along the normal 90° counter-clockwise from
/// the walking direction; Length is the part of the polyline inside the soil, m; Method says how the flow was read;
/// LineIntegral is the element-velocity integral along the line beside it for comparison, m³/s per m.</summary>
public sealed record GaugeFlow(string Name, double Flow, double Length, string Method, double LineIntegral);
