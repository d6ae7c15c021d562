namespace Seepage.Core.TargetSearch;

/// <summary>The definition of a target search: the member to vary (a JSON pointer into the section, RFC 6901), its range
/// (the first value is the least-cost end: for a cutoff tip elevation, the shallow end), the requirements, the tolerance of
/// the answer in the member's unit and the number of coarse-scan points. <see cref="RequirementsDefaulted"/>: the
/// requirements are the section's own required factors (none was given), so one the section cannot check is dropped with a
/// note rather than making every point fail.</summary>
public sealed record TargetSearch(string Member, double From, double To, TargetRequirements Require, double Tolerance, int ScanPoints,
    bool RequirementsDefaulted = false)
{
    /// <summary>Default tolerance for a member in metres, m.</summary>
    public const double DefaultLengthTolerance = 0.05;

    /// <summary>Default tolerance as a fraction of the range.</summary>
    public const double DefaultRangeFraction = 0.01;

    /// <summary>Default number of coarse-scan points (both ends included).</summary>
    public const int DefaultScanPoints = 9;

    /// <summary>The default tolerance: 0.05 (m) or 1 % of the range, whichever is smaller.</summary>
    public static double DefaultTolerance(double from, double to) =>
        Math.Min(DefaultLengthTolerance, DefaultRangeFraction * Math.Abs(to - from));
}
