using Seepage.Core.Solvers;

namespace Seepage.Core.Tests.Solvers;

/// <summary>Test fixture: P1 finite elements for div(K grad h) = 0 on a structured rectangle [0,W]×[0,H],
/// nx × ny cells each cut into two right triangles, K = diag(kx, ky) per element (chosen by the element's
/// centroid), fixed heads where <c>head(x, y)</c> returns a value, no-flow elsewhere. Dirichlet rows are
/// eliminated, K_II h_I = −K_ID h_D, and reactions r = K h on fixed nodes give the flow (common practice).
/// Element stiffness k_ab = A (kx b_a b_b + ky c_a c_b), with ∇φ_a = (b_a, c_a) constant on the triangle.</summary>
internal sealed class GridProblem
{
    private readonly int[] _free;          // node → free index or −1
    private readonly double[] _fixedHead;  // node → head (NaN when free)
    private readonly List<(int Row, int Col, double Value)> _entries = new();

    public GridProblem(int nx, int ny, double width, double height,
        Func<double, double, (double Kx, double Ky)> conductivity, Func<double, double, double?> head)
    {
        Nx = nx; Ny = ny;
        int nodes = (nx + 1) * (ny + 1);
        X = new double[nodes]; Y = new double[nodes];
        _free = new int[nodes]; _fixedHead = new double[nodes];
        int free = 0;
        for (int j = 0; j <= ny; j++)
            for (int i = 0; i <= nx; i++)
            {
                int v = j * (nx + 1) + i;
                X[v] = width * i / nx; Y[v] = height * j / ny;
                double? h = head(X[v], Y[v]);
                _fixedHead[v] = h ?? double.NaN;
                _free[v] = h is null ? free++ : -1;
            }
        Unknowns = free;
        for (int j = 0; j < ny; j++)
            for (int i = 0; i < nx; i++)
            {
                int v0 = j * (nx + 1) + i, v1 = v0 + 1, v2 = v0 + nx + 1, v3 = v2 + 1;
                AddTriangle(v0, v1, v3, conductivity);
                AddTriangle(v0, v3, v2, conductivity);
            }
        Full = ToCsr(_entries, nodes);
        var reduced = new List<(int, int, double)>();
        Rhs = new double[free];
        foreach (var (r, c, value) in _entries)
        {
            if (_free[r] < 0) continue;
            if (_free[c] >= 0) reduced.Add((_free[r], _free[c], value));
            else Rhs[_free[r]] -= value * _fixedHead[c];
        }
        Matrix = ToCsr(reduced, free);
    }

    public int Nx { get; }
    public int Ny { get; }
    public double[] X { get; }
    public double[] Y { get; }
    public int Unknowns { get; }
    /// <summary>Stiffness of the free unknowns (SPD).</summary>
    public CsrMatrix Matrix { get; }
    /// <summary>Right-hand side −K_ID h_D.</summary>
    public double[] Rhs { get; }
    /// <summary>Stiffness of all nodes (for reactions).</summary>
    public CsrMatrix Full { get; }

    /// <summary>Heads of all nodes from the free solution.</summary>
    public double[] Heads(double[] solution)
    {
        var h = new double[_free.Length];
        for (int v = 0; v < h.Length; v++) h[v] = _free[v] >= 0 ? solution[_free[v]] : _fixedHead[v];
        return h;
    }

    /// <summary>Sum of reactions (K h)_v over fixed nodes selected by <paramref name="where"/>: the flow into
    /// the domain there, m³/s per metre for K in m/s.</summary>
    public double Flow(double[] solution, Func<double, double, bool> where)
    {
        var h = Heads(solution);
        var kh = new double[h.Length];
        Full.Multiply(h, kh);
        double q = 0;
        for (int v = 0; v < h.Length; v++) if (_free[v] < 0 && where(X[v], Y[v])) q += kh[v];
        return q;
    }

    private void AddTriangle(int a, int b, int c, Func<double, double, (double Kx, double Ky)> conductivity)
    {
        int[] v = { a, b, c };
        double x1 = X[a], y1 = Y[a], x2 = X[b], y2 = Y[b], x3 = X[c], y3 = Y[c];
        double twiceArea = (x2 - x1) * (y3 - y1) - (x3 - x1) * (y2 - y1);
        double[] gx = { (y2 - y3) / twiceArea, (y3 - y1) / twiceArea, (y1 - y2) / twiceArea };
        double[] gy = { (x3 - x2) / twiceArea, (x1 - x3) / twiceArea, (x2 - x1) / twiceArea };
        var (kx, ky) = conductivity((x1 + x2 + x3) / 3, (y1 + y2 + y3) / 3);
        double area = 0.5 * Math.Abs(twiceArea);
        for (int p = 0; p < 3; p++)
            for (int q = 0; q < 3; q++)
                _entries.Add((v[p], v[q], area * (kx * gx[p] * gx[q] + ky * gy[p] * gy[q])));
    }

    /// <summary>Sums duplicates and sorts columns: a COO-to-CSR conversion for test matrices.</summary>
    internal static CsrMatrix ToCsr(IEnumerable<(int Row, int Col, double Value)> entries, int n)
    {
        var sorted = entries.Select(e => (Key: (long)e.Row * n + e.Col, e.Value)).OrderBy(e => e.Key).ToList();
        var rowStart = new int[n + 1]; var cols = new List<int>(); var vals = new List<double>();
        long last = -1;
        foreach (var (key, value) in sorted)
        {
            if (key == last) { vals[^1] += value; continue; }
            last = key;
            cols.Add((int)(key % n)); vals.Add(value);
            rowStart[(int)(key / n) + 1] = cols.Count;
        }
        for (int i = 0; i < n; i++) rowStart[i + 1] = Math.Max(rowStart[i + 1], rowStart[i]);
        return new CsrMatrix(n, rowStart, cols.ToArray(), vals.ToArray());
    }
}
