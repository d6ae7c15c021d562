using Seepage.Core.Solvers;

namespace Seepage.Benchmarks;

/// <summary>STAND-IN FOR THE REAL PIPELINE (benchmark only): builds the head system of a layered weir
/// section by P1 assembly on a triangulated structured grid, until the mesher and FE assembly of
/// Seepage.Core are available. Section 160 m × 25 m (x ∈ [−80, 80], y ∈ [−25, 0]): an anisotropic upper
/// layer (kx = 2e-4, ky = 5e-5 m/s) 9 m thick over a layer 10³ less permeable (kx = ky = 5e-8 m/s); two cutoffs
/// at x = −12 m (to 4 m depth) and x = +12 m (to 6.5 m depth) modelled as slits (the grid nodes on each
/// cutoff line, above its tip, are doubled, so elements left and right of it share no node); heads fixed
/// only on two short stretches of the top edge (6 m on x ≤ −68 m, 1.5 m on x ≥ 68 m); everything else
/// no-flow — the hard, mostly Neumann case. Lines are snapped to the nearest grid line.</summary>
internal sealed class LayeredSectionGenerator
{
    private const double Left = -80, Right = 80, Bottom = -25, Top = 0;

    public CsrMatrix Matrix { get; }
    public double[] Rhs { get; }
    public int Nx { get; }
    public int Ny { get; }

    /// <summary>A grid of about <paramref name="unknowns"/> nodes with cells close to square.</summary>
    public LayeredSectionGenerator(int unknowns)
    {
        double aspect = (Right - Left) / (Top - Bottom);
        Ny = Math.Max(4, (int)Math.Round(Math.Sqrt(unknowns / aspect)));
        Nx = Math.Max(8, (int)Math.Round(unknowns / (double)(Ny + 1)) - 1);
        int nx = Nx, ny = Ny;
        double hx = (Right - Left) / nx, hy = (Top - Bottom) / ny;
        int Column(double x) => (int)Math.Round((x - Left) / hx);
        int Row(double y) => (int)Math.Round((y - Bottom) / hy);
        int[] slitColumn = { Column(-12), Column(12) };
        int[] slitTipRow = { Row(-4), Row(-6.5) };

        // Node numbering: grid node (i, j) → j (nx+1) + i; doubled slit nodes get numbers after the grid.
        int gridNodes = (nx + 1) * (ny + 1);
        var twin = new Dictionary<int, int>();
        for (int s = 0; s < 2; s++)
            for (int j = slitTipRow[s] + 1; j <= ny; j++) twin[j * (nx + 1) + slitColumn[s]] = gridNodes + twin.Count;
        int nodes = gridNodes + twin.Count;

        // Fixed heads and the numbering of free unknowns.
        var free = new int[nodes];
        var head = new double[nodes];
        int headUp = Column(-68), headDown = Column(68), count = 0;
        for (int v = 0; v < nodes; v++)
        {
            int g = v < gridNodes ? v : twin.First(p => p.Value == v).Key;
            int i = g % (nx + 1), j = g / (nx + 1);
            bool top = j == ny;
            if (top && i <= headUp) { free[v] = -1; head[v] = 6.0; }
            else if (top && i >= headDown) { free[v] = -1; head[v] = 1.5; }
            else free[v] = count++;
        }

        // Assembly into fixed-width row slots (at most 8 distinct neighbours per row on this grid).
        const int Slots = 8;
        var slotCol = new int[(long)count * Slots];
        var slotVal = new double[(long)count * Slots];
        var used = new byte[count];
        Rhs = new double[count];
        int layerRow = Row(-9);
        Span<int> tri = stackalloc int[3];
        Span<double> gx = stackalloc double[3], gy = stackalloc double[3];
        for (int j = 0; j < ny; j++)
            for (int i = 0; i < nx; i++)
            {
                bool upper = j >= layerRow;
                double kx = upper ? 2e-4 : 5e-8, ky = upper ? 5e-5 : 5e-8;
                int v0 = j * (nx + 1) + i, v1 = v0 + 1, v2 = v0 + nx + 1, v3 = v2 + 1;
                for (int t = 0; t < 2; t++)
                {
                    // Two right triangles per cell: (v0, v1, v3) and (v0, v3, v2); legs hx, hy.
                    tri[0] = v0; tri[1] = t == 0 ? v1 : v3; tri[2] = t == 0 ? v3 : v2;
                    double area = 0.5 * hx * hy;
                    if (t == 0) { gx[0] = -1 / hx; gy[0] = 0; gx[1] = 1 / hx; gy[1] = -1 / hy; gx[2] = 0; gy[2] = 1 / hy; }
                    else { gx[0] = 0; gy[0] = -1 / hy; gx[1] = 1 / hx; gy[1] = 0; gx[2] = -1 / hx; gy[2] = 1 / hy; }
                    for (int a = 0; a < 3; a++) tri[a] = OnSide(tri[a], i, nx, slitColumn, twin);
                    for (int a = 0; a < 3; a++)
                    {
                        int ra = free[tri[a]];
                        if (ra < 0) continue;
                        for (int b = 0; b < 3; b++)
                        {
                            double kab = area * (kx * gx[a] * gx[b] + ky * gy[a] * gy[b]);
                            int cb = free[tri[b]];
                            if (cb < 0) { Rhs[ra] -= kab * head[tri[b]]; continue; }
                            long s0 = (long)ra * Slots; int k = 0;
                            while (k < used[ra] && slotCol[s0 + k] != cb) k++;
                            if (k == used[ra]) { if (k == Slots) throw new InvalidOperationException("row slots exhausted"); slotCol[s0 + k] = cb; used[ra]++; }
                            slotVal[s0 + k] += kab;
                        }
                    }
                }
            }

        // Compact the slots into CSR with sorted columns.
        var rowStart = new int[count + 1];
        for (int r = 0; r < count; r++) rowStart[r + 1] = rowStart[r] + used[r];
        var cols = new int[rowStart[count]]; var vals = new double[rowStart[count]];
        for (int r = 0; r < count; r++)
        {
            int m = used[r]; long s0 = (long)r * Slots;
            Array.Copy(slotCol, s0, cols, rowStart[r], m);
            Array.Copy(slotVal, s0, vals, rowStart[r], m);
            Array.Sort(cols, vals, rowStart[r], m);
        }
        Matrix = new CsrMatrix(count, rowStart, cols, vals);
    }

    /// <summary>An element in cell column <paramref name="cellColumn"/> lying right of a slit uses the doubled node.</summary>
    private static int OnSide(int node, int cellColumn, int nx, int[] slitColumn, Dictionary<int, int> twin)
    {
        int i = node % (nx + 1);
        foreach (int c in slitColumn)
            if (i == c && cellColumn >= c && twin.TryGetValue(node, out int right)) return right;
        return node;
    }
}
