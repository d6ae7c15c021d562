using Seepage.Core.TargetSearch;

namespace Seepage.Api.Contracts;

/// <summary>Maps the points of a Core target search to contracts.</summary>
public static class TargetSearchMapper
{
    public static TargetPointDto Point(TargetPoint p, string? analysisId) => new(p.Value, p.Row.Flow, p.Row.UpliftForce,
        p.Row.MaxExitGradient, p.Row.ExitFactor, p.Row.HeaveFactor, p.Margins, p.Feasible, analysisId,
        p.Row.Problems.GroupBy(q => q.Pointer).ToDictionary(g => g.Key, g => g.Select(q => q.Message).ToArray()));

    /// <summary>Bisection steps to bring one scan spacing below the tolerance (for the progress estimate).</summary>
    public static int BisectionSteps(TargetSearch s)
    {
        double spacing = Math.Abs(s.To - s.From) / Math.Max(1, s.ScanPoints - 1);
        return spacing <= s.Tolerance ? 0 : (int)Math.Ceiling(Math.Log2(spacing / s.Tolerance));
    }
}
