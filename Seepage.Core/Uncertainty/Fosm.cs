namespace Seepage.Core.Uncertainty;

/// <summary>The first-order second-moment estimate of one figure: its value at the means of the variables, its standard
/// deviation and the derivative with respect to each variable (figure unit per variable unit).</summary>
public sealed record FosmEstimate(double Mean, double StandardDeviation, IReadOnlyList<double> Derivatives);

/// <summary>
/// First-order second-moment (FOSM) estimates beside the Monte Carlo result (Baecher &amp; Christian, "Reliability and
/// Statistics in Geotechnical Engineering", 2003, ch. 13): E[g] ≈ g(μ), Var[g] ≈ Σᵢ Σⱼ ρᵢⱼ σᵢ σⱼ ∂g/∂xᵢ ∂g/∂xⱼ, the
/// derivatives by central differences about the means with a step of <see cref="UncertaintyStudy.FosmStep"/> standard
/// deviations. The rank correlations given are used as the linear correlations ρᵢⱼ here (an approximation).
/// 2k + 1 evaluations for k variables.
/// </summary>
public static class Fosm
{
    /// <summary>The 2k + 1 points to evaluate: the means, then mean ± step·σ for each variable in turn.</summary>
    public static double[][] Points(UncertaintyStudy study)
    {
        var mean = study.Variables.Select(v => v.Distribution.Mean).ToArray();
        var points = new List<double[]> { mean };
        for (int i = 0; i < mean.Length; i++)
            foreach (int sign in new[] { 1, -1 })
            {
                var p = (double[])mean.Clone();
                p[i] += sign * study.FosmStep * study.Variables[i].Distribution.StandardDeviation;
                points.Add(p);
            }
        return points.ToArray();
    }

    /// <summary>The estimate of each figure from the evaluated <see cref="Points"/>; a figure missing at any point is left out.</summary>
    public static Dictionary<string, FosmEstimate> Estimate(UncertaintyStudy study, IReadOnlyList<SampleFigures?> atPoints)
    {
        int k = study.Variables.Count;
        var sd = study.Variables.Select(v => v.Distribution.StandardDeviation).ToArray();
        var rho = study.CorrelationMatrix();
        var result = new Dictionary<string, FosmEstimate>();
        foreach (string name in SampleFigures.Names)
        {
            var g = atPoints.Select(f => f?.Get(name)).ToArray();
            if (g.Any(v => v is null)) continue;
            var d = new double[k];
            for (int i = 0; i < k; i++) d[i] = (g[1 + 2 * i]!.Value - g[2 + 2 * i]!.Value) / (2 * study.FosmStep * sd[i]);
            double variance = 0;
            for (int i = 0; i < k; i++)
                for (int j = 0; j < k; j++) variance += rho[i, j] * sd[i] * sd[j] * d[i] * d[j];
            result[name] = new FosmEstimate(g[0]!.Value, Math.Sqrt(Math.Max(0, variance)), d);
        }
        return result;
    }
}
