namespace Seepage.Core.Solvers;

/// <summary>Incomplete Cholesky without fill, IC(0): L has the pattern of the lower triangle of A and
/// L Lᵀ matches A on that pattern (Saad, "Iterative Methods for Sparse Linear Systems", 2nd ed., SIAM 2003,
/// §10.3 — from memory). If a pivot fails (possible for non-M-matrices) the factor is rebuilt for
/// A + α diag(A) with α doubling from 1e-3 (Manteuffel's shift). Serial: a fallback, not the default.
/// Requires sorted columns per row.</summary>
public sealed class IncompleteCholeskyPreconditioner : IPreconditioner
{
    private readonly int _n;
    private readonly int[] _start;   // lower-triangle rows, diagonal last
    private readonly int[] _cols;
    private readonly double[] _vals;

    public IncompleteCholeskyPreconditioner(CsrMatrix a)
    {
        _n = a.Size;
        _start = new int[_n + 1];
        int nnz = 0;
        for (int i = 0; i < _n; i++)
        {
            for (int k = a.RowStart[i]; k < a.RowStart[i + 1]; k++) if (a.Columns[k] <= i) nnz++;
            _start[i + 1] = nnz;
        }
        _cols = new int[nnz]; _vals = new double[nnz];
        for (double shift = 0; ; shift = shift == 0 ? 1e-3 : 2 * shift)
        {
            if (Factor(a, shift)) { Shift = shift; break; }
            if (shift > 1e3) throw new SolverNotConvergedException(Name, 0, double.NaN, 0, "incomplete Cholesky failed for every diagonal shift");
        }
    }

    public string Name => "IC(0)";
    public int Levels => 1;
    public double OperatorComplexity => 1;
    /// <summary>Relative diagonal shift α the factor needed (0 when none), dimensionless.</summary>
    public double Shift { get; private set; }

    private bool Factor(CsrMatrix a, double shift)
    {
        int at = 0;
        for (int i = 0; i < _n; i++)
            for (int k = a.RowStart[i]; k < a.RowStart[i + 1]; k++)
            {
                int j = a.Columns[k];
                if (j > i) continue;
                _cols[at] = j;
                _vals[at++] = j == i ? a.Values[k] * (1 + shift) : a.Values[k];
            }
        for (int i = 0; i < _n; i++)
        {
            int lo = _start[i], diag = _start[i + 1] - 1;
            if (diag < lo || _cols[diag] != i) throw new ArgumentException($"row {i} has no diagonal entry.");
            // L_ij = (a_ij − Σ_{k<j} L_ik L_jk) / L_jj over the common pattern of rows i and j (a sorted merge).
            for (int p = lo; p < diag; p++)
            {
                int j = _cols[p];
                double s = _vals[p];
                int q = lo, r = _start[j], rEnd = _start[j + 1] - 1;
                while (q < p && r < rEnd)
                {
                    if (_cols[q] == _cols[r]) { s -= _vals[q] * _vals[r]; q++; r++; }
                    else if (_cols[q] < _cols[r]) q++;
                    else r++;
                }
                _vals[p] = s / _vals[rEnd];
            }
            double d = _vals[diag];
            for (int p = lo; p < diag; p++) d -= _vals[p] * _vals[p];
            if (!(d > 0)) return false;
            _vals[diag] = Math.Sqrt(d);
        }
        return true;
    }

    /// <summary>z = (L Lᵀ)⁻¹ r: forward substitution, then back substitution by columns of Lᵀ.</summary>
    public void Apply(ReadOnlySpan<double> r, Span<double> z)
    {
        for (int i = 0; i < _n; i++)
        {
            double s = r[i];
            int diag = _start[i + 1] - 1;
            for (int p = _start[i]; p < diag; p++) s -= _vals[p] * z[_cols[p]];
            z[i] = s / _vals[diag];
        }
        for (int i = _n - 1; i >= 0; i--)
        {
            int diag = _start[i + 1] - 1;
            double zi = z[i] /= _vals[diag];
            for (int p = _start[i]; p < diag; p++) z[_cols[p]] -= _vals[p] * zi;
        }
    }
}
