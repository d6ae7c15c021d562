using System.Diagnostics;
using System.Text.Json.Nodes;
using Seepage.Core;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;
using Seepage.Core.Uncertainty;

namespace Seepage.Benchmarks;

/// <summary>
/// `uncertainty [--samples N]`: a Monte Carlo study of the demo weir (twin-pile-weir example): kx of the sand lognormal
/// (median 3e-4 m/s, cov 0.8, ky/kx kept), kx of the silt lognormal (median 2e-7 m/s, cov 1.0), headwater normal (7.0 m,
/// sd 0.3 m), Latin hypercube, seed 7. Prints the fixed line `uncertainty samples=N seconds=S` (wall time of the whole study,
/// FOSM points included), then the anchor measured in the same run: one full analysis of the same section, as the API runs it.
/// </summary>
public static class UncertaintyBenchmark
{
    public static void Run(string[] args)
    {
        int samples = 1000;
        for (int i = 0; i + 1 < args.Length; i++) if (args[i] == "--samples") samples = int.Parse(args[i + 1]);
        string json = File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "twin-pile-weir.section.json"));
        var baseSection = JsonNode.Parse(json)!;
        var model = SectionValidator.Validate(SectionParser.Parse(json, out _)!).Model!;
        var study = new UncertaintyStudy(
        [
            new UncertainVariable("/soils/0/kx", Distribution.LognormalOfMedian(3e-4, 0.8)),
            new UncertainVariable("/soils/1/kx", Distribution.LognormalOfMedian(2e-7, 1.0)),
            new UncertainVariable("/heads/0/total", Distribution.NormalOf(7.0, 0.3)),
        ], samples, 7);
        var options = new SolverOptions();
        UncertaintyRunner.Run(baseSection, model, study with { Samples = 20 }, options); // warm-up (JIT)

        var clock = Stopwatch.StartNew();
        var result = UncertaintyRunner.Run(baseSection, model, study, options);
        double seconds = clock.Elapsed.TotalSeconds;
        Console.WriteLine(FormattableString.Invariant($"uncertainty samples={samples} seconds={seconds:F3}"));

        clock.Restart();
        Analysis.Run(model, new AnalysisOptions { Solver = options });
        double full = clock.Elapsed.TotalSeconds;
        var s = result.Summary;
        Console.WriteLine(FormattableString.Invariant($"uncertainty anchor nodes={result.Nodes} analysed={s.Analysed} failed={s.Failed} ") +
            FormattableString.Invariant($"fullAnalysisSeconds={full:F3} perSampleSeconds={seconds / samples:F4} ") +
            FormattableString.Invariant($"ratio={full / (seconds / samples):F1} cores={Environment.ProcessorCount}"));
    }
}
