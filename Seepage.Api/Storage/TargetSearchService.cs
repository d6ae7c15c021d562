using System.Diagnostics;
using System.Text.Json;
using System.Text.Json.Nodes;
using Seepage.Api.Contracts;
using Seepage.Core;
using Seepage.Core.Solvers;
using Seepage.Core.TargetSearch;

namespace Seepage.Api.Storage;

/// <summary>Runs target searches (Core <see cref="TargetSearcher"/>): each point is analysed, stored as an analysis with its
/// memo, and the search document is written as points finish, so GET /api/v1/target-searches/{id} reports progress.</summary>
public sealed class TargetSearchService(DesignRunStore store, AnalysisService analyses, RunningJobs jobs, IHostApplicationLifetime lifetime,
    ILogger<TargetSearchService> logger)
{
    public const string Kind = "target-search";

    private sealed class Run(string id, string title, TargetSearch search)
    {
        public readonly string Id = id, Title = title;
        public readonly TargetSearch Search = search;
        public readonly DateTimeOffset Created = DateTimeOffset.UtcNow;
        public readonly Stopwatch Clock = Stopwatch.StartNew();
        public readonly List<TargetPointDto> Points = [];
        public readonly Dictionary<double, string?> AnalysisIds = [];
        public TargetSearchResult? Result;
        public string Status = "running";
    }

    public async Task<TargetSearchDto> StartAsync(JsonObject baseSection, TargetSearch search, bool background, CancellationToken cancellation)
    {
        string id = "t" + Guid.NewGuid().ToString("N")[..15];
        string title = (baseSection["title"] as JsonValue)?.TryGetValue(out string? t) == true ? t! : "Target search";
        var run = new Run(id, title, search);
        var definition = new JsonObject
        {
            ["base"] = baseSection.DeepClone(), ["member"] = search.Member, ["range"] = new JsonArray(search.From, search.To),
            ["require"] = JsonSerializer.SerializeToNode(Require(search.Require), AnalysisService.Json),
            ["tolerance"] = search.Tolerance, ["scanPoints"] = search.ScanPoints,
        };
        await store.CreateAsync(id, Kind, run.Created, title, definition.ToJsonString(), Serialize(Snapshot(run)), cancellation);
        var source = jobs.Start(id, background ? lifetime.ApplicationStopping : cancellation);
        if (background)
        {
            _ = Task.Run(() => ExecuteAsync(run, baseSection, source.Token), CancellationToken.None);
            return Snapshot(run);
        }
        await ExecuteAsync(run, baseSection, source.Token);
        return Snapshot(run);
    }

    public async Task<TargetSearchDto?> GetAsync(string id, CancellationToken cancellation)
    {
        if (await store.GetAsync(id, Kind, false, cancellation) is not { } stored) return null;
        var search = JsonSerializer.Deserialize<TargetSearchDto>(stored.Json, AnalysisService.Json)!;
        return search.Status == "running" && DateTimeOffset.UtcNow - stored.Updated > RunningJobs.SilenceLimit
            ? search with { Status = "interrupted" } : search;
    }

    private async Task ExecuteAsync(Run run, JsonObject baseSection, CancellationToken cancellation)
    {
        var options = new AnalysisOptions { Solver = new SolverOptions { TimeBudget = AnalysisService.SolveBudget } };
        string baseJson = baseSection.ToJsonString();
        try
        {
            run.Result = await Task.Run(() => TargetSearcher.Run(run.Search, value =>
            {
                var (point, result) = TargetEvaluator.Evaluate(baseJson, run.Search, value, options, cancellation);
                string? analysisId = result is null ? null : AnalysisRecords.Save(analyses, result, point.Row.SectionJson ?? "{}", cancellation);
                string json;
                lock (run)
                {
                    run.Points.Add(TargetSearchMapper.Point(point, analysisId));
                    run.AnalysisIds[value] = analysisId;
                    json = Serialize(Snapshot(run));
                }
                store.UpdateAsync(run.Id, run.Status, json, null, cancellation).GetAwaiter().GetResult();
                return point;
            }, null, cancellation), cancellation);
            lock (run)
            {
                // The final margins (a default requirement the section cannot check is left out of them).
                run.Points.Clear();
                run.Points.AddRange(run.Result.Points.Select(p => TargetSearchMapper.Point(p, run.AnalysisIds.GetValueOrDefault(p.Value))));
            }
            run.Status = "done";
        }
        catch (OperationCanceledException) { run.Status = "cancelled"; }
        catch (Exception ex)
        {
            run.Status = "failed";
            logger.LogError(ex, "Target search {Id} failed", run.Id);
        }
        finally { jobs.End(run.Id); }
        logger.LogInformation("Target search {Id} '{Title}': {Status}, {Points} points in {Seconds:F2} s, value {Value}", run.Id, SafeText.Of(run.Title, 120),
            run.Status, run.Points.Count, run.Clock.Elapsed.TotalSeconds, run.Result?.Value);
        await store.UpdateAsync(run.Id, run.Status, Serialize(Snapshot(run)), null, CancellationToken.None);
    }

    private static TargetRequirementsDto Require(TargetRequirements r) => new(r.ExitFactor, r.HeaveFactor, r.MaxFlow, r.MaxUpliftForce);

    private static TargetSearchDto Snapshot(Run run)
    {
        lock (run)
        {
            var s = run.Search;
            var r = run.Result;
            int total = Math.Max(run.Points.Count, r is null ? s.ScanPoints + TargetSearchMapper.BisectionSteps(s) : run.Points.Count);
            return new TargetSearchDto(run.Id, run.Title, run.Created, run.Status, run.Points.Count, total, s.Member, [s.From, s.To],
                Require(r?.Require ?? s.Require), s.Tolerance, s.ScanPoints, s.From, r?.Value, r?.Feasible, r?.Governing,
                r?.Margins ?? new Dictionary<string, double?>(), r?.Intervals.Select(i => new TargetIntervalDto(i.From, i.To)).ToList() ?? [],
                r?.Monotone, r?.BestMargin, r?.BestValue, r?.Message, r?.Notes ?? [], run.Points.OrderBy(p => p.Value).ToList(),
                AnalysisResult.Caution, run.Clock.Elapsed.TotalSeconds);
        }
    }

    private static string Serialize(TargetSearchDto dto) => JsonSerializer.Serialize(dto, AnalysisService.Json);
}
