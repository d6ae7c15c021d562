using Seepage.Core.Solvers;

namespace Seepage.Core.Fem;

/// <summary>
/// The condensed system of the free nodes after eliminating fixed heads, which keeps it symmetric positive
/// definite: K_FF h_F = −K_FD h_D. <see cref="Full"/> keeps the whole K for the reactions R = K h.
/// </summary>
public sealed class LinearSystem
{
    private LinearSystem(CsrMatrix full, CsrMatrix matrix, double[] rhs, int[] freeIndex, int[] freeNodes, FixedHeads fixedHeads)
    {
        Full = full; Matrix = matrix; Rhs = rhs; FreeIndex = freeIndex; FreeNodes = freeNodes; FixedHeads = fixedHeads;
    }

    public CsrMatrix Full { get; }
    public CsrMatrix Matrix { get; }
    public double[] Rhs { get; }
    /// <summary>Unknown number of each node, −1 for fixed nodes.</summary>
    public int[] FreeIndex { get; }
    /// <summary>Node of each unknown.</summary>
    public int[] FreeNodes { get; }
    public FixedHeads FixedHeads { get; }

    public static LinearSystem Condense(CsrMatrix full, FixedHeads fixedHeads)
    {
        int n = full.Size;
        var freeIndex = new int[n];
        int m = 0;
        for (int i = 0; i < n; i++) freeIndex[i] = fixedHeads.IsFixed[i] ? -1 : m++;
        var freeNodes = new int[m];
        for (int i = 0; i < n; i++) if (freeIndex[i] >= 0) freeNodes[freeIndex[i]] = i;

        var rowStart = new int[m + 1];
        for (int r = 0; r < m; r++)
        {
            int i = freeNodes[r], c = 0;
            for (int k = full.RowStart[i]; k < full.RowStart[i + 1]; k++) if (freeIndex[full.Columns[k]] >= 0) c++;
            rowStart[r + 1] = rowStart[r] + c;
        }
        var cols = new int[rowStart[m]]; var vals = new double[rowStart[m]]; var rhs = new double[m];
        for (int r = 0; r < m; r++)
        {
            int i = freeNodes[r], w = rowStart[r];
            double b = 0;
            for (int k = full.RowStart[i]; k < full.RowStart[i + 1]; k++)
            {
                int j = full.Columns[k];
                if (freeIndex[j] >= 0) { cols[w] = freeIndex[j]; vals[w] = full.Values[k]; w++; }
                else b -= full.Values[k] * fixedHeads.Value[j];
            }
            rhs[r] = b;
        }
        return new LinearSystem(full, new CsrMatrix(m, rowStart, cols, vals), rhs, freeIndex, freeNodes, fixedHeads);
    }

    /// <summary>Nodal heads of all nodes from the solution of the free unknowns.</summary>
    public double[] Expand(double[] free)
    {
        var h = (double[])FixedHeads.Value.Clone();
        for (int r = 0; r < FreeNodes.Length; r++) h[FreeNodes[r]] = free[r];
        return h;
    }
}
