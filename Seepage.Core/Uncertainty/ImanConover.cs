using MathNet.Numerics.Distributions;
using MathNet.Numerics.LinearAlgebra;

namespace Seepage.Core.Uncertainty;

/// <summary>
/// Imposes rank correlations on independent samples without changing any variable's values (Iman &amp; Conover, "A
/// distribution-free approach to inducing rank correlation among input variables", Commun. Statist. – Simul. Comput. 11,
/// 1982): scores R (van der Waerden scores Φ⁻¹(i/(N+1)), each column in random order) have correlation E = Q Qᵀ; with the
/// target C = P Pᵀ, R* = R (Q⁻¹)ᵀ Pᵀ has correlation C; each variable's values are then put in the rank order of its column
/// of R*.
/// </summary>
public static class ImanConover
{
    /// <summary>Rearranges the columns <paramref name="columns"/>[variable][sample]; throws ArgumentException when the target
    /// matrix is not positive definite.</summary>
    public static double[][] Rearrange(double[][] columns, IReadOnlyList<VariableCorrelation> correlations, SeededRandom random)
    {
        int k = columns.Length, n = columns[0].Length;
        var target = Matrix<double>.Build.DenseIdentity(k);
        foreach (var c in correlations) { target[c.First, c.Second] = c.Rank; target[c.Second, c.First] = c.Rank; }
        Matrix<double> p;
        try { p = target.Cholesky().Factor; }
        catch (ArgumentException) { throw new ArgumentException("The rank correlations given do not form a positive definite matrix."); }

        var scores = Matrix<double>.Build.Dense(n, k);
        for (int j = 0; j < k; j++)
        {
            var column = Enumerable.Range(1, n).Select(i => Normal.InvCDF(0, 1, i / (n + 1.0))).ToArray();
            random.Shuffle(column);
            for (int i = 0; i < n; i++) scores[i, j] = column[i];
        }
        var e = Correlation(scores);
        var q = e.Cholesky().Factor;
        var adjusted = scores * q.Inverse().Transpose() * p.Transpose();

        var result = new double[k][];
        for (int j = 0; j < k; j++)
        {
            var sorted = columns[j].OrderBy(v => v).ToArray();
            var rank = Ranks(adjusted.Column(j).ToArray());
            result[j] = new double[n];
            for (int i = 0; i < n; i++) result[j][i] = sorted[rank[i]];
        }
        return result;
    }

    /// <summary>Whether the identity plus the given correlations is positive definite (smallest eigenvalue above 1e-9).</summary>
    public static bool IsPositiveDefinite(int count, IReadOnlyList<VariableCorrelation> correlations)
    {
        var c = Matrix<double>.Build.DenseIdentity(count);
        foreach (var p in correlations) { c[p.First, p.Second] = p.Rank; c[p.Second, p.First] = p.Rank; }
        return c.Evd().EigenValues.All(e => e.Real > 1e-9);
    }

    /// <summary>The rank (0-based) of each value in its column; ties broken by position.</summary>
    public static int[] Ranks(double[] values)
    {
        var order = Enumerable.Range(0, values.Length).OrderBy(i => values[i]).ThenBy(i => i).ToArray();
        var rank = new int[values.Length];
        for (int r = 0; r < order.Length; r++) rank[order[r]] = r;
        return rank;
    }

    private static Matrix<double> Correlation(Matrix<double> x)
    {
        int n = x.RowCount, k = x.ColumnCount;
        var centred = x.Clone();
        for (int j = 0; j < k; j++)
        {
            double mean = x.Column(j).Average();
            for (int i = 0; i < n; i++) centred[i, j] -= mean;
        }
        var cov = centred.TransposeThisAndMultiply(centred);
        var c = Matrix<double>.Build.Dense(k, k);
        for (int a = 0; a < k; a++)
            for (int b = 0; b < k; b++) c[a, b] = cov[a, b] / Math.Sqrt(cov[a, a] * cov[b, b]);
        return c;
    }
}
