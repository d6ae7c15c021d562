namespace Seepage.Core.Uncertainty;

/// <summary>The key figures of one analysed sample: flow in m³/s per m, uplift force summed over the structures in kN/m,
/// the largest averaged exit gradient (dimensionless), the factors against piping and heave (the smallest over the cutoffs)
/// with their required values. A figure the section cannot give (no structure, no exit soil data, no cutoff) is null.</summary>
public sealed record SampleFigures(double Flow, double? UpliftForce, double? MaxExitGradient, double? ExitFactor,
    double ExitRequiredFactor, double? HeaveFactor, double HeaveRequiredFactor)
{
    /// <summary>The figure names of the public contract, in order.</summary>
    public static readonly IReadOnlyList<string> Names = ["flow", "upliftForce", "maxExitGradient", "exitFactor", "heaveFactor"];

    /// <summary>The unit of each figure, for headers and memos.</summary>
    public static readonly IReadOnlyDictionary<string, string> Units = new Dictionary<string, string>
    {
        ["flow"] = "m³/s per m", ["upliftForce"] = "kN/m", ["maxExitGradient"] = "-", ["exitFactor"] = "-", ["heaveFactor"] = "-",
    };

    /// <summary>The figure of the given name (see <see cref="Names"/>).</summary>
    public double? Get(string name) => name switch
    {
        "flow" => Flow,
        "upliftForce" => UpliftForce,
        "maxExitGradient" => MaxExitGradient,
        "exitFactor" => ExitFactor,
        "heaveFactor" => HeaveFactor,
        _ => throw new ArgumentOutOfRangeException(nameof(name), name, "not a figure name"),
    };

    /// <summary>Whether the piping check fails (factor below the required one); null when it has no factor.</summary>
    public bool? ExitFails => ExitFactor is { } f ? f < ExitRequiredFactor : null;

    /// <summary>Whether the heave check fails at any cutoff; null when no cutoff has a factor.</summary>
    public bool? HeaveFails => HeaveFactor is { } f ? f < HeaveRequiredFactor : null;

    /// <summary>The figures of a finished analysis.</summary>
    public static SampleFigures Of(AnalysisResult r)
    {
        var heave = r.Heave.Where(h => h.Factor is not null).OrderBy(h => h.Factor).FirstOrDefault();
        return new SampleFigures(r.Flow.PerMetre, r.Uplift.Count == 0 ? null : r.Uplift.Sum(u => u.Force), r.Exit?.MaxGradient,
            r.Exit?.Factor, r.Section.ExitCheck.RequiredFactor, heave?.Factor, r.Section.HeaveRequiredFactor);
    }
}
