using System.Diagnostics;
using System.Globalization;
using Seepage.Core;

namespace Seepage.Benchmarks;

/// <summary>
/// Scaling of a whole analysis with quadratic elements (<c>mesh.order: 2</c>) on the design example meshed for about
/// <c>--triangles</c> (default 10,000, 100,000, 400,000): prints <c>order2 triangles=N seconds=S</c> (wall seconds of
/// Analysis.Run, one run after a warm-up at the smallest size) and <c>order2 ratio=R</c>, the seconds per triangle of
/// the largest over the smallest size; then <c>order2 convergenceCheck=true triangles=N seconds=S</c> for the design
/// example as shipped with the convergence check on. Stage times go to stderr.
/// </summary>
public static class Order2Benchmark
{
    public static void Run(string[] args)
    {
        int[] targets = [10_000, 100_000, 400_000];
        for (int i = 0; i + 1 < args.Length; i++)
            if (args[i] == "--triangles") targets = args[i + 1].Split(',').Select(s => int.Parse(s, CultureInfo.InvariantCulture)).ToArray();
        var reference = DesignSection.Model(DesignSection.Json());
        int referenceTriangles = Analysis.MakeMesh(reference, []).TriangleCount;
        double SizeFor(int triangles) => reference.Mesh.Size * Math.Sqrt((double)referenceTriangles / triangles);
        Time(DesignSection.Model(DesignSection.Json(SizeFor(targets[0]), 2)), null); // warm-up
        var perTriangle = new List<double>();
        foreach (int target in targets)
        {
            var (triangles, seconds) = Time(DesignSection.Model(DesignSection.Json(SizeFor(target), 2)), null);
            perTriangle.Add(seconds / triangles);
            Console.WriteLine(FormattableString.Invariant($"order2 triangles={triangles} seconds={seconds:F3}"));
        }
        Console.WriteLine(FormattableString.Invariant($"order2 ratio={perTriangle[^1] / perTriangle[0]:F2}"));
        var (n, s) = Time(DesignSection.Model(DesignSection.Json(order: 2, convergenceCheck: true)), "convergenceCheck=true ");
        Console.WriteLine(FormattableString.Invariant($"order2 convergenceCheck=true triangles={n} seconds={s:F3}"));
    }

    private static (int Triangles, double Seconds) Time(Seepage.Core.Sections.SectionModel model, string? label)
    {
        var clock = Stopwatch.StartNew();
        double mark = 0;
        var stages = new List<string>();
        var result = Analysis.Run(model, new AnalysisOptions
        {
            StageDone = name =>
            {
                double now = clock.Elapsed.TotalSeconds;
                stages.Add(FormattableString.Invariant($"{name}={now - mark:F3}"));
                mark = now;
            },
        });
        double seconds = clock.Elapsed.TotalSeconds;
        Console.Error.WriteLine($"order2 {label}triangles={result.Mesh.TriangleCount} {string.Join(' ', stages)}");
        return (result.Mesh.TriangleCount, seconds);
    }
}
