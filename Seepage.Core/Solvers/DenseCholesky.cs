using System.Numerics;

namespace Seepage.Core.Solvers;

/// <summary>Dense Cholesky factor A = L Lᵀ of the coarsest multigrid level (a few hundred rows), stored row
/// by row so that each entry is one contiguous dot product: L_ij = (a_ij − Σ_{k&lt;j} L_ik L_jk) / L_jj
/// (Golub and Van Loan, "Matrix Computations", 4th ed. 2013, §4.2 — from memory).</summary>
internal sealed class DenseCholesky
{
    private readonly double[] _l;   // n × n, row major, lower triangle used
    private readonly int _n;

    public DenseCholesky(CsrMatrix a)
    {
        int n = _n = a.Size;
        _l = new double[(long)n * n];
        for (int i = 0; i < n; i++)
            for (int k = a.RowStart[i]; k < a.RowStart[i + 1]; k++)
                if (a.Columns[k] <= i) _l[i * n + a.Columns[k]] += a.Values[k];
        var l = _l.AsSpan();
        for (int i = 0; i < n; i++)
        {
            var rowI = l.Slice(i * n, n);
            double scale = Math.Abs(rowI[i]);
            for (int j = 0; j < i; j++)
            {
                double s = rowI[j] - Dot(rowI[..j], l.Slice(j * n, j));
                rowI[j] = s / l[j * n + j];
            }
            double pivot = rowI[i] - Dot(rowI[..i], rowI[..i]);
            if (!(pivot > 1e-13 * scale))
                throw new SolverNotConvergedException("dense Cholesky (coarsest level)", 0, double.NaN, 0,
                    FormattableString.Invariant($"matrix not positive definite: pivot {pivot:E3} at coarse row {i} of {n}"));
            rowI[i] = Math.Sqrt(pivot);
        }
    }

    public int Size => _n;

    /// <summary>x = A⁻¹ b by forward and back substitution.</summary>
    public void Solve(ReadOnlySpan<double> b, Span<double> x)
    {
        int n = _n; var l = _l.AsSpan();
        for (int i = 0; i < n; i++) x[i] = (b[i] - Dot(l.Slice(i * n, i), x[..i])) / l[i * n + i];
        for (int i = n - 1; i >= 0; i--)
        {
            double xi = x[i] /= l[i * n + i];
            for (int k = 0; k < i; k++) x[k] -= l[i * n + k] * xi;
        }
    }

    private static double Dot(ReadOnlySpan<double> u, ReadOnlySpan<double> v)
    {
        int w = Vector<double>.Count, i = 0;
        var acc = Vector<double>.Zero;
        for (; i + w <= u.Length; i += w) acc += new Vector<double>(u[i..]) * new Vector<double>(v[i..]);
        double s = Vector.Sum(acc);
        for (; i < u.Length; i++) s += u[i] * v[i];
        return s;
    }
}
