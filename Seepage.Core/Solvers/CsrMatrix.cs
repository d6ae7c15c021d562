namespace Seepage.Core.Solvers;

/// <summary>A square sparse matrix in compressed sparse row form (int32 indices, columns sorted per row).</summary>
public sealed class CsrMatrix
{
    public CsrMatrix(int size, int[] rowStart, int[] columns, double[] values)
    {
        if (rowStart.Length != size + 1) throw new ArgumentException("rowStart must have size + 1 entries.");
        if (columns.Length != values.Length) throw new ArgumentException("columns and values differ in length.");
        Size = size; RowStart = rowStart; Columns = columns; Values = values;
    }

    public int Size { get; }
    public int[] RowStart { get; }
    public int[] Columns { get; }
    public double[] Values { get; }
    public int NonZeros => Values.Length;

    /// <summary>y = A x.</summary>
    public void Multiply(ReadOnlySpan<double> x, Span<double> y)
    {
        for (int i = 0; i < Size; i++)
        {
            double sum = 0;
            for (int k = RowStart[i]; k < RowStart[i + 1]; k++) sum += Values[k] * x[Columns[k]];
            y[i] = sum;
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
}
