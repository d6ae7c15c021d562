using System.Diagnostics;
using System.Globalization;
using Seepage.Core.Geometry;
using Seepage.Core.Meshing;

namespace Seepage.Benchmarks;

/// <summary>
/// Mesher benchmark on an invented two-layer weir section with two cutoffs: 160 m × 25 m, interface at
/// −9 m, a floor from −12 to 12 m on the ground line, slits at x = −12 (to −4 m) and x = 12 (to −6.5 m),
/// size targets at the tips and floor ends. Prints one line per size:
/// <c>mesh triangles=N seconds=median minAngle=deg bytesPerTriangle=B</c>, where B is the managed memory
/// allocated by the build (GC.GetAllocatedBytesForCurrentThread, growth garbage included) per triangle.
/// Options: <c>--runs k</c> (default 5), <c>--sizes a,b,c</c> (target edge lengths in metres).
/// </summary>
public static class MeshBenchmark
{
    public static void Run(string[] args)
    {
        int runs = 5;
        double[] sizes = { 1.3, 0.42, 0.13 };
        for (int i = 0; i + 1 < args.Length; i++)
        {
            if (args[i] == "--runs") runs = int.Parse(args[i + 1], CultureInfo.InvariantCulture);
            if (args[i] == "--sizes") sizes = args[i + 1].Split(',').Select(s => double.Parse(s, CultureInfo.InvariantCulture)).ToArray();
        }
        var options = new MeshOptions();
        QualityMesher.Build(Section(2.0, options), options with { Size = 2.0 }); // warm-up (JIT)
        foreach (double size in sizes)
        {
            var opts = options with { Size = size };
            var graph = Section(size, opts);
            QualityMesher.Build(graph, opts); // warm-up at this size
            var seconds = new List<double>();
            Mesh? mesh = null;
            long allocated = 0;
            for (int r = 0; r < runs; r++)
            {
                GC.Collect();
                GC.WaitForPendingFinalizers();
                long before = GC.GetAllocatedBytesForCurrentThread();
                var clock = Stopwatch.StartNew();
                mesh = QualityMesher.Build(graph, opts);
                seconds.Add(clock.Elapsed.TotalSeconds);
                allocated = GC.GetAllocatedBytesForCurrentThread() - before;
            }
            seconds.Sort();
            double median = seconds[seconds.Count / 2];
            Console.WriteLine(FormattableString.Invariant(
                $"mesh triangles={mesh!.TriangleCount} seconds={median:F3} minAngle={mesh.Quality.MinAngle:F2} bytesPerTriangle={allocated / (double)mesh.TriangleCount:F0}"));
            Console.WriteLine(FormattableString.Invariant(
                $"  size={size} nodes={mesh.NodeCount} runs=[{string.Join(", ", seconds.Select(s => s.ToString("F3", CultureInfo.InvariantCulture)))}]"));
        }
    }

    /// <summary>The benchmark section as a planar graph (vertices on every segment split beforehand).</summary>
    public static PlanarGraph Section(double size, MeshOptions options)
    {
        var v = new List<Point2>
        {
            new(-80, 0), new(-12, 0), new(12, 0), new(80, 0),    // 0–3 ground line with floor ends
            new(80, -9), new(12, -9), new(-12, -9), new(-80, -9), // 4–7 interface (slits stop above it)
            new(80, -25), new(-80, -25),                          // 8–9 bottom
            new(-12, -4), new(12, -6.5),                          // 10–11 tips
        };
        var s = new List<GraphSegment>
        {
            new(0, 1), new(1, 2), new(2, 3), new(3, 4), new(4, 5), new(5, 6), new(6, 7), new(7, 0),
            new(4, 8), new(8, 9), new(9, 7),
            new(1, 10), new(2, 11),
        };
        var regions = new[]
        {
            new RegionSeed(new Point2(-70, -4), 0, null),
            new RegionSeed(new Point2(-70, -15), 1, null),
        };
        var slits = new[] { new Slit(new[] { 1, 10 }), new Slit(new[] { 2, 11 }) };
        double h = options.SingularRefinement * size;
        var targets = new[] { v[1], v[2], v[10], v[11] }.Select(p => new SizeTarget(p, h)).ToArray();
        return new PlanarGraph(v, s, regions, slits, targets);
    }
}
