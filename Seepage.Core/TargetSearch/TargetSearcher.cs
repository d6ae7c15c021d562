namespace Seepage.Core.TargetSearch;

/// <summary>
/// Finds the least-cost member value that meets every requirement. A coarse scan of evenly spaced points over the range
/// (in parallel) shows where the requirements are met and whether each margin changes in one direction only (monotone).
/// Each change between a failing and a passing scan point is then bracketed and bisected on the smallest margin (the
/// governing check's) until the bracket is narrower than the tolerance; the passing end of each bracket is kept, so every
/// value reported was analysed and met every requirement. Feasible stretches narrower than the scan spacing can be missed:
/// when the scan is not monotone the answer says so.
/// </summary>
public static class TargetSearcher
{
    /// <summary>A direction change smaller than this fraction of a margin's spread over the scan counts as mesh noise.</summary>
    public const double NoiseFraction = 0.02;

    public static TargetSearchResult Run(TargetSearch search, Func<double, TargetPoint> evaluate, Action<TargetPoint>? onPoint = null,
        CancellationToken cancellation = default)
    {
        int n = Math.Max(2, search.ScanPoints);
        var xs = Enumerable.Range(0, n).Select(i => search.From + (search.To - search.From) * i / (n - 1)).ToArray();
        var scan = new TargetPoint[n];
        var points = new List<TargetPoint>();
        var parallel = new ParallelOptions { MaxDegreeOfParallelism = Environment.ProcessorCount, CancellationToken = cancellation };
        Parallel.For(0, n, parallel, i => { scan[i] = evaluate(xs[i]); onPoint?.Invoke(scan[i]); });
        points.AddRange(scan);

        var notes = new List<string>();
        var active = search.Require;
        foreach (string name in search.Require.Active)
        {
            var analysed = scan.Where(p => p.Row.Analysed).ToList();
            if (analysed.Count == 0 || analysed.Any(p => p.Margins[name] is not null)) continue;
            notes.Add($"{name} could not be checked: {Missing(name)}" +
                (search.RequirementsDefaulted ? " It was a default requirement and is left out." : " No point can meet it."));
            if (search.RequirementsDefaulted) active = Without(active, name);
        }
        if (!ReferenceEquals(active, search.Require))
        {
            var reduced = active;
            var inner = evaluate;
            evaluate = v => { var p = inner(v); return p with { Margins = reduced.Margins(p.Row) }; };
            for (int i = 0; i < n; i++) scan[i] = scan[i] with { Margins = reduced.Margins(scan[i].Row) };
            points.Clear();
            points.AddRange(scan);
            search = search with { Require = reduced };
        }
        bool monotone = search.Require.Active.All(name => Monotone(scan.Select(p => p.Margins[name]).ToList()));
        if (!monotone)
            notes.Add($"The response is not monotone over the range: every feasible interval found by the {n}-point scan is " +
                "reported; an interval narrower than the scan spacing could be missed.");
        foreach (var p in scan.Where(p => !p.Row.Analysed))
            notes.Add($"At {p.Value:G6} the section could not be analysed: " +
                string.Join("; ", p.Row.Problems.Select(q => $"{q.Pointer} {q.Message}")));

        // Each pass/fail change between neighbours: bisect to the tolerance, keep the passing end.
        var intervals = new List<TargetInterval>();
        double? start = scan[0].Feasible ? scan[0].Value : null;
        for (int i = 0; i + 1 < n; i++)
        {
            if (scan[i].Feasible == scan[i + 1].Feasible) continue;
            var (edge, visited) = Bisect(scan[i], scan[i + 1], search.Tolerance, evaluate, onPoint, cancellation);
            points.AddRange(visited);
            if (scan[i + 1].Feasible) start = edge.Value;
            else { intervals.Add(new TargetInterval(start!.Value, edge.Value)); start = null; }
        }
        if (start is not null) intervals.Add(new TargetInterval(start.Value, scan[^1].Value));

        if (intervals.Count == 0)
        {
            var best = points.Where(p => p.Margin is not null).OrderByDescending(p => p.Margin).FirstOrDefault();
            string message = best is null
                ? $"No value of {search.Member} in [{search.From:G6}, {search.To:G6}] could be checked against every requirement."
                : $"No value of {search.Member} in [{search.From:G6}, {search.To:G6}] meets every requirement: the best margin reached is " +
                  $"{best.Margin:P1} ({best.Governing}) at {best.Value:G6}.";
            return new TargetSearchResult(null, false, best?.Governing, best?.Margins ?? new Dictionary<string, double?>(), intervals,
                monotone, search.Tolerance, points, best?.Margin, best?.Value, message, notes, search.Require);
        }
        var found = points.First(p => p.Value == intervals[0].From);
        string answer = $"{search.Member} = {found.Value:G6} meets every requirement (to ±{search.Tolerance:G3}); {found.Governing} governs " +
            $"with a margin of {found.Margin:P1}.";
        return new TargetSearchResult(found.Value, true, found.Governing, found.Margins, intervals, monotone, search.Tolerance, points,
            found.Margin, found.Value, answer, notes, search.Require);
    }

    private static string Missing(string name) => name switch
    {
        "exitFactor" => "the analyses give no factor against piping (the exit soil needs specificGravity and voidRatio, or saturatedUnitWeight).",
        "heaveFactor" => "the analyses give no heave factor (a cutoff pointing down and the soil's unit weight data are needed).",
        "maxUpliftForce" => "the section has no structure base for uplift.",
        _ => "the analyses give no flow.",
    };

    private static TargetRequirements Without(TargetRequirements r, string name) => name switch
    {
        "exitFactor" => r with { ExitFactor = null },
        "heaveFactor" => r with { HeaveFactor = null },
        "maxUpliftForce" => r with { MaxUpliftForce = null },
        _ => r with { MaxFlow = null },
    };

    // Bisection between a passing and a failing point until they are closer than the tolerance; returns the passing end.
    private static (TargetPoint Edge, List<TargetPoint> Visited) Bisect(TargetPoint a, TargetPoint b, double tolerance,
        Func<double, TargetPoint> evaluate, Action<TargetPoint>? onPoint, CancellationToken cancellation)
    {
        var (pass, fail) = a.Feasible ? (a, b) : (b, a);
        var visited = new List<TargetPoint>();
        for (int guard = 0; Math.Abs(pass.Value - fail.Value) > tolerance && guard < 60; guard++)
        {
            cancellation.ThrowIfCancellationRequested();
            var mid = evaluate(0.5 * (pass.Value + fail.Value));
            onPoint?.Invoke(mid);
            visited.Add(mid);
            if (mid.Feasible) pass = mid; else fail = mid;
        }
        return (pass, visited);
    }

    /// <summary>Whether the sequence changes direction at most by noise (<see cref="NoiseFraction"/> of its spread).
    /// Missing values are skipped.</summary>
    public static bool Monotone(IReadOnlyList<double?> values)
    {
        var v = values.Where(x => x is not null).Select(x => x!.Value).ToList();
        if (v.Count < 3) return true;
        double noise = NoiseFraction * (v.Max() - v.Min());
        bool up = false, down = false;
        double low = v[0], high = v[0];
        foreach (double x in v.Skip(1))
        {
            // A fall of more than the noise below the highest value so far, or a rise above the lowest, is a direction.
            if (x < high - noise) down = true;
            if (x > low + noise) up = true;
            high = Math.Max(high, x); low = Math.Min(low, x);
        }
        return !(up && down);
    }
}
