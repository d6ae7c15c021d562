namespace Seepage.Core.Solvers;

/// <summary>The prolongator of smoothed aggregation: P = (I − ω D⁻¹ A) T, where the tentative T carries the
/// near-null-space candidate B (the constant on the finest level: heads are defined up to a constant away
/// from the fixed-head boundary) restricted to each aggregate and normalised, so that T Bc = B with
/// Bc_J = ‖B|_J‖₂ (Vaněk, Mandel and Brezina, Computing 56, 1996, from memory).
/// ω = (4/3)/ρ(D⁻¹A), the choice made in that paper, minimises the energy of the smoothed basis.
/// T has one entry per row, so row i of P is gathered straight from row i of A:
/// P_iJ = δ_{J,g(i)} t_i − (ω/a_ii) Σ_{k: g(k)=J} a_ik t_k, with g the aggregate map and t_k = B_k/Bc_{g(k)}.</summary>
internal static unsafe class SmoothedProlongator
{
    public static (CsrMatrix P, double[] CoarseCandidate) Build(CsrMatrix a, double[] diagonal, int[] aggregate,
        int count, double[] candidate, double omega)
    {
        int n = a.Size;
        var norm = new double[count];
        for (int i = 0; i < n; i++) if (aggregate[i] >= 0) norm[aggregate[i]] += candidate[i] * candidate[i];
        for (int j = 0; j < count; j++) norm[j] = Math.Sqrt(norm[j]);
        var t = GC.AllocateUninitializedArray<double>(n);
        for (int i = 0; i < n; i++) t[i] = aggregate[i] >= 0 && norm[aggregate[i]] > 0 ? candidate[i] / norm[aggregate[i]] : 0;

        var rowStart = new int[n + 1];
        TwoWay.For(n, a.SplitRow, (lo, hi) => CountRows(a, aggregate, rowStart, lo, hi));
        for (int i = 0; i < n; i++) rowStart[i + 1] += rowStart[i];
        var cols = GC.AllocateUninitializedArray<int>(rowStart[n]);
        var vals = GC.AllocateUninitializedArray<double>(rowStart[n]);
        TwoWay.For(n, a.SplitRow, (lo, hi) => FillRows(a, diagonal, aggregate, t, omega, rowStart, cols, vals, lo, hi));
        return (new CsrMatrix(n, count, rowStart, cols, vals), norm);
    }

    /// <summary>rowStart[i+1] = number of distinct aggregates among row i's columns and i itself.</summary>
    private static void CountRows(CsrMatrix a, int[] aggregate, int[] rowStart, int lo, int hi)
    {
        Span<int> seen = stackalloc int[256];
        for (int i = lo; i < hi; i++)
        {
            int len = a.RowStart[i + 1] - a.RowStart[i];
            var buffer = len + 1 <= seen.Length ? seen : new int[len + 1];
            int m = 0;
            for (int k = a.RowStart[i]; k <= a.RowStart[i + 1]; k++)
            {
                int g = k < a.RowStart[i + 1] ? aggregate[a.Columns[k]] : aggregate[i];
                if (g < 0) continue;
                int q = 0;
                while (q < m && buffer[q] != g) q++;
                if (q == m) buffer[m++] = g;
            }
            rowStart[i + 1] = m;
        }
    }

    private static void FillRows(CsrMatrix a, double[] diagonal, int[] aggregate, double[] t, double omega,
        int[] rowStart, int[] cols, double[] vals, int lo, int hi)
    {
        for (int i = lo; i < hi; i++)
        {
            int begin = rowStart[i], m = 0;
            double scale = diagonal[i] != 0 ? -omega / diagonal[i] : 0;
            for (int k = a.RowStart[i]; k <= a.RowStart[i + 1]; k++)
            {
                bool own = k == a.RowStart[i + 1];
                int col = own ? i : a.Columns[k];
                int g = aggregate[col];
                if (g < 0) continue;
                double v = own ? t[i] : scale * a.Values[k] * t[col];
                int q = 0;
                while (q < m && cols[begin + q] != g) q++;
                if (q == m) { cols[begin + m] = g; vals[begin + m] = v; m++; }
                else vals[begin + q] += v;
            }
            // Sort the few entries of the row by column (insertion sort carrying the values).
            for (int p = begin + 1; p < begin + m; p++)
            {
                int c = cols[p]; double v = vals[p]; int q = p - 1;
                while (q >= begin && cols[q] > c) { cols[q + 1] = cols[q]; vals[q + 1] = vals[q]; q--; }
                cols[q + 1] = c; vals[q + 1] = v;
            }
        }
    }
}
