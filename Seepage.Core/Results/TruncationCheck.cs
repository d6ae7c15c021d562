using Seepage.Core.Fem;
using Seepage.Core.Geometry;
using Seepage.Core.Meshing;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;

namespace Seepage.Core.Results;

/// <summary>
/// Checks that the lateral (left and right) boundaries are far enough: each is pushed out by half its distance L
/// from the nearest structure or cutoff (x → x ∓ L/2; vertices of outlines and polylines on that boundary move, the
/// rest stay), and a change of the flow by more than 1 % gives a warning (common practice: a truncated domain should
/// not steer the answer). The change is first estimated from the one solution (<see cref="TruncationSensitivity"/>,
/// method <c>sensitivity</c>, an upper bound at no extra solve). Where that estimate does not apply or exceeds 1 %,
/// and a wider solve is allowed, the wider section is meshed and solved once (method <c>widerSolve</c>); the two
/// meshes differ, so changes below the discretisation error (a few tenths of a per cent) are not meaningful there.
/// </summary>
public static class TruncationCheck
{
    /// <summary>Relative change of the flow above which a warning is given (1 %).</summary>
    public const double WarningLevel = 0.01;

    /// <summary>Models with fewer triangles are checked automatically unless the section says otherwise.</summary>
    public const int AutomaticBelowTriangles = 20_000;

    /// <summary>Method name of the first-order estimate from the one solution.</summary>
    public const string SensitivityMethod = "sensitivity";

    /// <summary>Method name of the extra solve on the wider section.</summary>
    public const string WiderSolveMethod = "widerSolve";

    public static TruncationResult? Run(SectionModel section, FieldSolution solution, double flow, Func<SectionModel, Mesh> mesher,
        SolverOptions options, bool widerSolveAllowed, List<string> warnings, CancellationToken cancellation)
    {
        var features = section.Structures.SelectMany(s => s.Base).Concat(section.Cutoffs.SelectMany(c => new[] { c.Top, c.Tip })).ToList();
        if (features.Count == 0 || flow <= 0) return null;
        var all = section.Zones.SelectMany(z => z.Outline).ToList();
        double left = all.Min(p => p.X), right = all.Max(p => p.X), tol = section.MatchTolerance;
        double fl = features.Min(p => p.X) - left, fr = right - features.Max(p => p.X);
        if (fl <= tol || fr <= tol) return null;
        double newLeft = left - fl / 2, newRight = right + fr / 2;
        double? estimate = TruncationSensitivity.Estimate(section, solution, flow, left, right, fl / 2, fr / 2, tol);
        if (estimate is { } e && (e <= WarningLevel || !widerSolveAllowed))
        {
            if (e > WarningLevel)
                warnings.Add(FormattableString.Invariant(
                    $"Truncation: pushing the lateral boundaries out by half their distance from the structures would change the flow by up to {e:P1} (first-order estimate, > 1 %); extend the section."));
            return new TruncationResult(left, right, newLeft, newRight, flow, flow * (1 + e), e) { Method = SensitivityMethod };
        }
        if (!widerSolveAllowed) return null;
        Point2 Move(Point2 p) => Math.Abs(p.X - left) <= tol ? new Point2(newLeft, p.Y) : Math.Abs(p.X - right) <= tol ? new Point2(newRight, p.Y) : p;
        List<Point2> Line(IEnumerable<Point2> line) => line.Select(Move).ToList();
        var wide = section with
        {
            Zones = section.Zones.Select(z => z with { Outline = Line(z.Outline) }).ToList(),
            Heads = section.Heads.Select(h => h with { Along = Line(h.Along) }).ToList(),
            Drains = section.Drains.Select(d => d with { Along = Line(d.Along) }).ToList(),
            ExitCheck = section.ExitCheck with { Along = Line(section.ExitCheck.Along) },
            Gauges = [],
        };
        var wideSolution = FieldSolver.Solve(wide, mesher(wide), solution.Field.Order, options, cancellation);
        double wider = KeyFigures.Of(wide, wideSolution).Flow;
        double change = (wider - flow) / flow;
        if (Math.Abs(change) > WarningLevel)
            warnings.Add(FormattableString.Invariant(
                $"Truncation: pushing the lateral boundaries out by half their distance from the structures changes the flow by {change:P1} (> 1 %); extend the section."));
        return new TruncationResult(left, right, newLeft, newRight, flow, wider, change) { Method = WiderSolveMethod };
    }
}

/// <summary>The truncation check: lateral boundaries before and after (x, m), flow on each (m³/s per m; for the
/// estimate, the flow times one plus the estimated change) and the relative change, and how it was obtained
/// (<c>sensitivity</c> or <c>widerSolve</c>).</summary>
public sealed record TruncationResult(double LeftX, double RightX, double ExtendedLeftX, double ExtendedRightX, double Flow,
    double ExtendedFlow, double Change)
{
    /// <summary><see cref="TruncationCheck.SensitivityMethod"/> or <see cref="TruncationCheck.WiderSolveMethod"/>.</summary>
    public string Method { get; init; } = TruncationCheck.WiderSolveMethod;
}
