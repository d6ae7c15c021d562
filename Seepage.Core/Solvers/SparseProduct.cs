namespace Seepage.Core.Solvers;

/// <summary>Sparse matrix product C = A B by Gustavson's row-by-row algorithm with a dense accumulator and
/// a marker array (Gustavson, "Two fast algorithms for sparse matrices: multiplication and permuted
/// transposition", ACM TOMS 4, 1978 — from memory). The two halves of the rows of A are done on two
/// threads, each into its own buffers, then joined; columns are sorted per row.</summary>
internal static class SparseProduct
{
    public static CsrMatrix Multiply(CsrMatrix a, CsrMatrix b)
    {
        if (a.ColumnCount != b.Size) throw new ArgumentException("inner dimensions differ.");
        int n = a.Size, split = a.SplitRow;
        if (!TwoWay.Worthwhile(n))
        {
            var whole = Rows(a, b, 0, n);
            return new CsrMatrix(n, b.ColumnCount, whole.RowStart, Trim(whole.Columns, whole.Count), Trim(whole.Values, whole.Count));
        }
        Part first = default, second = default;
        Parallel.Invoke(() => first = Rows(a, b, 0, split), () => second = Rows(a, b, split, n));
        int nnz = first.Count + second.Count;
        var rowStart = new int[n + 1];
        Array.Copy(first.RowStart, rowStart, split + 1);
        for (int i = 1; i <= n - split; i++) rowStart[split + i] = first.Count + second.RowStart[i];
        var cols = new int[nnz]; var vals = new double[nnz];
        Array.Copy(first.Columns, cols, first.Count); Array.Copy(first.Values, vals, first.Count);
        Array.Copy(second.Columns, 0, cols, first.Count, second.Count);
        Array.Copy(second.Values, 0, vals, first.Count, second.Count);
        return new CsrMatrix(n, b.ColumnCount, rowStart, cols, vals);
    }

    private readonly record struct Part(int[] RowStart, int[] Columns, double[] Values, int Count);

    private static T[] Trim<T>(T[] a, int count) => a.Length == count ? a : a.AsSpan(0, count).ToArray();

    private static Part Rows(CsrMatrix a, CsrMatrix b, int lo, int hi)
    {
        int m = b.ColumnCount;
        var marker = new int[m]; Array.Fill(marker, -1);
        var accumulator = new double[m];
        var rowStart = new int[hi - lo + 1];
        // Upper estimate of the fill: the sum over the rows of a of the lengths of the rows of b it touches,
        // capped by growth on demand below.
        int capacity = Math.Max(16, (int)Math.Min(int.MaxValue / 2, (long)(a.RowStart[hi] - a.RowStart[lo]) * Math.Max(1, b.NonZeros / Math.Max(1, b.Size)) / 2 + 16));
        var cols = new int[capacity]; var vals = new double[capacity];
        int count = 0;
        var aStart = a.RowStart; var aCols = a.Columns; var aVals = a.Values;
        var bStart = b.RowStart; var bCols = b.Columns; var bVals = b.Values;
        for (int i = lo; i < hi; i++)
        {
            int rowBegin = count;
            for (int ka = aStart[i]; ka < aStart[i + 1]; ka++)
            {
                int k = aCols[ka]; double aik = aVals[ka];
                for (int kb = bStart[k]; kb < bStart[k + 1]; kb++)
                {
                    int j = bCols[kb];
                    if (marker[j] < rowBegin)
                    {
                        marker[j] = count;
                        if (count == cols.Length) { Array.Resize(ref cols, cols.Length * 2); Array.Resize(ref vals, vals.Length * 2); }
                        cols[count++] = j;
                        accumulator[j] = aik * bVals[kb];
                    }
                    else accumulator[j] += aik * bVals[kb];
                }
            }
            var rowCols = cols.AsSpan(rowBegin, count - rowBegin);
            rowCols.Sort();
            for (int k = rowBegin; k < count; k++) vals[k] = accumulator[cols[k]];
            rowStart[i - lo + 1] = count;
        }
        return new Part(rowStart, cols, vals, count);
    }
}
