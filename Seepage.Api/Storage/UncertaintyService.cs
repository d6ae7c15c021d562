using System.Diagnostics;
using System.Text.Json;
using System.Text.Json.Nodes;
using Seepage.Api.Contracts;
using Seepage.Core;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;
using Seepage.Core.Uncertainty;

namespace Seepage.Api.Storage;

/// <summary>Runs uncertainty studies (Core <see cref="UncertaintyRunner"/>) and writes the study document with the statistics
/// of the samples finished so far every <see cref="WriteEvery"/>, so GET /api/v1/uncertainty-studies/{id} shows progress
/// and partial statistics; every sample is stored at the end for the CSV and workbook exports.</summary>
public sealed class UncertaintyService(DesignRunStore store, RunningJobs jobs, IHostApplicationLifetime lifetime,
    ILogger<UncertaintyService> logger)
{
    public const string Kind = "uncertainty-study";

    /// <summary>Studies of at most this many samples run while the request waits (unless asked to run in the background).</summary>
    public const int WaitLimit = 100;

    /// <summary>Largest number of samples of one study.</summary>
    public const int MaxSamples = 20000;

    /// <summary>How often partial statistics are written while a study runs.</summary>
    public static readonly TimeSpan WriteEvery = TimeSpan.FromSeconds(2);

    private sealed class Run(string id, string title, UncertaintyStudy study, IReadOnlyList<VariableDto> variables,
        IReadOnlyList<CorrelationDto> correlations, string sampling)
    {
        public readonly string Id = id, Title = title, Sampling = sampling;
        public readonly UncertaintyStudy Study = study;
        public readonly IReadOnlyList<VariableDto> Variables = variables;
        public readonly IReadOnlyList<CorrelationDto> Correlations = correlations;
        public readonly DateTimeOffset Created = DateTimeOffset.UtcNow;
        public readonly Stopwatch Clock = Stopwatch.StartNew();
        public readonly List<SampleOutcome> Samples = [];
        public IReadOnlyDictionary<string, FosmEstimate> Fosm = new Dictionary<string, FosmEstimate>();
        public string? Method;
        public string Status = "running";
        public TimeSpan LastWrite;
    }

    public async Task<UncertaintyStudyDto> StartAsync(JsonObject baseSection, SectionModel baseModel, UncertaintyStudy study,
        IReadOnlyList<VariableDto> variables, IReadOnlyList<CorrelationDto> correlations, string sampling, bool background,
        CancellationToken cancellation)
    {
        string id = "u" + Guid.NewGuid().ToString("N")[..15];
        string title = (baseSection["title"] as JsonValue)?.TryGetValue(out string? t) == true ? t! : "Uncertainty study";
        var run = new Run(id, title, study, variables, correlations, sampling);
        var definition = new JsonObject
        {
            ["base"] = baseSection.DeepClone(), ["variables"] = JsonSerializer.SerializeToNode(variables, AnalysisService.Json),
            ["correlations"] = JsonSerializer.SerializeToNode(correlations, AnalysisService.Json), ["samples"] = study.Samples,
            ["seed"] = study.Seed, ["sampling"] = sampling,
        };
        await store.CreateAsync(id, Kind, run.Created, title, definition.ToJsonString(), Serialize(Snapshot(run)), cancellation);
        var source = jobs.Start(id, background ? lifetime.ApplicationStopping : cancellation);
        if (background)
        {
            _ = Task.Run(() => ExecuteAsync(run, baseSection, baseModel, source.Token), CancellationToken.None);
            return Snapshot(run);
        }
        await ExecuteAsync(run, baseSection, baseModel, source.Token);
        return Snapshot(run);
    }

    public async Task<UncertaintyStudyDto?> GetAsync(string id, CancellationToken cancellation)
    {
        if (await store.GetAsync(id, Kind, false, cancellation) is not { } stored) return null;
        var study = JsonSerializer.Deserialize<UncertaintyStudyDto>(stored.Json, AnalysisService.Json)!;
        return study.Status == "running" && DateTimeOffset.UtcNow - stored.Updated > RunningJobs.SilenceLimit
            ? study with { Status = "interrupted" } : study;
    }

    /// <summary>Every sample of a study (stored when it ends), or null when the id is unknown.</summary>
    public async Task<IReadOnlyList<SampleRowDto>?> GetSamplesAsync(string id, CancellationToken cancellation) =>
        await store.GetAsync(id, Kind, true, cancellation) is { } stored
            ? JsonSerializer.Deserialize<List<SampleRowDto>>(stored.Json, AnalysisService.Json) : null;

    private async Task ExecuteAsync(Run run, JsonObject baseSection, SectionModel baseModel, CancellationToken cancellation)
    {
        var options = new SolverOptions { TimeBudget = AnalysisService.SolveBudget };
        try
        {
            await Task.Run(() => UncertaintyRunner.Run(baseSection, baseModel, run.Study, options,
                (fosm, method) => { lock (run) { run.Fosm = fosm; run.Method = method; } }, sample => Finish(run, sample, cancellation), cancellation), cancellation);
            run.Status = "done";
        }
        catch (OperationCanceledException) { run.Status = "cancelled"; }
        catch (Exception ex)
        {
            run.Status = "failed";
            logger.LogError(ex, "Uncertainty study {Id} failed", run.Id);
        }
        finally { jobs.End(run.Id); }
        logger.LogInformation("Uncertainty study {Id} '{Title}': {Status}, {Done}/{Total} samples in {Seconds:F2} s", run.Id, SafeText.Of(run.Title, 120),
            run.Status, run.Samples.Count, run.Study.Samples, run.Clock.Elapsed.TotalSeconds);
        string rows;
        lock (run) rows = JsonSerializer.Serialize(run.Samples.Select(UncertaintyMapper.Row).ToList(), AnalysisService.Json);
        await store.UpdateAsync(run.Id, run.Status, Serialize(Snapshot(run)), rows, CancellationToken.None);
    }

    // Called on worker threads as each sample finishes; writes partial statistics now and then.
    private void Finish(Run run, SampleOutcome sample, CancellationToken cancellation)
    {
        string? json = null;
        lock (run)
        {
            run.Samples.Add(sample);
            if (run.Clock.Elapsed - run.LastWrite > WriteEvery)
            {
                run.LastWrite = run.Clock.Elapsed;
                json = Serialize(Snapshot(run));
            }
        }
        if (json is not null) store.UpdateAsync(run.Id, "running", json, null, cancellation).GetAwaiter().GetResult();
    }

    private static UncertaintyStudyDto Snapshot(Run run)
    {
        lock (run)
        {
            var s = UncertaintySummary.Of(run.Study, run.Samples);
            return new UncertaintyStudyDto(run.Id, run.Title, run.Created, run.Status, run.Samples.Count, run.Study.Samples, run.Study.Seed,
                run.Sampling, run.Variables, run.Correlations, run.Method, s.Analysed, s.Failed, s.FailureReasons,
                UncertaintyMapper.Figures(s), UncertaintyMapper.Checks(s), UncertaintyMapper.Fosm(run.Fosm, run.Study.Variables),
                UncertaintyMapper.Sensitivity(s), AnalysisResult.Caution, run.Clock.Elapsed.TotalSeconds);
        }
    }

    private static string Serialize(UncertaintyStudyDto dto) => JsonSerializer.Serialize(dto, AnalysisService.Json);
}
