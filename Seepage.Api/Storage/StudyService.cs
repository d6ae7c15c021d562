using System.Security.Cryptography;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;
using Seepage.Api.Application;
using Seepage.Api.Contracts;
using Seepage.Core;
using Seepage.Core.Solvers;
using Seepage.Core.Studies;

namespace Seepage.Api.Storage;

/// <summary>Studies: stores the definition, runs each alternative as an idempotent unit of work (<see cref="RunAlternativeAsync"/>,
/// keyed by study id + alternative index, so a retried or duplicated run stores nothing twice) and builds the study
/// document from the stored rows, so progress is read from the database whichever process did the work.</summary>
public sealed class StudyService(IStudyStore studies, AnalysisService analysisService, IStudyScheduler scheduler,
    ILogger<StudyService> logger, Microsoft.Extensions.Options.IOptions<ServiceLimits> limits)
{
    /// <summary>Studies with at most this many alternatives run while the request waits (unless asked to run in the background).</summary>
    public const int WaitLimit = 8;

    /// <summary>Largest number of alternatives of one study.</summary>
    public const int MaxAlternatives = 500;

    /// <summary>Stores the study and runs it: scheduled as background work (answer at once, state "running") or while waiting.</summary>
    public async Task<StudyDto> StartAsync(JsonObject baseSection, IReadOnlyList<StudyAlternative> alternatives, bool background,
        CancellationToken cancellation)
    {
        string id = "s" + Guid.NewGuid().ToString("N")[..15];
        string title = (baseSection["title"] as JsonValue)?.TryGetValue(out string? t) == true ? t! : "Study";
        var definition = new StudyDefinition(baseSection, alternatives);
        var created = DateTimeOffset.UtcNow;
        var header = new StudyDto(id, title, created, "running", 0, alternatives.Count, definition.Parameters, [], AnalysisResult.Caution, 0);
        await studies.CreateAsync(new StoredStudy(id, created, title, alternatives.Count, definition.ToJson(),
            JsonSerializer.Serialize(header, AnalysisService.Json)), cancellation);
        if (background)
        {
            await scheduler.ScheduleAsync(id, alternatives.Count, cancellation);
            return (await GetAsync(id, cancellation))!;
        }
        try
        {
            await Parallel.ForEachAsync(Enumerable.Range(0, alternatives.Count),
                new ParallelOptions { MaxDegreeOfParallelism = Environment.ProcessorCount, CancellationToken = cancellation },
                async (i, token) => await RunAlternativeAsync(id, i, definition, token));
        }
        catch (OperationCanceledException)
        {
            await studies.SetStatusAsync(id, "cancelled", CancellationToken.None);
            throw;
        }
        return (await GetAsync(id, CancellationToken.None))!;
    }

    /// <summary>Runs alternative <paramref name="index"/> of a stored study unless its row is stored already; stores its analysis
    /// (under an id derived from the study id and index, at most once) and its row, and marks the study done with its last
    /// row. Unknown or deleted studies are skipped.</summary>
    public async Task RunAlternativeAsync(string studyId, int index, StudyDefinition? definition, CancellationToken cancellation)
    {
        if (await studies.ProgressAsync(studyId, cancellation) is not { Status: "running" }) return;
        if (await studies.HasRowAsync(studyId, index, cancellation)) return;
        definition ??= await studies.GetDefinitionAsync(studyId, cancellation) is { } json ? StudyDefinition.Parse(json) : null;
        if (definition is null || index < 0 || index >= definition.Alternatives.Count) return;
        var alternative = definition.Alternatives[index];
        var options = new AnalysisOptions
        {
            Solver = new SolverOptions { TimeBudget = AnalysisService.SolveBudget }, Admission = limits.Value.OverBudget,
        };
        StudyRowDto row;
        try
        {
            var (figures, result) = await Task.Run(() => StudyRunner.RunOne(definition.Base, index, alternative, options, cancellation),
                cancellation);
            string? analysisId = null;
            if (result is not null)
            {
                analysisId = AlternativeAnalysisId(studyId, index);
                await analysisService.StoreAsync(result, figures.SectionJson ?? "{}", analysisId, cancellation);
            }
            row = Row(figures, alternative, analysisId);
        }
        catch (Exception ex) when (ex is not OperationCanceledException)
        {
            logger.LogError(ex, "Study {Id} alternative {Index} failed", studyId, index);
            row = new StudyRowDto(index, alternative.Name, Changes(alternative), false,
                new Dictionary<string, string[]> { [""] = ["The analysis failed on the server: " + ex.Message] }, null,
                null, null, null, null, null, null, null, null, 0);
        }
        await studies.AddRowAsync(studyId, index, JsonSerializer.Serialize(row, AnalysisService.Json), cancellation);
        if (await studies.ProgressAsync(studyId, cancellation) is { Status: "running" } after && after.Done >= after.Total)
        {
            await studies.SetStatusAsync(studyId, "done", cancellation);
            logger.LogInformation("Study {Id}: done, {Total} alternatives", studyId, after.Total);
        }
    }

    public async Task<StudyDto?> GetAsync(string id, CancellationToken cancellation)
    {
        if (await studies.GetAsync(id, cancellation) is not { } record) return null;
        var header = JsonSerializer.Deserialize<StudyDto>(record.HeaderJson, AnalysisService.Json)!;
        var rows = record.Rows.Count > 0
            ? record.Rows.Select(r => JsonSerializer.Deserialize<StudyRowDto>(r, AnalysisService.Json)!).ToList()
            : header.Rows;              // studies stored before rows had a table of their own keep them in the header
        var end = record.Status == "running" ? DateTimeOffset.UtcNow : record.UpdatedAt;
        return header with
        {
            Title = record.Title, Status = record.Status, Rows = rows, Done = Math.Max(rows.Count, header.Done),
            Seconds = Math.Max(0, (end - header.CreatedAt).TotalSeconds),
        };
    }

    public async Task<StudyListDto> ListAsync(ListQuery query, CancellationToken cancellation)
    {
        var page = await studies.ListAsync(query, cancellation);
        return new StudyListDto(query.Page, query.PageSize, page.Total,
            page.Items.Select(i => new StudyListItemDto(i.Id, i.Title, i.CreatedAt, i.Status, i.Done, i.Total)).ToList());
    }

    public async Task<StudyDto?> RenameAsync(string id, string title, CancellationToken cancellation) =>
        await studies.RenameAsync(id, title, cancellation) ? await GetAsync(id, cancellation) : null;

    public Task<bool> DeleteAsync(string id, CancellationToken cancellation) => studies.DeleteAsync(id, cancellation);

    /// <summary>The id of the analysis of one alternative: derived from the (secret, random) study id and the index, so a
    /// retried run finds it already stored.</summary>
    public static string AlternativeAnalysisId(string studyId, int index) =>
        "a" + Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes($"{studyId}/{index}")))[..15];

    private static Dictionary<string, JsonNode?> Changes(StudyAlternative a) => a.Changes.ToDictionary(c => c.Key, c => c.Value?.DeepClone());

    private static StudyRowDto Row(StudyRow row, StudyAlternative alternative, string? analysisId) =>
        new(row.Index, row.Name, Changes(alternative), row.Analysed,
            row.Problems.GroupBy(p => p.Pointer).ToDictionary(g => g.Key, g => g.Select(p => p.Message).ToArray()),
            analysisId, row.Flow, row.UpliftForce, row.MaxExitGradient, row.ExitFactor, row.ExitRequiredFactor, row.HeaveFactor,
            row.HeaveRequiredFactor, row.Pass, row.Seconds);
}
