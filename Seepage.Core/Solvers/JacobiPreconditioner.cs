namespace Seepage.Core.Solvers;

/// <summary>Diagonal scaling, z = D⁻¹ r: the cheapest fallback preconditioner.</summary>
public sealed class JacobiPreconditioner : IPreconditioner
{
    private readonly double[] _inverseDiagonal;

    public JacobiPreconditioner(CsrMatrix a)
    {
        var d = a.Diagonal();
        _inverseDiagonal = new double[d.Length];
        for (int i = 0; i < d.Length; i++) _inverseDiagonal[i] = d[i] > 0 ? 1.0 / d[i] : 1.0;
    }

    public string Name => "Jacobi";
    public int Levels => 1;
    public double OperatorComplexity => 1;

    public void Apply(ReadOnlySpan<double> r, Span<double> z)
    {
        for (int i = 0; i < r.Length; i++) z[i] = _inverseDiagonal[i] * r[i];
    }
}
