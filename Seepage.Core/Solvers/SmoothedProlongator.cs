namespace Seepage.Core.Solvers;

/// <summary>The prolongator of smoothed aggregation: P = (I − ω D⁻¹ A) T, where the tentative T carries the
/// near-null-space candidate B (the constant on the finest level: heads are defined up to a constant away
/// from the fixed-head boundary) restricted to each aggregate and normalised, so that T Bc = B with
/// Bc_J = ‖B|_J‖₂ (Vaněk, Mandel and Brezina, Computing 56, 1996, from memory).
/// ω = (4/3)/ρ(D⁻¹A), the choice made in that paper, minimises the energy of the smoothed basis.</summary>
internal static class SmoothedProlongator
{
    public static (CsrMatrix P, double[] CoarseCandidate) Build(CsrMatrix a, double[] diagonal, int[] aggregate,
        int count, double[] candidate, double omega)
    {
        int n = a.Size;
        var norm = new double[count];
        for (int i = 0; i < n; i++) if (aggregate[i] >= 0) norm[aggregate[i]] += candidate[i] * candidate[i];
        for (int j = 0; j < count; j++) norm[j] = Math.Sqrt(norm[j]);

        // Tentative prolongator T: one entry per aggregated row.
        var tStart = new int[n + 1]; int nnz = 0;
        for (int i = 0; i < n; i++) { if (aggregate[i] >= 0) nnz++; tStart[i + 1] = nnz; }
        var tCols = new int[nnz]; var tVals = new double[nnz];
        for (int i = 0, k = 0; i < n; i++)
        {
            int g = aggregate[i];
            if (g < 0) continue;
            tCols[k] = g;
            tVals[k++] = norm[g] > 0 ? candidate[i] / norm[g] : 0;
        }
        var t = new CsrMatrix(n, count, tStart, tCols, tVals);

        // P = T − ω D⁻¹ (A T); the pattern of A T holds that of T because every a_ii ≠ 0.
        var p = SparseProduct.Multiply(a, t);
        var rs = p.RowStart; var cols = p.Columns; var vals = p.Values;
        TwoWay.For(n, p.SplitRow, (lo, hi) =>
        {
            for (int i = lo; i < hi; i++)
            {
                double scale = diagonal[i] != 0 ? -omega / diagonal[i] : 0;
                int g = aggregate[i];
                double own = g >= 0 ? tVals[tStart[i]] : 0;
                for (int k = rs[i]; k < rs[i + 1]; k++)
                {
                    vals[k] *= scale;
                    if (cols[k] == g) vals[k] += own;
                }
            }
        });
        return (p, norm);
    }
}
