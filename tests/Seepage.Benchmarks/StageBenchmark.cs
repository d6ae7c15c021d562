using System.Globalization;
using System.Text.Json;
using Seepage.Api.Application;
using Seepage.Api.Contracts;
using Seepage.Api.Storage;
using Seepage.Core;

namespace Seepage.Benchmarks;

/// <summary>
/// CPU time of each stage of one analysis of the design example, as the service runs it: the Core stages (reported
/// by <see cref="AnalysisOptions.StageDone"/>), then the result and field documents mapped and serialised to JSON and
/// the SQLite insert (field data in its compact stored form). Prints <c>stage name=S cpuMs=median</c> per stage and <c>stage name=total …</c>, medians of
/// <c>--runs</c> (default 20) runs after 3 warm-ups. Options: <c>--size m</c>, <c>--order 1|2</c>.
/// </summary>
public static class StageBenchmark
{
    public static void Run(string[] args)
    {
        int runs = 20, order = 1;
        double? size = null;
        for (int i = 0; i + 1 < args.Length; i++)
        {
            if (args[i] == "--runs") runs = int.Parse(args[i + 1], CultureInfo.InvariantCulture);
            if (args[i] == "--size") size = double.Parse(args[i + 1], CultureInfo.InvariantCulture);
            if (args[i] == "--order") order = int.Parse(args[i + 1], CultureInfo.InvariantCulture);
        }
        string json = DesignSection.Json(size, order);
        var model = DesignSection.Model(json);
        string db = System.IO.Path.Combine(System.IO.Path.GetTempPath(), $"seepage-bench-{Guid.NewGuid():N}.db");
        var store = new SqlAnalysisStore(new SqliteDatabase(db));
        var times = new Dictionary<string, List<double>>();
        var names = new List<string>();
        AnalysisResult? last = null;
        try
        {
            for (int r = 0; r < runs + 3; r++)
            {
                var stageTimes = new List<(string Name, double Seconds)>();
                double mark = CpuClock.Seconds();
                void Done(string name)
                {
                    double now = CpuClock.Seconds();
                    stageTimes.Add((name, now - mark));
                    mark = now;
                }
                var result = Analysis.Run(model, new AnalysisOptions { StageDone = Done });
                string id = $"b{r:D15}";
                var dto = ResultMapper.ToDto(id, DateTimeOffset.UtcNow, result);
                string resultJson = JsonSerializer.Serialize(dto, AnalysisService.Json);
                Done("resultJson");
                var field = ResultMapper.ToFieldDto(id, result);
                _ = JsonSerializer.Serialize(field, AnalysisService.Json);       // what GET …/field serialises
                Done("fieldJson");
                store.SaveAsync(new StoredAnalysis(id, DateTimeOffset.UtcNow, dto.Title, json, resultJson, FieldCodec.Encode(field), "{}"),
                    CancellationToken.None).GetAwaiter().GetResult();          // compact field form, compressed result
                Done("store");
                last = result;
                if (r < 3) continue;
                foreach (var (name, seconds) in stageTimes)
                {
                    if (!times.TryGetValue(name, out var list)) { times[name] = list = []; names.Add(name); }
                    list.Add(seconds);
                }
                if (!times.TryGetValue("total", out var total)) times["total"] = total = [];
                total.Add(stageTimes.Sum(s => s.Seconds));
            }
        }
        finally
        {
            Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
            foreach (string f in new[] { db, db + "-wal", db + "-shm" }) File.Delete(f);
        }
        Console.WriteLine(FormattableString.Invariant(
            $"stage case=design triangles={last!.Mesh.TriangleCount} unknowns={last.Solver.Unknowns} order={order} runs={runs}"));
        foreach (string name in names.Append("total"))
            Console.WriteLine(FormattableString.Invariant($"stage name={name} cpuMs={1000 * Median(times[name]):F1}"));
    }

    internal static double Median(List<double> values)
    {
        var sorted = values.Order().ToArray();
        return sorted.Length % 2 == 1 ? sorted[sorted.Length / 2] : 0.5 * (sorted[sorted.Length / 2 - 1] + sorted[sorted.Length / 2]);
    }
}
