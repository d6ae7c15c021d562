using System.Diagnostics;

namespace Seepage.Core.Solvers;

/// <summary>Smoothed-aggregation algebraic multigrid, one V(1,1) cycle per application, for the SPD
/// matrices of P1 heads (Vaněk, Mandel and Brezina, "Algebraic multigrid by smoothed aggregation for
/// second and fourth order elliptic problems", Computing 56, 1996, 179–196 — recalled from memory).
/// Setup per level: symmetric strength |a_ij| ≥ θ_l √(a_ii a_jj) with θ_l = θ·2^{-l}; greedy aggregation;
/// tentative prolongator from the constant near-null space; prolongator smoothing with ω = (4/3)/ρ(D⁻¹A),
/// ρ from 8 Lanczos steps; Galerkin coarse matrix A_c = Pᵀ A P by two sparse products. Coarsening stops
/// at <see cref="SolverOptions.CoarsestSize"/> rows, where a dense Cholesky factor solves exactly.
/// Smoother: damped Jacobi with the same ω, one sweep before and one after the coarse correction, so the
/// cycle is a symmetric positive definite operator and fits conjugate gradients. Apply uses work vectors
/// held by the levels: one application at a time per instance.</summary>
public sealed class AlgebraicMultigridPreconditioner : IPreconditioner
{
    private const int MaxLevels = 25;
    private const int DenseLimit = 4000;
    private readonly AmgLevel[] _levels;
    private readonly DenseCholesky? _coarseFactor;

    public AlgebraicMultigridPreconditioner(CsrMatrix a, SolverOptions? options = null, CancellationToken cancellation = default)
        : this(a, options ?? new SolverOptions(), cancellation, Stopwatch.StartNew(), null) { }

    internal AlgebraicMultigridPreconditioner(CsrMatrix a, SolverOptions options, CancellationToken cancellation, Stopwatch clock,
        double[]? fineDiagonal)
    {
        var start = clock.Elapsed;
        var levels = new List<AmgLevel>();
        var matrix = a;
        var candidate = new double[a.Size]; Array.Fill(candidate, 1.0);
        long totalNonZeros = 0;
        while (true)
        {
            cancellation.ThrowIfCancellationRequested();
            if (options.TimeBudget is { } budget && clock.Elapsed > budget)
                throw new SolverNotConvergedException(Name, 0, double.NaN, options.RelativeTolerance,
                    $"time budget exceeded during multigrid setup (level {levels.Count})");
            totalNonZeros += matrix.NonZeros;
            var diagonal = levels.Count == 0 && fineDiagonal is not null ? fineDiagonal : matrix.Diagonal();
            bool last = matrix.Size <= options.CoarsestSize || levels.Count == MaxLevels - 1;
            (int[] Aggregate, int Count) aggregation = default;
            if (!last)
            {
                double theta = options.StrengthThreshold * Math.Pow(0.5, levels.Count);
                aggregation = Aggregation.Build(matrix, diagonal, theta);
                last = aggregation.Count == 0 || aggregation.Count > 0.85 * matrix.Size;
            }
            if (last && matrix.Size <= DenseLimit)
            {
                levels.Add(new AmgLevel(matrix, new double[matrix.Size], null, null));
                _coarseFactor = new DenseCholesky(matrix);
                break;
            }
            double omega = 4.0 / 3.0 / SpectralRadius.OfJacobi(matrix, diagonal, 8);
            var weight = new double[matrix.Size];
            for (int i = 0; i < weight.Length; i++) weight[i] = diagonal[i] > 0 ? omega / diagonal[i] : 0;
            if (last)
            {
                levels.Add(new AmgLevel(matrix, weight, null, null));   // coarsening stalled: smoothed, not factored
                break;
            }
            var (p, coarseCandidate) = SmoothedProlongator.Build(matrix, diagonal, aggregation.Aggregate!, aggregation.Count, candidate, omega);
            var r = p.Transpose();
            var coarse = SparseProduct.Multiply(r, SparseProduct.Multiply(matrix, p));
            levels.Add(new AmgLevel(matrix, weight, p, r));
            matrix = coarse;
            candidate = coarseCandidate;
        }
        _levels = levels.ToArray();
        OperatorComplexity = (double)totalNonZeros / Math.Max(1, a.NonZeros);
        SetupSeconds = (clock.Elapsed - start).TotalSeconds;
    }

    public string Name => "smoothed-aggregation AMG V(1,1)";
    public int Levels => _levels.Length;
    /// <summary>Σ nnz(A_l) / nnz(A_0), dimensionless.</summary>
    public double OperatorComplexity { get; }
    /// <summary>Wall time of the setup, seconds.</summary>
    public double SetupSeconds { get; }
    /// <summary>Rows per level, finest first.</summary>
    public IReadOnlyList<int> LevelSizes => _levels.Select(l => l.A.Size).ToArray();

    public unsafe void Apply(ReadOnlySpan<double> r, Span<double> z)
    {
        fixed (double* b = r, x = z) Cycle(0, b, x);
    }

    private unsafe void Cycle(int l, double* b, double* x)
    {
        var level = _levels[l];
        if (l == _levels.Length - 1)
        {
            if (_coarseFactor is not null)
                _coarseFactor.Solve(new ReadOnlySpan<double>(b, level.A.Size), new Span<double>(x, level.A.Size));
            else level.SmoothOnly(b, x, 8);
            return;
        }
        fixed (double* work = level.Work, coarseB = level.CoarseB, coarseX = level.CoarseX)
        {
            level.PreSmoothResidual(b, work);
            level.Restrict(work, coarseB);
            Cycle(l + 1, coarseB, coarseX);
            level.ProlongAdd(b, coarseX, work);
            level.PostSmooth(b, work, x);
        }
    }
}
