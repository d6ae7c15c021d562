using Microsoft.AspNetCore.Http.HttpResults;
using Seepage.Api.Application;
using Seepage.Api.Contracts;
using Seepage.Api.Errors;
using Seepage.Api.OpenApi;
using Seepage.Api.Storage;

namespace Seepage.Api.Endpoints;

/// <summary>Studies: run a set of design alternatives of one section and compare their key figures.</summary>
public static class StudyEndpoints
{
    public static IEndpointRouteBuilder MapStudyEndpoints(this IEndpointRouteBuilder app)
    {
        var group = app.MapGroup("/api/v1/studies").WithTags("Studies");
        group.MapPost("/", Create)
            .WithName("CreateStudy")
            .WithSummary("Run a study of design alternatives")
            .WithDescription("Takes { base: <section document>, alternatives: [ { name, changes: { <JSON pointer>: value } } ] } as JSON, " +
                "or CSV alternatives (header row: name, then JSON pointers; one row per alternative) with ?base=<analysis id or " +
                "example name>. Each alternative is the base with its changes applied, validated and analysed, in parallel. Studies of " +
                $"up to {StudyService.WaitLimit} alternatives answer 201 with one row of key figures per alternative (flow m³/s per m, " +
                "uplift force kN/m, exit gradient and factor, heave factor, pass/fail; an invalid alternative reports its problems); " +
                "larger ones, or ?background=true, answer 202 at once and GET /api/v1/studies/{id} reports done/total and the rows so " +
                "far. Rows as CSV with Accept: text/csv or ?format=csv.")
            .Accepts<StudyRequestDto>(RequestBody.Json, RequestBody.Csv, "application/csv")
            .Produces<StudyDto>(StatusCodes.Status201Created)
            .Produces<string>(StatusCodes.Status201Created, "text/csv")
            .Produces<StudyDto>(StatusCodes.Status202Accepted)
            .ProducesProblem(StatusCodes.Status413PayloadTooLarge)
            .ProducesProblem(StatusCodes.Status415UnsupportedMediaType)
            .WithMetadata(QueryChoice.StudyFormat, QueryChoice.Background, ParameterNote.StudyBase);
        group.MapGet("/{id}", Get)
            .WithName("GetStudy")
            .WithSummary("Read a study and its progress")
            .WithDescription("Returns the study: status (running, done, cancelled), done/total and the rows finished so far; " +
                "as CSV with Accept: text/csv or ?format=csv.")
            .Produces<StudyDto>(StatusCodes.Status200OK)
            .Produces<string>(StatusCodes.Status200OK, "text/csv")
            .ProducesProblem(StatusCodes.Status404NotFound)
            .WithMetadata(QueryChoice.StudyFormat, ParameterNote.StudyId);
        return app;
    }

    public static async Task<Results<Created<StudyDto>, Accepted<StudyDto>, ContentHttpResult, ValidationProblem,
        ProblemHttpResult>> Create(HttpRequest request, StudyService service, IAnalysisStore store, ExampleCatalog catalog,
        string? @base, string? background, string? format, CancellationToken cancellation)
    {
        var (wantsCsv, badFormat) = WantsCsv(request, format);
        if (badFormat is not null) return badFormat;
        var (inBackground, badBackground) = QueryChoice.Background.Read(background);
        if (badBackground is not null) return badBackground;
        var body = await StudyBody.ReadAsync(request, @base, store, catalog, cancellation);
        if (body.Refusal is { } refused) return refused;
        if (body.Errors.Count > 0 || body.Base is null)
            return ApiProblems.Invalid(body.Errors, "The study has problems.",
                "Each problem is listed under the JSON pointer (or spreadsheet cell) concerned.");
        bool later = inBackground == "true" || body.Alternatives.Count > StudyService.WaitLimit;
        var study = await service.StartAsync(body.Base, body.Alternatives, later, cancellation);
        string location = $"/api/v1/studies/{study.Id}";
        if (later) return TypedResults.Accepted(location, study);
        if (wantsCsv)
        {
            request.HttpContext.Response.Headers.Location = location;
            return TypedResults.Content(StudyCsvWriter.Write(study), CsvType, statusCode: StatusCodes.Status201Created);
        }
        return TypedResults.Created(location, study);
    }

    public static async Task<Results<Ok<StudyDto>, ContentHttpResult, ValidationProblem, ProblemHttpResult>> Get(string id,
        string? format, HttpRequest request, StudyService service, CancellationToken cancellation)
    {
        var (wantsCsv, badFormat) = WantsCsv(request, format);
        if (badFormat is not null) return badFormat;
        if (await service.GetAsync(id, cancellation) is not { } study) return ApiProblems.NotFound("study", id);
        return wantsCsv ? TypedResults.Content(StudyCsvWriter.Write(study), CsvType) : TypedResults.Ok(study);
    }

    private const string CsvType = "text/csv; charset=utf-8";

    /// <summary>CSV when ?format=csv, or when no format is given and the Accept header asks for text/csv.</summary>
    public static (bool Csv, ValidationProblem? Problem) WantsCsv(HttpRequest request, string? format)
    {
        var (chosen, problem) = QueryChoice.StudyFormat.Read(format);
        bool accept = request.Headers.Accept.Any(a => a?.Contains("text/csv", StringComparison.OrdinalIgnoreCase) == true);
        return (chosen == "csv" || (format is null && accept), problem);
    }
}
