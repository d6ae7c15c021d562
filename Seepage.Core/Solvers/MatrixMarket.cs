using System.Globalization;

namespace Seepage.Core.Solvers;

/// <summary>Matrix Market exchange format (Boisvert, Pozo and Remington, "The Matrix Market exchange formats:
/// initial design", NIST IR 5935, 1996): sparse matrices as <c>coordinate real symmetric</c> (lower
/// triangle only) when exactly symmetric, otherwise <c>coordinate real general</c>; vectors as
/// <c>array real</c> with one column. Indices are 1-based; values are written round-trip exact.
/// For handing a system to outside tools when a solve needs checking.</summary>
public static class MatrixMarket
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    public static void Write(CsrMatrix a, TextWriter writer)
    {
        bool symmetric = a.IsSymmetric();
        int entries = 0;
        for (int i = 0; i < a.Size; i++)
            for (int k = a.RowStart[i]; k < a.RowStart[i + 1]; k++)
                if (!symmetric || a.Columns[k] <= i) entries++;
        writer.Write("%%MatrixMarket matrix coordinate real ");
        writer.WriteLine(symmetric ? "symmetric" : "general");
        writer.WriteLine("% written by Seepage");
        writer.WriteLine(string.Create(Invariant, $"{a.Size} {a.ColumnCount} {entries}"));
        for (int i = 0; i < a.Size; i++)
            for (int k = a.RowStart[i]; k < a.RowStart[i + 1]; k++)
                if (!symmetric || a.Columns[k] <= i)
                    writer.WriteLine(string.Create(Invariant, $"{i + 1} {a.Columns[k] + 1} {a.Values[k]:R}"));
    }

    public static void WriteVector(ReadOnlySpan<double> v, TextWriter writer)
    {
        writer.WriteLine("%%MatrixMarket matrix array real general");
        writer.WriteLine(string.Create(Invariant, $"{v.Length} 1"));
        foreach (double value in v) writer.WriteLine(value.ToString("R", Invariant));
    }

    /// <summary>Reads a square <c>coordinate real</c> matrix (general or symmetric); duplicates are summed.</summary>
    public static CsrMatrix ReadMatrix(TextReader reader)
    {
        string header = reader.ReadLine() ?? throw new FormatException("empty Matrix Market file");
        var words = header.ToLowerInvariant().Split(' ', StringSplitOptions.RemoveEmptyEntries);
        if (words.Length < 5 || words[0] != "%%matrixmarket" || words[1] != "matrix" || words[2] != "coordinate" || words[3] != "real")
            throw new FormatException($"unsupported header: {header}");
        bool symmetric = words[4] == "symmetric";
        if (!symmetric && words[4] != "general") throw new FormatException($"unsupported symmetry: {words[4]}");
        var size = Numbers(NextDataLine(reader));
        int n = (int)size[0], entries = (int)size[2];
        if (size[1] != n) throw new FormatException("only square matrices are read");
        var rows = new List<(int Row, int Col, double Value)>(symmetric ? 2 * entries : entries);
        for (int e = 0; e < entries; e++)
        {
            var t = Numbers(NextDataLine(reader));
            int i = (int)t[0] - 1, j = (int)t[1] - 1;
            rows.Add((i, j, t[2]));
            if (symmetric && i != j) rows.Add((j, i, t[2]));
        }
        rows.Sort((p, q) => p.Row != q.Row ? p.Row.CompareTo(q.Row) : p.Col.CompareTo(q.Col));
        var rowStart = new int[n + 1]; var cols = new List<int>(rows.Count); var vals = new List<double>(rows.Count);
        for (int k = 0; k < rows.Count; k++)
        {
            var (i, j, v) = rows[k];
            if (k > 0 && rows[k - 1].Row == i && rows[k - 1].Col == j) { vals[^1] += v; continue; }
            cols.Add(j); vals.Add(v); rowStart[i + 1] = cols.Count;
        }
        for (int i = 0; i < n; i++) rowStart[i + 1] = Math.Max(rowStart[i + 1], rowStart[i]);
        return new CsrMatrix(n, rowStart, cols.ToArray(), vals.ToArray());
    }

    /// <summary>Reads an <c>array real</c> vector (one column).</summary>
    public static double[] ReadVector(TextReader reader)
    {
        string header = reader.ReadLine() ?? throw new FormatException("empty Matrix Market file");
        if (!header.ToLowerInvariant().StartsWith("%%matrixmarket matrix array real", StringComparison.Ordinal))
            throw new FormatException($"unsupported header: {header}");
        var size = Numbers(NextDataLine(reader));
        if (size[1] != 1) throw new FormatException("only single-column arrays are read");
        var v = new double[(int)size[0]];
        for (int i = 0; i < v.Length; i++) v[i] = Numbers(NextDataLine(reader))[0];
        return v;
    }

    private static string NextDataLine(TextReader reader)
    {
        while (reader.ReadLine() is { } line)
            if (line.Length > 0 && line[0] != '%' && !string.IsNullOrWhiteSpace(line)) return line;
        throw new FormatException("Matrix Market file ends early");
    }

    private static double[] Numbers(string line) =>
        line.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries).Select(s => double.Parse(s, Invariant)).ToArray();
}
