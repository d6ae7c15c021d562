namespace Seepage.Core.Uncertainty;

/// <summary>
/// The statistics of an uncertainty study over the samples finished so far: each figure's <see cref="FigureStatistics"/>,
/// the probability of failure of the piping (<c>exit</c>) and <c>heave</c> checks, the rank correlation (Spearman) of each
/// variable with each figure as the sensitivity, and how many samples could not be analysed, with the first reasons.
/// </summary>
public sealed record UncertaintySummary(int Analysed, int Failed, IReadOnlyDictionary<string, FigureStatistics> Figures,
    IReadOnlyDictionary<string, CheckProbability> Checks, IReadOnlyDictionary<string, IReadOnlyDictionary<string, double>> Sensitivity,
    IReadOnlyList<string> FailureReasons)
{
    /// <summary>Most distinct reasons kept for samples that could not be analysed.</summary>
    public const int MaxReasons = 5;

    public static UncertaintySummary Of(UncertaintyStudy study, IReadOnlyList<SampleOutcome> outcomes)
    {
        var good = outcomes.Where(o => o.Figures is not null).OrderBy(o => o.Index).ToList(); // the same order on every run
        var figures = new Dictionary<string, FigureStatistics>();
        var sensitivity = study.Variables.Select(v => v.Member).Distinct()
            .ToDictionary(m => m, _ => (IReadOnlyDictionary<string, double>)new Dictionary<string, double>());
        foreach (string name in SampleFigures.Names)
        {
            var with = good.Where(o => o.Figures!.Get(name) is not null).ToList();
            if (with.Count == 0) continue;
            var values = with.Select(o => o.Figures!.Get(name)!.Value).ToList();
            figures[name] = FigureStatistics.Of(values);
            for (int j = 0; j < study.Variables.Count; j++)
                ((Dictionary<string, double>)sensitivity[study.Variables[j].Member])[name] =
                    with.Count > 2 ? Spearman.Rho(with.Select(o => o.Values[j]).ToList(), values) : double.NaN;
        }
        var checks = new Dictionary<string, CheckProbability>();
        Check("exit", f => f.ExitFails, f => f.ExitRequiredFactor);
        Check("heave", f => f.HeaveFails, f => f.HeaveRequiredFactor);
        var reasons = outcomes.Where(o => o.Problem is not null).Select(o => o.Problem!).Distinct().Take(MaxReasons).ToList();
        return new UncertaintySummary(good.Count, outcomes.Count - good.Count, figures, checks, sensitivity, reasons);

        // p_f over the samples that had the check (a factor to compare).
        void Check(string name, Func<SampleFigures, bool?> fails, Func<SampleFigures, double> required)
        {
            var with = good.Where(o => fails(o.Figures!) is not null).ToList();
            if (with.Count > 0)
                checks[name] = CheckProbability.Of(with.Count(o => fails(o.Figures!) == true), with.Count, required(with[0].Figures!));
        }
    }
}
