namespace Seepage.Core.Uncertainty;

/// <summary>Draws the sample matrix of a study: N rows (samples) of one value per variable. Probabilities come from
/// <see cref="SeededRandom"/> (reproducible from the seed), by Latin hypercube or plain random sampling; rank correlations
/// are then imposed by <see cref="ImanConover"/>; values are each variable's quantile of its probability.</summary>
public static class SampleDesign
{
    public static double[][] Draw(IReadOnlyList<UncertainVariable> variables, int samples, long seed, SamplingMethod method,
        IReadOnlyList<VariableCorrelation> correlations)
    {
        var random = new SeededRandom(seed);
        int k = variables.Count;
        var u = new double[k][];
        for (int j = 0; j < k; j++)
        {
            u[j] = new double[samples];
            if (method == SamplingMethod.LatinHypercube)
            {
                // Stratum i of N holds (i + U)/N; the strata of each variable are permuted independently.
                var order = Enumerable.Range(0, samples).ToArray();
                random.Shuffle(order);
                for (int i = 0; i < samples; i++) u[j][i] = (order[i] + random.NextOpen()) / samples;
            }
            else
                for (int i = 0; i < samples; i++) u[j][i] = random.NextOpen();
        }
        if (correlations.Count > 0 && k > 1) u = ImanConover.Rearrange(u, correlations, random);
        var values = new double[samples][];
        for (int i = 0; i < samples; i++)
        {
            values[i] = new double[k];
            for (int j = 0; j < k; j++) values[i][j] = variables[j].Distribution.Quantile(u[j][i]);
        }
        return values;
    }
}
