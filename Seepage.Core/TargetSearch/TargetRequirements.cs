using Seepage.Core.Studies;

namespace Seepage.Core.TargetSearch;

/// <summary>
/// What a design must meet: the smallest factor against piping and against heave (dimensionless), the largest flow
/// (m³/s per m) and the largest uplift force summed over the structures (kN/m); null means not required. Each requirement's
/// margin is relative and positive when met: F/F_req − 1 for the factors, 1 − q/q_max and 1 − U/U_max for the limits.
/// </summary>
public sealed record TargetRequirements(double? ExitFactor = null, double? HeaveFactor = null, double? MaxFlow = null,
    double? MaxUpliftForce = null)
{
    /// <summary>The requirement names of the public contract, in order.</summary>
    public static readonly IReadOnlyList<string> Names = ["exitFactor", "heaveFactor", "maxFlow", "maxUpliftForce"];

    /// <summary>The requirement of the given name, or null when not required.</summary>
    public double? Get(string name) => name switch
    {
        "exitFactor" => ExitFactor,
        "heaveFactor" => HeaveFactor,
        "maxFlow" => MaxFlow,
        "maxUpliftForce" => MaxUpliftForce,
        _ => throw new ArgumentOutOfRangeException(nameof(name), name, "not a requirement name"),
    };

    /// <summary>The names of the requirements that are set.</summary>
    public IReadOnlyList<string> Active => Names.Where(n => Get(n) is not null).ToList();

    /// <summary>The margin of each active requirement at an analysed point; null where the figure is missing (e.g. no exit
    /// soil data, no cutoff for heave, no structure for uplift) or the point was not analysed.</summary>
    public Dictionary<string, double?> Margins(StudyRow row)
    {
        var margins = new Dictionary<string, double?>();
        foreach (string name in Active)
        {
            double limit = Get(name)!.Value;
            margins[name] = !row.Analysed ? null : name switch
            {
                "exitFactor" => row.ExitFactor / limit - 1,
                "heaveFactor" => row.HeaveFactor / limit - 1,
                "maxFlow" => 1 - row.Flow / limit,
                _ => 1 - row.UpliftForce / limit,
            };
        }
        return margins;
    }
}
