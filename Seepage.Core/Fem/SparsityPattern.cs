using Seepage.Core.Meshing;

namespace Seepage.Core.Fem;

/// <summary>The CSR pattern of the P1 matrix of a mesh: node i couples to itself and to every node sharing a
/// triangle with it. Columns are sorted per row. Built once, without dictionaries.</summary>
public sealed class SparsityPattern
{
    private SparsityPattern(int size, int[] rowStart, int[] columns) { Size = size; RowStart = rowStart; Columns = columns; }

    public int Size { get; }
    public int[] RowStart { get; }
    public int[] Columns { get; }

    public static SparsityPattern Of(Mesh mesh)
    {
        int n = mesh.NodeCount;
        var tri = mesh.Triangles;
        // Upper bound per row: 1 + 2 per incident triangle; fill, then sort and compact each row.
        var count = new int[n + 1];
        foreach (int v in tri) count[v + 1] += 2;
        for (int i = 0; i < n; i++) count[i + 1] += count[i] + 1;
        var start = (int[])count.Clone();
        var fill = new int[count[n]];
        var next = new int[n];
        for (int i = 0; i < n; i++) { fill[start[i]] = i; next[i] = start[i] + 1; }
        for (int t = 0; t < tri.Length; t += 3)
            for (int a = 0; a < 3; a++)
            {
                int i = tri[t + a];
                fill[next[i]++] = tri[t + (a + 1) % 3];
                fill[next[i]++] = tri[t + (a + 2) % 3];
            }
        var rowStart = new int[n + 1];
        int write = 0;
        for (int i = 0; i < n; i++)
        {
            var row = fill.AsSpan(start[i], next[i] - start[i]);
            row.Sort();
            int last = -1;
            rowStart[i] = write;
            foreach (int col in row)
                if (col != last) { fill[write++] = col; last = col; }
        }
        rowStart[n] = write;
        return new SparsityPattern(n, rowStart, fill.AsSpan(0, write).ToArray());
    }

    /// <summary>Position of entry (row, col) in the value array; −1 when absent.</summary>
    public int IndexOf(int row, int col)
    {
        int lo = RowStart[row], hi = RowStart[row + 1] - 1;
        while (lo <= hi)
        {
            int mid = (lo + hi) >> 1;
            int c = Columns[mid];
            if (c == col) return mid;
            if (c < col) lo = mid + 1; else hi = mid - 1;
        }
        return -1;
    }
}
