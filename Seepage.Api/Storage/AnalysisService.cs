using System.Text.Json;
using Seepage.Api.Contracts;
using Seepage.Core;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;

namespace Seepage.Api.Storage;

/// <summary>Runs the Core pipeline for a validated section and stores what it produced.</summary>
public sealed class AnalysisService(AnalysisStore store, ILogger<AnalysisService> logger)
{
    public static readonly JsonSerializerOptions Json = new(JsonSerializerDefaults.Web);

    /// <summary>Wall-clock budget of one analysis's linear solve.</summary>
    public static readonly TimeSpan SolveBudget = TimeSpan.FromMinutes(2);

    public async Task<AnalysisResultDto> RunAsync(SectionModel section, string sectionJson, CancellationToken cancellation)
    {
        var options = new AnalysisOptions { Solver = new SolverOptions { TimeBudget = SolveBudget } };
        // The analysis is CPU work of up to minutes: on a thread of its own, not one the server needs to read requests.
        var result = await Task.Factory.StartNew(() => Analysis.Run(section, options, cancellation), cancellation,
            TaskCreationOptions.LongRunning, TaskScheduler.Default);
        string id = "a" + Guid.NewGuid().ToString("N")[..15];
        var created = DateTimeOffset.UtcNow;
        var dto = ResultMapper.ToDto(id, created, result);
        var field = ResultMapper.ToFieldDto(id, result);
        await store.SaveAsync(new StoredAnalysis(id, created, dto.Title, sectionJson,
            JsonSerializer.Serialize(dto, Json), JsonSerializer.Serialize(field, Json)), cancellation);
        logger.LogInformation("Analysis {Id} '{Title}': {Nodes} nodes, {Iterations} iterations, {Seconds:F3} s, q = {Flow:E4} m³/s per m",
            id, SafeText.Of(dto.Title, 120), dto.Mesh.Nodes, dto.Solver.Iterations, dto.Seconds, dto.Flow.PerMetre);
        foreach (var w in dto.Warnings) logger.LogInformation("Analysis {Id} warning: {Warning}", id, SafeText.Of(w, 400));
        return dto;
    }

    public async Task<T?> GetAsync<T>(string id, AnalysisPart part, CancellationToken cancellation) where T : class
    {
        string? json = await store.GetJsonAsync(id, part, cancellation);
        return json is null ? null : JsonSerializer.Deserialize<T>(json, Json);
    }
}
