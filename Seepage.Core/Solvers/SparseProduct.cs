namespace Seepage.Core.Solvers;

/// <summary>Sparse matrix product C = A B by Gustavson's row-by-row algorithm with a dense accumulator and
/// a marker array (Gustavson, "Two fast algorithms for sparse matrices: multiplication and permuted
/// transposition", ACM TOMS 4, 1978 — from memory). A symbolic pass counts each row of C, so C is written
/// straight into arrays of the exact size (fresh memory is costly: every new page is a fault). Both passes
/// split the rows of A over two threads at a fixed row; columns are sorted per row.</summary>
internal static unsafe class SparseProduct
{
    public static CsrMatrix Multiply(CsrMatrix a, CsrMatrix b)
    {
        if (a.ColumnCount != b.Size) throw new ArgumentException("inner dimensions differ.");
        int n = a.Size, m = b.ColumnCount;
        int split = TwoWay.Worthwhile(n) ? a.SplitRow : n;
        var rowStart = new int[n + 1];
        Run(n, split, (lo, hi) => Count(a, b, rowStart, lo, hi));
        for (int i = 0; i < n; i++) rowStart[i + 1] += rowStart[i];
        var cols = GC.AllocateUninitializedArray<int>(rowStart[n]);
        var vals = GC.AllocateUninitializedArray<double>(rowStart[n]);
        Run(n, split, (lo, hi) => Fill(a, b, rowStart, cols, vals, lo, hi));
        return new CsrMatrix(n, m, rowStart, cols, vals);
    }

    private static void Run(int n, int split, Action<int, int> body)
    {
        if (split >= n) body(0, n);
        else Parallel.Invoke(() => body(0, split), () => body(split, n));
    }

    /// <summary>rowStart[i+1] = number of distinct columns of row i of A B.</summary>
    private static void Count(CsrMatrix a, CsrMatrix b, int[] rowStart, int lo, int hi)
    {
        var marker = GC.AllocateUninitializedArray<int>(b.ColumnCount); Array.Fill(marker, -1);
        fixed (int* aS = a.RowStart, aC = a.Columns, bS = b.RowStart, bC = b.Columns, mark = marker)
            for (int i = lo; i < hi; i++)
            {
                int count = 0;
                for (int ka = aS[i]; ka < aS[i + 1]; ka++)
                {
                    int k = aC[ka];
                    for (int kb = bS[k], end = bS[k + 1]; kb < end; kb++)
                    {
                        int j = bC[kb];
                        if (mark[j] != i) { mark[j] = i; count++; }
                    }
                }
                rowStart[i + 1] = count;
            }
    }

    private static void Fill(CsrMatrix a, CsrMatrix b, int[] rowStart, int[] cols, double[] vals, int lo, int hi)
    {
        int m = b.ColumnCount;
        var marker = GC.AllocateUninitializedArray<int>(m); Array.Fill(marker, -1);
        var accumulator = GC.AllocateUninitializedArray<double>(m);
        fixed (int* aS = a.RowStart, aC = a.Columns, bS = b.RowStart, bC = b.Columns, mark = marker, c = cols)
        fixed (double* aV = a.Values, bV = b.Values, acc = accumulator, v = vals)
            for (int i = lo; i < hi; i++)
            {
                int begin = rowStart[i], count = begin;
                for (int ka = aS[i]; ka < aS[i + 1]; ka++)
                {
                    int k = aC[ka]; double aik = aV[ka];
                    for (int kb = bS[k], end = bS[k + 1]; kb < end; kb++)
                    {
                        int j = bC[kb];
                        if (mark[j] != i) { mark[j] = i; c[count++] = j; acc[j] = aik * bV[kb]; }
                        else acc[j] += aik * bV[kb];
                    }
                }
                InsertionSort(c + begin, count - begin);
                for (int k = begin; k < count; k++) v[k] = acc[c[k]];
            }
    }

    /// <summary>Rows here hold a few dozen entries at most: insertion sort beats a general sort.</summary>
    internal static void InsertionSort(int* c, int length)
    {
        for (int p = 1; p < length; p++)
        {
            int v = c[p], q = p - 1;
            while (q >= 0 && c[q] > v) { c[q + 1] = c[q]; q--; }
            c[q + 1] = v;
        }
    }
}
