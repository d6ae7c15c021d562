using Seepage.Core.Solvers;

namespace Seepage.Core.Tests.Solvers;

// Format: Boisvert, Pozo and Remington, "The Matrix Market exchange formats: initial design", NIST IR 5935, 1996.
public class MatrixMarketTests
{
    [Fact]
    public void Write_SymmetricMatrix_ReadsBackExactly()
    {
        var a = Problems.PartialHeads(6, 1e3, 3).Matrix;
        var text = new StringWriter();
        MatrixMarket.Write(a, text);
        Assert.StartsWith("%%MatrixMarket matrix coordinate real symmetric", text.ToString());
        var back = MatrixMarket.ReadMatrix(new StringReader(text.ToString()));
        Assert.Equal(a.RowStart, back.RowStart);
        Assert.Equal(a.Columns, back.Columns);
        Assert.Equal(a.Values, back.Values);
    }

    [Fact]
    public void Write_UnsymmetricMatrix_WritesGeneralAndReadsBack()
    {
        var a = new CsrMatrix(2, new[] { 0, 2, 3 }, new[] { 0, 1, 1 }, new[] { 4.0, -1.0 / 3, 2.5 });
        var text = new StringWriter();
        MatrixMarket.Write(a, text);
        Assert.StartsWith("%%MatrixMarket matrix coordinate real general", text.ToString());
        var back = MatrixMarket.ReadMatrix(new StringReader(text.ToString()));
        Assert.Equal(a.Columns, back.Columns);
        Assert.Equal(a.Values, back.Values);
    }

    [Fact]
    public void WriteVector_Values_ReadBackExactly()
    {
        double[] v = { Math.PI, -1e-300, 0, 1.0 / 3 };
        var text = new StringWriter();
        MatrixMarket.WriteVector(v, text);
        Assert.StartsWith("%%MatrixMarket matrix array real general", text.ToString());
        Assert.Equal(v, MatrixMarket.ReadVector(new StringReader(text.ToString())));
    }
}
