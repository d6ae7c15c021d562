namespace Seepage.Core.Uncertainty;

/// <summary>The definition of an uncertainty study: the random variables, optional rank correlations between them, the
/// number of samples, the seed (the same seed gives the same samples) and the sampling method. FosmStep is the
/// central-difference step of the FOSM estimate, in standard deviations of each variable.</summary>
public sealed record UncertaintyStudy(IReadOnlyList<UncertainVariable> Variables, int Samples, long Seed,
    SamplingMethod Sampling = SamplingMethod.LatinHypercube, IReadOnlyList<VariableCorrelation>? Correlations = null,
    double FosmStep = UncertaintyStudy.DefaultFosmStep)
{
    /// <summary>Default number of samples.</summary>
    public const int DefaultSamples = 1000;

    /// <summary>Default seed.</summary>
    public const long DefaultSeed = 1;

    /// <summary>Default FOSM step: 0.1 standard deviation (a derivative, not a secant across the spread).</summary>
    public const double DefaultFosmStep = 0.1;

    /// <summary>The correlations, empty when none are given.</summary>
    public IReadOnlyList<VariableCorrelation> RankCorrelations => Correlations ?? [];

    /// <summary>The correlation matrix assumed between the variables (identity plus the given rank correlations).</summary>
    public double[,] CorrelationMatrix()
    {
        int k = Variables.Count;
        var c = new double[k, k];
        for (int i = 0; i < k; i++) c[i, i] = 1;
        foreach (var r in RankCorrelations) { c[r.First, r.Second] = r.Rank; c[r.Second, r.First] = r.Rank; }
        return c;
    }
}
