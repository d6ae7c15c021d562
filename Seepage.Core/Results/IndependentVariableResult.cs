namespace Seepage.Core.Results;

/// <summary>
/// The method of independent variables for one floor, reported beside the finite element values. Pressures at key
/// points are per cent of the head difference <see cref="HeadDifference"/> (m) above the lowest fixed head.
/// <see cref="ExitGradient"/> is G_E (dimensionless, null without a pile at the downstream end);
/// <see cref="FeExitGradient"/> is the FE exit gradient averaged over the exit check's depth and
/// <see cref="FeRowExitGradient"/> the FE gradient of the element row at the same station.
/// </summary>
public sealed record IndependentVariableResult(
    string Structure,
    double FloorLength,
    double HeadDifference,
    IReadOnlyList<KeyPointPile> Piles,
    double? ExitGradient,
    double? FeExitGradient,
    double? FeRowExitGradient,
    IReadOnlyList<string> CorrectionsApplied,
    IReadOnlyList<string> CorrectionsNotApplied,
    IReadOnlyList<string> Notes,
    string Source)
{
    /// <summary>Thickness of the floor below the ground level (m): 0 for a floor on the ground.</summary>
    public double FloorThickness { get; init; }
}

/// <summary>One pile of the method: its position ("upstream", "intermediate", "downstream"), x (m), depth d below the
/// ground level (m; the underside of the floor when it sits on the ground) and the key points E (upstream face at the
/// underside of the floor), D (tip), C (downstream face at the underside).</summary>
public sealed record KeyPointPile(string Cutoff, string Position, double X, double Depth, KeyPoint E, KeyPoint D, KeyPoint C);

/// <summary>A key point: the basic value of the closed form, the sum of the applied corrections, the corrected
/// value, the FE value and FE − corrected; all in per cent of H (differences in percentage points).</summary>
public sealed record KeyPoint(double Basic, double Correction, double Corrected, double? Fe, double? Difference);
