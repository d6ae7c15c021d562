namespace Seepage.Core.TargetSearch;

/// <summary>A stretch of the member's range where every requirement is met, from the end nearer the least-cost end of the
/// range to the other, each end found to the search tolerance (in the member's unit).</summary>
public sealed record TargetInterval(double From, double To);
