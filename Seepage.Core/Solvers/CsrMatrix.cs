namespace Seepage.Core.Solvers;

/// <summary>A square sparse matrix in compressed sparse row form (int32 indices, columns sorted per row).
/// Products with long vectors run on two threads with a fixed, nonzero-balanced row split, so results do
/// not depend on thread timing.</summary>
public sealed class CsrMatrix
{
    private int _split = -1;

    public CsrMatrix(int size, int[] rowStart, int[] columns, double[] values)
        : this(size, size, rowStart, columns, values) { }

    /// <summary>A rectangular matrix (prolongators and restrictions of the multigrid hierarchy).</summary>
    internal CsrMatrix(int rows, int columnCount, int[] rowStart, int[] columns, double[] values)
    {
        if (rowStart.Length != rows + 1) throw new ArgumentException("rowStart must have size + 1 entries.");
        if (columns.Length != values.Length) throw new ArgumentException("columns and values differ in length.");
        if (rowStart[rows] > columns.Length) throw new ArgumentException("rowStart points past the end of columns.");
        Size = rows; ColumnCount = columnCount; RowStart = rowStart; Columns = columns; Values = values;
    }

    /// <summary>Number of rows.</summary>
    public int Size { get; }
    /// <summary>Number of columns (equal to <see cref="Size"/> for the public square constructor).</summary>
    public int ColumnCount { get; }
    public int[] RowStart { get; }
    public int[] Columns { get; }
    public double[] Values { get; }
    public int NonZeros => RowStart[Size];

    /// <summary>First row of the second thread's half: the row where half the nonzeros are done.</summary>
    internal int SplitRow
    {
        get
        {
            if (_split < 0)
            {
                int half = NonZeros / 2, at = Array.BinarySearch(RowStart, 0, Size + 1, half);
                _split = at >= 0 ? at : ~at;
                _split = Math.Clamp(_split, 0, Size);
            }
            return _split;
        }
    }

    /// <summary>y = A x.</summary>
    public unsafe void Multiply(ReadOnlySpan<double> x, Span<double> y)
    {
        if (x.Length < ColumnCount || y.Length < Size) throw new ArgumentException("vector lengths do not match the matrix.");
        fixed (double* px = x, py = y)
        {
            nint ax = (nint)px, ay = (nint)py;
            TwoWay.For(Size, SplitRow, (lo, hi) => MultiplyRows((double*)ax, (double*)ay, lo, hi));
        }
    }

    /// <summary>y = A x and returns xᵀ y (the CG curvature pᵀ A p, fused into the product).</summary>
    public unsafe double MultiplyDot(ReadOnlySpan<double> x, Span<double> y)
    {
        if (x.Length < ColumnCount || y.Length < Size) throw new ArgumentException("vector lengths do not match the matrix.");
        fixed (double* px = x, py = y)
        {
            nint ax = (nint)px, ay = (nint)py;
            return TwoWay.Sum(Size, SplitRow, (lo, hi) =>
            {
                MultiplyRows((double*)ax, (double*)ay, lo, hi);
                double s = 0;
                for (int i = lo; i < hi; i++) s += ((double*)ax)[i] * ((double*)ay)[i];
                return s;
            });
        }
    }

    internal unsafe void MultiplyRows(double* x, double* y, int lo, int hi)
    {
        fixed (int* rs = RowStart, cols = Columns)
        fixed (double* vals = Values)
        {
            for (int i = lo; i < hi; i++)
            {
                double s0 = 0, s1 = 0;
                int k = rs[i], end = rs[i + 1];
                for (; k + 1 < end; k += 2) { s0 += vals[k] * x[cols[k]]; s1 += vals[k + 1] * x[cols[k + 1]]; }
                if (k < end) s0 += vals[k] * x[cols[k]];
                y[i] = s0 + s1;
            }
        }
    }

    /// <summary>The diagonal entries (zero where a row has none).</summary>
    public double[] Diagonal()
    {
        var d = new double[Size];
        for (int i = 0; i < Size; i++)
            for (int k = RowStart[i]; k < RowStart[i + 1]; k++)
                if (Columns[k] == i) { d[i] = Values[k]; break; }
        return d;
    }

    /// <summary>Aᵀ, columns sorted per row (a counting sort by column, O(nnz)).</summary>
    public CsrMatrix Transpose()
    {
        int nnz = NonZeros;
        var start = new int[ColumnCount + 1];
        for (int k = 0; k < nnz; k++) start[Columns[k] + 1]++;
        for (int j = 0; j < ColumnCount; j++) start[j + 1] += start[j];
        var next = (int[])start.Clone();
        var cols = new int[nnz]; var vals = new double[nnz];
        for (int i = 0; i < Size; i++)
            for (int k = RowStart[i]; k < RowStart[i + 1]; k++)
            {
                int at = next[Columns[k]]++;
                cols[at] = i; vals[at] = Values[k];
            }
        return new CsrMatrix(ColumnCount, Size, start, cols, vals);
    }

    /// <summary>True when the matrix equals its transpose entry by entry (to the given relative tolerance).
    /// Needs sorted columns per row.</summary>
    public bool IsSymmetric(double relativeTolerance = 0)
    {
        if (Size != ColumnCount) return false;
        var t = Transpose();
        for (int i = 0; i < Size; i++)
        {
            int a = RowStart[i], b = t.RowStart[i], len = RowStart[i + 1] - a;
            if (len != t.RowStart[i + 1] - b) return false;
            for (int k = 0; k < len; k++)
            {
                if (Columns[a + k] != t.Columns[b + k]) return false;
                double u = Values[a + k], v = t.Values[b + k];
                if (Math.Abs(u - v) > relativeTolerance * Math.Max(Math.Abs(u), Math.Abs(v))) return false;
            }
        }
        return true;
    }
}
