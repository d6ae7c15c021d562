using MathNet.Numerics.LinearAlgebra.Double;
using Seepage.Core.Solvers;

namespace Seepage.Core.Tests.Solvers;

/// <summary>The pieces of the multigrid setup checked one by one against dense linear algebra
/// (MathNet.Numerics), which is the outside reference here.</summary>
public class MultigridPartsTests
{
    private static CsrMatrix RandomSparse(int rows, int cols, double density, int seed)
    {
        var random = new Random(seed);
        var rowStart = new int[rows + 1]; var c = new List<int>(); var v = new List<double>();
        for (int i = 0; i < rows; i++)
        {
            for (int j = 0; j < cols; j++) if (random.NextDouble() < density) { c.Add(j); v.Add(random.NextDouble() - 0.5); }
            rowStart[i + 1] = c.Count;
        }
        return new CsrMatrix(rows, cols, rowStart, c.ToArray(), v.ToArray());
    }

    private static DenseMatrix Dense(CsrMatrix a)
    {
        var d = DenseMatrix.Create(a.Size, a.ColumnCount, 0);
        for (int i = 0; i < a.Size; i++)
            for (int k = a.RowStart[i]; k < a.RowStart[i + 1]; k++) d[i, a.Columns[k]] += a.Values[k];
        return d;
    }

    [Fact]
    public void SparseProduct_RectangularFactors_MatchesDenseProduct()
    {
        var a = RandomSparse(37, 23, 0.2, 1);
        var b = RandomSparse(23, 11, 0.3, 2);
        var c = SparseProduct.Multiply(a, b);
        Assert.True((Dense(c) - Dense(a) * Dense(b)).FrobeniusNorm() <= 1e-13 * (Dense(a).FrobeniusNorm() * Dense(b).FrobeniusNorm()));
        for (int i = 0; i < c.Size; i++)
            for (int k = c.RowStart[i] + 1; k < c.RowStart[i + 1]; k++) Assert.True(c.Columns[k - 1] < c.Columns[k]);
    }

    [Fact]
    public void Transpose_Random_MatchesDenseTranspose()
    {
        var a = RandomSparse(19, 31, 0.25, 3);
        Assert.Equal(0, (Dense(a.Transpose()) - Dense(a).Transpose()).FrobeniusNorm());
    }

    // Ritz values from Lanczos never exceed λ_max and approach it quickly (Saad 2003, ch. 6, from memory).
    [Fact]
    public void SpectralRadius_GridMatrix_CloseBelowDenseEigenvalue()
    {
        var a = Problems.PartialHeads(8, 1e3, 10).Matrix;
        var d = a.Diagonal();
        var scaled = Dense(a);
        for (int i = 0; i < a.Size; i++) for (int j = 0; j < a.Size; j++) scaled[i, j] /= Math.Sqrt(d[i] * d[j]);
        double exact = scaled.Evd(MathNet.Numerics.LinearAlgebra.Symmetricity.Symmetric).EigenValues.Select(e => e.Real).Max();
        double estimate = SpectralRadius.OfJacobi(a, d, 8);
        Assert.InRange(estimate, 0.93 * exact, exact * (1 + 1e-10));
    }

    [Fact]
    public void DenseCholesky_GridMatrix_MatchesMathNet()
    {
        var problem = Problems.PartialHeads(6, 1e3, 3);
        var x = new double[problem.Unknowns];
        new DenseCholesky(problem.Matrix).Solve(problem.Rhs, x);
        var reference = AlgebraicMultigridTests.DenseSolve(problem.Matrix, problem.Rhs);
        for (int i = 0; i < x.Length; i++) Assert.Equal(reference[i], x[i], 1e-12 * reference.Max(Math.Abs));
    }

    [Fact]
    public void Aggregation_Grid_AssignsEveryConnectedRow()
    {
        var a = Problems.PartialHeads(20, 1e3, 1).Matrix;
        var (aggregate, count) = Aggregation.Build(a, a.Diagonal(), 0.08);
        Assert.All(aggregate, g => Assert.InRange(g, 0, count - 1));
        var sizes = aggregate.GroupBy(g => g).Select(g => g.Count()).ToArray();
        Assert.Equal(count, sizes.Length);
        Assert.InRange(a.Size / (double)count, 4, 12);   // a 2-D 7-point graph: roots take about 7 nodes each
    }

    // With zero row sums (interior rows of a Neumann-type Laplacian, common practice) (I − ωD⁻¹A) 1 = 1, so
    // the smoothed prolongator still reproduces the constant there: P Bc = 1 on those rows.
    [Fact]
    public void SmoothedProlongator_InteriorRows_ReproduceConstant()
    {
        var problem = Problems.PartialHeads(16, 1, 1);
        var a = problem.Matrix; var d = a.Diagonal();
        var (aggregate, count) = Aggregation.Build(a, d, 0.08);
        var ones = Enumerable.Repeat(1.0, a.Size).ToArray();
        var (p, coarse) = SmoothedProlongator.Build(a, d, aggregate, count, ones, 4.0 / 3 / SpectralRadius.OfJacobi(a, d));
        var pb = new double[a.Size]; p.Multiply(coarse, pb);
        var rowSum = new double[a.Size]; a.Multiply(ones, rowSum);
        int checkedRows = 0;
        for (int i = 0; i < a.Size; i++)
            if (Math.Abs(rowSum[i]) < 1e-12 * d[i]) { Assert.Equal(1.0, pb[i], 1e-12); checkedRows++; }
        Assert.True(checkedRows > a.Size / 2);
    }

    [Fact]
    public void LinearSolver_DefaultOptions_UsesMultigrid()
    {
        var problem = Problems.PartialHeads(40, 1e3, 1);
        var report = LinearSolver.Solve(problem.Matrix, problem.Rhs, new double[problem.Unknowns], new SolverOptions());
        Assert.Contains("smoothed-aggregation", report.Method);
        Assert.True(report.Levels >= 2);
        Assert.InRange(report.SetupSeconds, 0, report.Seconds);
        Assert.Equal(problem.Unknowns, report.Unknowns);
    }
}
