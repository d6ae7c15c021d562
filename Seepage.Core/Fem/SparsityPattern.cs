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

    public static SparsityPattern Of(Mesh mesh) => Of(mesh.NodeCount, mesh.Triangles, 3);

    /// <summary>The pattern of elements with <paramref name="perElement"/> nodes each (3 for P1, 6 for P2): every
    /// node of an element couples to every other node of it.</summary>
    public static SparsityPattern Of(int n, int[] elements, int perElement)
    {
        // Upper bound per row: 1 + (perElement − 1) per incident element; fill, then sort and compact each row.
        var count = new int[n + 1];
        foreach (int v in elements) count[v + 1] += perElement - 1;
        for (int i = 0; i < n; i++) count[i + 1] += count[i] + 1;
        var start = (int[])count.Clone();
        var fill = new int[count[n]];
        var next = new int[n];
        for (int i = 0; i < n; i++) { fill[start[i]] = i; next[i] = start[i] + 1; }
        for (int t = 0; t < elements.Length; t += perElement)
            for (int a = 0; a < perElement; a++)
            {
                int i = elements[t + a];
                for (int b = 1; b < perElement; b++) fill[next[i]++] = elements[t + (a + b) % perElement];
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
