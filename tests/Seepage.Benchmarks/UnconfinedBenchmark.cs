using System.Diagnostics;
using System.Globalization;
using Seepage.Core;
using Seepage.Core.Fem;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;
using Seepage.Core.Unconfined;

namespace Seepage.Benchmarks;

/// <summary>
/// Unconfined benchmark on the shipped example <c>embankment-toe-drain.section.json</c>: at its default mesh and at
/// meshes scaled to about the requested triangle counts, the free-surface iteration (<see cref="UnconfinedSolver"/>)
/// and, as the anchor on the same mesh, one confined solve of the same section (<see cref="FieldSolver"/>). Prints
/// one line per size: <c>unconfined triangles=N seconds=S iterations=I confinedSeconds=C</c> (medians of
/// <c>--runs</c>, default 3; meshing is not timed). Options: <c>--triangles a,b</c> (default: the example's own mesh
/// and 200000; 0 means the example's own mesh), <c>--max-iterations k</c> (default the library's). An iteration that does
/// not converge prints <c>seconds=nan</c> with the iterations reached, and its message on stderr.
/// </summary>
public static class UnconfinedBenchmark
{
    public static void Run(string[] args)
    {
        int runs = 3;
        var uopt = new UnconfinedOptions();
        double[] targets = [0, 200_000];
        for (int i = 0; i + 1 < args.Length; i++)
        {
            if (args[i] == "--runs") runs = int.Parse(args[i + 1], CultureInfo.InvariantCulture);
            if (args[i] == "--max-iterations")
                uopt = uopt with { MaxIterations = int.Parse(args[i + 1], CultureInfo.InvariantCulture) };
            if (args[i] == "--triangles") targets = args[i + 1].Split(',').Select(s => double.Parse(s, CultureInfo.InvariantCulture)).ToArray();
        }
        string path = Path.Combine(AppContext.BaseDirectory, "embankment-toe-drain.section.json");
        var doc = SectionParser.Parse(File.ReadAllText(path), out _)!;
        var section = SectionValidator.Validate(doc).Model!;
        var confinedSection = section with { Unconfined = false };
        var solver = new SolverOptions();
        foreach (double target in targets)
        {
            var sized = target <= 0 ? section : section with { Mesh = section.Mesh with { Size = SizeFor(section, target) } };
            var mesh = Analysis.MakeMesh(sized, []);
            if (target > 0)
            {
                // The grading at singular points adds triangles beyond the area estimate: rescale once from the first mesh.
                sized = sized with { Mesh = sized.Mesh with { Size = sized.Mesh.Size * Math.Sqrt(mesh.TriangleCount / target) } };
                mesh = Analysis.MakeMesh(sized, []);
            }
            try { UnconfinedSolver.Solve(sized, mesh, uopt, solver); } // warm-up (JIT) at this size
            catch (SolverNotConvergedException ex)
            {
                Console.Error.WriteLine(ex.Message);
                Console.WriteLine(FormattableString.Invariant(
                    $"unconfined triangles={mesh.TriangleCount} seconds=nan iterations={ex.Iterations} confinedSeconds=nan"));
                continue;
            }
            var free = new List<double>(); var confined = new List<double>();
            int iterations = 0;
            for (int r = 0; r < runs; r++)
            {
                GC.Collect();
                var clock = Stopwatch.StartNew();
                iterations = UnconfinedSolver.Solve(sized, mesh, uopt, solver).Report.Iterations;
                free.Add(clock.Elapsed.TotalSeconds);
                clock.Restart();
                FieldSolver.Solve(confinedSection, mesh, 1, solver);
                confined.Add(clock.Elapsed.TotalSeconds);
            }
            Console.WriteLine(FormattableString.Invariant(
                $"unconfined triangles={mesh.TriangleCount} seconds={Median(free):F3} iterations={iterations} confinedSeconds={Median(confined):F3}"));
        }
    }

    // Edge length for about n triangles: an equilateral triangle of side s has area 0.433·s².
    private static double SizeFor(SectionModel section, double n)
    {
        double area = section.Zones.Sum(z => Math.Abs(Seepage.Core.Geometry.PolygonMath.SignedArea(z.Outline)));
        return Math.Sqrt(area / (0.433 * n));
    }

    private static double Median(List<double> values) => values.Order().ElementAt(values.Count / 2);
}
