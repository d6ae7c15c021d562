namespace Seepage.Core.TargetSearch;

/// <summary>
/// The answer of a target search. <see cref="Value"/> is the member value nearest the least-cost end of the range (the
/// range's first value) that meets every requirement, null when none in the range does; <see cref="Governing"/> the
/// requirement that sets it (or, when infeasible, the one furthest from being met at the best point); <see cref="Margins"/>
/// each requirement's margin there; <see cref="Intervals"/> every feasible stretch found; <see cref="Monotone"/> whether
/// the coarse scan saw every margin change in one direction only; <see cref="Points"/> every evaluated point in the order
/// evaluated; <see cref="Message"/> the answer in words;
/// <see cref="Require"/> the requirements the answer was checked against (a default one the section cannot check is left out,
/// see <see cref="Notes"/>).
/// </summary>
public sealed record TargetSearchResult(double? Value, bool Feasible, string? Governing, IReadOnlyDictionary<string, double?> Margins,
    IReadOnlyList<TargetInterval> Intervals, bool Monotone, double Tolerance, IReadOnlyList<TargetPoint> Points, double? BestMargin,
    double? BestValue, string Message, IReadOnlyList<string> Notes, TargetRequirements Require);
