using System.Diagnostics;
using System.Globalization;
using Seepage.Core.Solvers;

namespace Seepage.Benchmarks;

/// <summary>Solver benchmark: `solve [--sizes 100000,250000,1000000] [--repeats 3] [--baseline-repeats 3]
/// [--source generator|pipeline] [--verbose]`.
/// Prints per size
/// <c>solve unknowns=N seconds=median iterations=n baselineSeconds=median ratio=baseline/ours</c>,
/// seconds = AMG setup + PCG solve to ‖r‖₂/‖b‖₂ ≤ 1e-8; the baseline (MathNet BiCgStab + MILU0, same
/// matrix, rhs and residual; if its default modified MILU0 breaks down, the unmodified variant, ILU(0), is
/// timed from a slightly perturbed start and a note goes to stderr) runs up to 250k unknowns only (nan above). Then the process peak working set.
/// The matrices come from <see cref="LayeredSectionGenerator"/> (a stand-in for the real pipeline), or with
/// <c>--source pipeline [--section file]</c> from the real mesher and assembly (<see cref="PipelineSystem"/>).</summary>
public static class SolveBenchmark
{
    private const double Tolerance = 1e-8;
    private const int BaselineLimit = 250_000;
    /// <summary>Start of the unmodified baseline: uniform random heads in ±0.5e-6 m. From x₀ = 0 the shadow
    /// residual r̃ = b is nonzero only next to the fixed heads and BiCgStab can meet an exact ρ = r̃ᵀr = 0
    /// breakdown (seen at 250k unknowns); the perturbation makes r̃ dense and costs no accuracy.</summary>
    private const double StartPerturbation = 1e-6;

    public static void Run(string[] args)
    {
        var sizes = Option(args, "--sizes", "100000,250000,1000000").Split(',').Select(int.Parse).ToArray();
        int repeats = int.Parse(Option(args, "--repeats", "3"), CultureInfo.InvariantCulture);
        int baselineRepeats = int.Parse(Option(args, "--baseline-repeats", "3"), CultureInfo.InvariantCulture);
        bool verbose = args.Contains("--verbose");
        string source = Option(args, "--source", "generator");
        string sectionPath = Option(args, "--section", Path.Combine(AppContext.BaseDirectory, "design-example.section.json"));
        var inv = CultureInfo.InvariantCulture;
        int largest = sizes.Max();
        WarmUp();
        foreach (int size in sizes)
        {
            var (a, b) = source == "pipeline" ? PipelineSystem.Build(size, sectionPath) : Generated(size);
            var times = new List<double>(); SolveReport? report = null;
            for (int k = 0; k < repeats; k++)
            {
                var x = new double[a.Size];
                report = LinearSolver.Solve(a, b, x, new SolverOptions { RelativeTolerance = Tolerance, Preconditioner = PreconditionerKind.AlgebraicMultigrid });
                times.Add(report.Seconds);
                if (verbose)
                    Console.Error.WriteLine(string.Create(inv, $"  ours: {report.Seconds:F3} s (setup {report.SetupSeconds:F3}), {report.Iterations} it, levels {report.Levels}, complexity {report.OperatorComplexity:F2}, residual {TrueResidual(a, b, x):E2}"));
                GC.Collect();
            }
            double ours = Median(times);
            string baseline = "baselineSeconds=nan ratio=nan";
            if (a.Size <= BaselineLimit && baselineRepeats > 0)
            {
                var baseTimes = new List<double>();
                bool modified = true;
                for (int k = 0; k < baselineRepeats; k++)
                {
                    double seconds, residual; int iterations;
                    try { (seconds, iterations, residual) = MathNetBaseline.Solve(a, b, Tolerance, 200_000, modified, modified ? 0 : StartPerturbation); }
                    catch (MathNet.Numerics.NumericalBreakdownException) when (modified)
                    {
                        Console.Error.WriteLine("  baseline: BiCgStab + MILU0 (modified) broke down; using MILU0Preconditioner(modified: false) = ILU(0) from a perturbed start");
                        modified = false; k--; continue;
                    }
                    baseTimes.Add(seconds);
                    if (verbose) Console.Error.WriteLine(string.Create(inv, $"  baseline: {seconds:F3} s, {iterations} it, true residual {residual:E2}"));
                    GC.Collect();
                }
                double median = Median(baseTimes);
                baseline = string.Create(inv, $"baselineSeconds={median:F3} ratio={median / ours:F1}");
            }
            Console.WriteLine(string.Create(inv, $"solve unknowns={a.Size} seconds={ours:F3} iterations={report!.Iterations} {baseline}"));
            if (size == largest)
                Console.WriteLine(string.Create(inv, $"solve peakWorkingSetMB={Process.GetCurrentProcess().PeakWorkingSet64 / 1048576.0:F0} (process peak after unknowns={a.Size})"));
        }
    }

    private static (CsrMatrix, double[]) Generated(int size)
    {
        var problem = new LayeredSectionGenerator(size);
        return (problem.Matrix, problem.Rhs);
    }

    /// <summary>One small solve of each kind first, so that JIT compilation is not timed (a service is warm).</summary>
    private static void WarmUp()
    {
        var problem = new LayeredSectionGenerator(30_000);
        for (int k = 0; k < 2; k++)
            LinearSolver.Solve(problem.Matrix, problem.Rhs, new double[problem.Matrix.Size], new SolverOptions { RelativeTolerance = Tolerance });
        MathNetBaseline.Solve(problem.Matrix, problem.Rhs, Tolerance, 200_000, modified: false, StartPerturbation);
    }

    private static double TrueResidual(CsrMatrix a, double[] b, double[] x)
    {
        var r = new double[a.Size];
        a.Multiply(x, r);
        double rr = 0, bb = 0;
        for (int i = 0; i < r.Length; i++) { rr += (b[i] - r[i]) * (b[i] - r[i]); bb += b[i] * b[i]; }
        return Math.Sqrt(rr / bb);
    }

    private static double Median(List<double> values)
    {
        var s = values.OrderBy(v => v).ToArray();
        return s.Length % 2 == 1 ? s[s.Length / 2] : 0.5 * (s[s.Length / 2 - 1] + s[s.Length / 2]);
    }

    private static string Option(string[] args, string name, string fallback)
    {
        int at = Array.IndexOf(args, name);
        return at >= 0 && at + 1 < args.Length ? args[at + 1] : fallback;
    }
}
