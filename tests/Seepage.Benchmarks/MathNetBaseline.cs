using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearAlgebra.Double;
using MathNet.Numerics.LinearAlgebra.Double.Solvers;
using MathNet.Numerics.LinearAlgebra.Solvers;
using MathNet.Numerics.LinearAlgebra.Storage;
using Seepage.Core.Solvers;

namespace Seepage.Benchmarks;

/// <summary>The comparison solver: MathNet.Numerics' BiCgStab with its MILU0Preconditioner on the same
/// CSR matrix and right-hand side, stopped on the same ‖r‖₂/‖b‖₂ as ours. On the mostly no-flow sections
/// the modified variant (row sums kept, the class default) makes BiCgStab break down — the constant is
/// then nearly in the preconditioner's null space — so the caller may ask for the unmodified variant,
/// MILU0Preconditioner(modified: false), which is ILU(0).</summary>
internal static class MathNetBaseline
{
    public static (double Seconds, int Iterations, double TrueResidual) Solve(CsrMatrix a, double[] b, double tolerance, int maxIterations,
        bool modified = true, double startPerturbation = 0)
    {
        var clock = System.Diagnostics.Stopwatch.StartNew();
        var storage = SparseCompressedRowMatrixStorage<double>.OfCompressedSparseRowFormat(a.Size, a.Size, a.NonZeros,
            (int[])a.RowStart.Clone(), (int[])a.Columns.Clone(), (double[])a.Values.Clone());
        var matrix = new SparseMatrix(storage);
        var rhs = DenseVector.OfArray(b);
        var x = DenseVector.Create(a.Size, 0);
        if (startPerturbation > 0)
        {
            var random = new Random(7);
            for (int i = 0; i < a.Size; i++) x[i] = startPerturbation * (random.NextDouble() - 0.5);
        }
        var criterion = new RelativeResidualCriterion(tolerance);
        var counter = new IterationCountStopCriterion<double>(maxIterations);
        var iterator = new Iterator<double>(criterion, counter);
        new BiCgStab().Solve(matrix, rhs, x, iterator, new MILU0Preconditioner(modified));
        double seconds = clock.Elapsed.TotalSeconds;
        if (iterator.Status != IterationStatus.Converged)
            throw new InvalidOperationException($"baseline stopped with status {iterator.Status} after {criterion.Iterations} iterations");
        var r = rhs - matrix * x;
        return (seconds, criterion.Iterations, r.L2Norm() / rhs.L2Norm());
    }

    /// <summary>Converged when ‖r‖₂ ≤ tolerance ‖b‖₂ (the residual BiCgStab tracks).</summary>
    private sealed class RelativeResidualCriterion(double tolerance) : IIterationStopCriterion<double>
    {
        public int Iterations { get; private set; }
        public IterationStatus Status { get; private set; } = IterationStatus.Continue;

        public IterationStatus DetermineStatus(int iterationNumber, Vector<double> solutionVector, Vector<double> sourceVector, Vector<double> residualVector)
        {
            Iterations = iterationNumber + 1;
            double r = residualVector.L2Norm(), bNorm = sourceVector.L2Norm();
            Status = !double.IsFinite(r) ? IterationStatus.Diverged : r <= tolerance * bNorm ? IterationStatus.Converged : IterationStatus.Continue;
            return Status;
        }

        public void Reset() { Status = IterationStatus.Continue; Iterations = 0; }
        public IIterationStopCriterion<double> Clone() => new RelativeResidualCriterion(tolerance);
    }
}
