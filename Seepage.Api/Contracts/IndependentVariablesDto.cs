namespace Seepage.Api.Contracts;

/// <summary>The method of independent variables beside the FE values: key-point pressures in per cent of the head
/// difference (m), exit gradient G_E (dimensionless), which corrections were applied and which not, and the source.
/// <c>floorThickness</c>: how far the underside of the floor lies below the ground level, m (0 for a floor on the ground).</summary>
public sealed record IndependentVariablesDto(string Structure, double FloorLength, double FloorThickness, double HeadDifference,
    IReadOnlyList<KeyPointPileDto> Piles, double? ExitGradient, double? FeExitGradient, double? FeRowExitGradient,
    IReadOnlyList<string> CorrectionsApplied, IReadOnlyList<string> CorrectionsNotApplied, IReadOnlyList<string> Notes, string Source);

/// <summary>One pile: position, x (m), depth below the ground level (m), key points E, D, C at the underside of the floor and the tip.</summary>
public sealed record KeyPointPileDto(string Cutoff, string Position, double X, double Depth, KeyPointDto E, KeyPointDto D, KeyPointDto C);

/// <summary>A key point in per cent of H: closed form, corrections, corrected value, FE value, FE − corrected.</summary>
public sealed record KeyPointDto(double Basic, double Correction, double Corrected, double? Fe, double? Difference);
