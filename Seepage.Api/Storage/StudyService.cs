using System.Diagnostics;
using System.Text.Json;
using System.Text.Json.Nodes;
using Seepage.Api.Contracts;
using Seepage.Core;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;
using Seepage.Core.Studies;

namespace Seepage.Api.Storage;

/// <summary>Runs studies (Core <see cref="StudyRunner"/>), stores each analysed alternative as an analysis and the study
/// document as rows finish, so GET /api/v1/studies/{id} reports progress and survives a restart.</summary>
public sealed class StudyService(StudyStore studies, AnalysisStore analyses, IHostApplicationLifetime lifetime, ILogger<StudyService> logger)
{
    /// <summary>Studies with at most this many alternatives run while the request waits (unless asked to run in the background).</summary>
    public const int WaitLimit = 8;

    /// <summary>Largest number of alternatives of one study.</summary>
    public const int MaxAlternatives = 500;

    private sealed class Run(string id, string title, DateTimeOffset created, IReadOnlyList<StudyAlternative> alternatives)
    {
        public readonly string Id = id, Title = title;
        public readonly DateTimeOffset Created = created;
        public readonly IReadOnlyList<StudyAlternative> Alternatives = alternatives;
        public readonly StudyRowDto?[] Rows = new StudyRowDto?[alternatives.Count];
        public readonly Stopwatch Clock = Stopwatch.StartNew();
        public readonly List<string> Parameters = alternatives.SelectMany(a => a.Changes.Select(c => c.Key)).Distinct().ToList();
        public int Done;
        public string Status = "running";
    }

    /// <summary>Stores the study and runs it: in the background (answer at once, state "running") or while waiting.</summary>
    public async Task<StudyDto> StartAsync(JsonObject baseSection, IReadOnlyList<StudyAlternative> alternatives, bool background,
        CancellationToken cancellation)
    {
        string id = "s" + Guid.NewGuid().ToString("N")[..15];
        string title = (baseSection["title"] as JsonValue)?.TryGetValue(out string? t) == true ? t! : "Study";
        var run = new Run(id, title, DateTimeOffset.UtcNow, alternatives);
        var definition = new JsonObject
        {
            ["base"] = baseSection.DeepClone(),
            ["alternatives"] = new JsonArray(alternatives.Select(a => (JsonNode)new JsonObject
            {
                ["name"] = a.Name, ["changes"] = new JsonObject(a.Changes.Select(c => KeyValuePair.Create(c.Key, c.Value?.DeepClone()))),
            }).ToArray()),
        };
        await studies.CreateAsync(id, run.Created, title, definition.ToJsonString(), Serialize(Snapshot(run)), cancellation);
        if (background)
        {
            _ = Task.Run(() => ExecuteAsync(run, baseSection, lifetime.ApplicationStopping), CancellationToken.None);
            return Snapshot(run);
        }
        await ExecuteAsync(run, baseSection, cancellation);
        return Snapshot(run);
    }

    /// <summary>A study still "running" that no process has written to for this long was cut off (the server stopped);
    /// one alternative's solve is limited to <see cref="AnalysisService.SolveBudget"/>, well below it.</summary>
    public static readonly TimeSpan SilenceLimit = TimeSpan.FromMinutes(10);

    public async Task<StudyDto?> GetAsync(string id, CancellationToken cancellation)
    {
        if (await studies.GetJsonAsync(id, cancellation) is not { } stored) return null;
        var study = JsonSerializer.Deserialize<StudyDto>(stored.Json, AnalysisService.Json)!;
        return study.Status == "running" && DateTimeOffset.UtcNow - stored.Updated > SilenceLimit ? study with { Status = "interrupted" } : study;
    }

    private async Task ExecuteAsync(Run run, JsonObject baseSection, CancellationToken cancellation)
    {
        var options = new AnalysisOptions { Solver = new SolverOptions { TimeBudget = AnalysisService.SolveBudget } };
        try
        {
            await Task.Run(() => StudyRunner.Run(baseSection, run.Alternatives, options, (row, result) => Finish(run, row, result, cancellation),
                cancellation), cancellation);
            run.Status = "done";
        }
        catch (OperationCanceledException)
        {
            run.Status = "cancelled";
        }
        catch (Exception ex)
        {
            run.Status = "failed";
            logger.LogError(ex, "Study {Id} failed", run.Id);
        }
        logger.LogInformation("Study {Id} '{Title}': {Status}, {Done}/{Total} alternatives in {Seconds:F2} s", run.Id, run.Title,
            run.Status, run.Done, run.Alternatives.Count, run.Clock.Elapsed.TotalSeconds);
        await studies.UpdateAsync(run.Id, run.Status, Serialize(Snapshot(run)), CancellationToken.None);
    }

    // Called on a worker thread as each alternative finishes: store its analysis, then the study's progress.
    private void Finish(Run run, StudyRow row, AnalysisResult? result, CancellationToken cancellation)
    {
        string? analysisId = null;
        if (result is not null)
        {
            analysisId = "a" + Guid.NewGuid().ToString("N")[..15];
            var created = DateTimeOffset.UtcNow;
            var dto = ResultMapper.ToDto(analysisId, created, result);
            var field = ResultMapper.ToFieldDto(analysisId, result);
            analyses.SaveAsync(new StoredAnalysis(analysisId, created, dto.Title, row.SectionJson ?? "{}",
                JsonSerializer.Serialize(dto, AnalysisService.Json), JsonSerializer.Serialize(field, AnalysisService.Json)), cancellation)
                .GetAwaiter().GetResult();
        }
        var alternative = run.Alternatives[row.Index];
        var rowDto = new StudyRowDto(row.Index, row.Name, alternative.Changes.ToDictionary(c => c.Key, c => c.Value?.DeepClone()),
            row.Analysed, row.Problems.GroupBy(p => p.Pointer).ToDictionary(g => g.Key, g => g.Select(p => p.Message).ToArray()),
            analysisId, row.Flow, row.UpliftForce, row.MaxExitGradient, row.ExitFactor, row.ExitRequiredFactor, row.HeaveFactor,
            row.HeaveRequiredFactor, row.Pass, row.Seconds, row.ExitPass, row.HeavePass, row.LanePass, row.BlighPass, row.PassCovers);
        string json;
        lock (run)
        {
            run.Rows[row.Index] = rowDto;
            run.Done++;
            json = Serialize(Snapshot(run));
        }
        studies.UpdateAsync(run.Id, run.Status, json, cancellation).GetAwaiter().GetResult();
    }

    private static StudyDto Snapshot(Run run)
    {
        lock (run)
            return new StudyDto(run.Id, run.Title, run.Created, run.Status, run.Done, run.Alternatives.Count, run.Parameters,
                run.Rows.Where(r => r is not null).Select(r => r!).ToList(), AnalysisResult.Caution, run.Clock.Elapsed.TotalSeconds);
    }

    private static string Serialize(StudyDto study) => JsonSerializer.Serialize(study, AnalysisService.Json);
}
