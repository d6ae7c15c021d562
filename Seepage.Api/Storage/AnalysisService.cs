using System.Diagnostics;
using System.Text.Json;
using System.Text.Json.Nodes;
using Seepage.Api.Application;
using Seepage.Api.Contracts;
using Seepage.Core;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;
using Seepage.Core.Studies;

namespace Seepage.Api.Storage;

/// <summary>Runs the Core pipeline for a validated section and stores what it produced; reads, lists, renames and
/// deletes stored analyses.</summary>
public sealed class AnalysisService(IAnalysisStore store, ILogger<AnalysisService> logger)
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
        var dto = await StoreAsync(result, sectionJson, null, cancellation);
        logger.LogInformation("Analysis {Id} '{Title}': {Nodes} nodes, {Iterations} iterations, {Seconds:F3} s, q = {Flow:E4} m³/s per m",
            dto.Id, SafeText.Of(dto.Title, 120), dto.Mesh.Nodes, dto.Solver.Iterations, dto.Seconds, dto.Flow.PerMetre);
        foreach (var w in dto.Warnings) logger.LogInformation("Analysis {Id} warning: {Warning}", dto.Id, SafeText.Of(w, 400));
        return dto;
    }

    /// <summary>Stores one finished analysis under <paramref name="id"/> (a new random one when null): section as posted,
    /// result document, compact field data and the key figures for listings.</summary>
    public async Task<AnalysisResultDto> StoreAsync(AnalysisResult result, string sectionJson, string? id, CancellationToken cancellation)
    {
        id ??= "a" + Guid.NewGuid().ToString("N")[..15];
        var created = DateTimeOffset.UtcNow;
        var dto = ResultMapper.ToDto(id, created, result);
        var field = FieldCodec.Encode(ResultMapper.ToFieldDto(id, result));
        var figures = AnalysisFiguresDto.From(StudyRunner.Figures(0, dto.Title, result, Stopwatch.StartNew(), null));
        await store.SaveAsync(new StoredAnalysis(id, created, dto.Title, sectionJson, JsonSerializer.Serialize(dto, Json), field,
            JsonSerializer.Serialize(figures, Json)), cancellation);
        return dto;
    }

    public async Task<AnalysisResultDto?> GetResultAsync(string id, CancellationToken cancellation) =>
        await store.GetJsonAsync(id, AnalysisPart.Result, cancellation) is { } json
            ? JsonSerializer.Deserialize<AnalysisResultDto>(json, Json) : null;

    public async Task<FieldDto?> GetFieldAsync(string id, CancellationToken cancellation) =>
        await store.GetFieldAsync(id, cancellation) switch
        {
            null => null,
            { Binary: { } binary } => FieldCodec.Decode(binary),
            { Json: { } json } => JsonSerializer.Deserialize<FieldDto>(json, Json),
            _ => null,
        };

    public async Task<AnalysisListDto> ListAsync(ListQuery query, CancellationToken cancellation)
    {
        var page = await store.ListAsync(query, cancellation);
        return new AnalysisListDto(query.Page, query.PageSize, page.Total, page.Items.Select(i => new AnalysisListItemDto(i.Id, i.Title,
            i.CreatedAt, i.SummaryJson is null ? null : JsonSerializer.Deserialize<AnalysisFiguresDto>(i.SummaryJson, Json))).ToList());
    }

    /// <summary>Sets the title of the listing and of the result document; null when the id is unknown.</summary>
    public async Task<AnalysisResultDto?> RenameAsync(string id, string title, CancellationToken cancellation)
    {
        if (await store.GetJsonAsync(id, AnalysisPart.Result, cancellation) is not { } json) return null;
        var node = JsonNode.Parse(json)!.AsObject();
        node["title"] = title;
        string renamed = node.ToJsonString(Json);
        return await store.RenameAsync(id, title, renamed, cancellation) ? JsonSerializer.Deserialize<AnalysisResultDto>(renamed, Json) : null;
    }

    public Task<bool> DeleteAsync(string id, CancellationToken cancellation) => store.DeleteAsync(id, cancellation);
}
