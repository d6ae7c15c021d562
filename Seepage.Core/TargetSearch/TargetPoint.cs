using Seepage.Core.Studies;

namespace Seepage.Core.TargetSearch;

/// <summary>One evaluated point of a target search: the member value, the key figures of its analysis (or its problems),
/// the margin of each requirement, the smallest of them (<see cref="Margin"/>, null when any is missing), the requirement
/// that sets it, and whether every requirement is met.</summary>
public sealed record TargetPoint(double Value, StudyRow Row, IReadOnlyDictionary<string, double?> Margins)
{
    /// <summary>The smallest margin, or null when a required figure is missing or the point was not analysed.</summary>
    public double? Margin => Margins.Count == 0 || Margins.Values.Any(m => m is null) ? null : Margins.Values.Min();

    /// <summary>The requirement with the smallest margin (null when <see cref="Margin"/> is null).</summary>
    public string? Governing => Margin is null ? null : Margins.OrderBy(m => m.Value).First().Key;

    /// <summary>Every requirement met.</summary>
    public bool Feasible => Margin >= 0;
}
