using Seepage.Core.Sections;

namespace Seepage.Core.Studies;

/// <summary>The key figures of one alternative, or its problems when it could not be analysed.</summary>
/// <param name="Index">Position of the alternative in the study (0-based).</param>
/// <param name="Name">The alternative's name.</param>
/// <param name="Problems">Problems with the changed section (JSON pointer + message); empty when it was analysed.</param>
/// <param name="Flow">Seepage discharge, m³/s per m of structure.</param>
/// <param name="UpliftForce">Uplift force summed over the structures, kN per m.</param>
/// <param name="MaxExitGradient">Largest averaged upward exit gradient, dimensionless.</param>
/// <param name="ExitFactor">Factor of safety against piping, i_c / i_exit (null when the exit soil lacks Gs and e).</param>
/// <param name="ExitRequiredFactor">Required factor against piping.</param>
/// <param name="HeaveFactor">Smallest heave factor over the cutoffs (Terzaghi's prism), null without cutoffs or soil data.</param>
/// <param name="HeaveRequiredFactor">Required factor against heave.</param>
/// <param name="Pass">True when every check with a verdict (exit, heave, Lane, Bligh) passes, false when one fails, null when none
/// has a verdict; <see cref="PassCovers"/> names the checks it covers.</param>
/// <param name="Seconds">Wall time of the alternative's analysis, s.</param>
/// <param name="SectionJson">The changed section document, as analysed (JSON).</param>
public sealed record StudyRow(
    int Index,
    string Name,
    IReadOnlyList<SectionProblem> Problems,
    double? Flow,
    double? UpliftForce,
    double? MaxExitGradient,
    double? ExitFactor,
    double? ExitRequiredFactor,
    double? HeaveFactor,
    double? HeaveRequiredFactor,
    bool? Pass,
    double Seconds,
    string? SectionJson)
{
    public bool Analysed => Problems.Count == 0 && Flow is not null;

    /// <summary>Verdict of each check (exit, heave, lane, bligh), null where it gave none.</summary>
    public bool? ExitPass { get; init; }

    /// <inheritdoc cref="ExitPass"/>
    public bool? HeavePass { get; init; }

    /// <inheritdoc cref="ExitPass"/>
    public bool? LanePass { get; init; }

    /// <inheritdoc cref="ExitPass"/>
    public bool? BlighPass { get; init; }

    /// <summary>The checks <see cref="Pass"/> covers: those of exit, heave, lane, bligh that gave a verdict.</summary>
    public IReadOnlyList<string> PassCovers { get; init; } = [];
}
