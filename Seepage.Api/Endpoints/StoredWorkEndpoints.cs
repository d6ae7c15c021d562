using Microsoft.AspNetCore.Http.HttpResults;
using Seepage.Api.Contracts;
using Seepage.Api.Errors;
using Seepage.Api.OpenApi;
using Seepage.Api.Storage;

namespace Seepage.Api.Endpoints;

/// <summary>Stored work: list (paged, newest first, title filter), rename and delete analyses and studies.</summary>
public static class StoredWorkEndpoints
{
    private const string ListDescription = "Newest first. ?page= (from 1, default 1), ?pageSize= (1 … 100, default 20), ?title= " +
        "(case-insensitive part of the title). A bad query value answers 400 problem details naming it.";

    public static IEndpointRouteBuilder MapStoredWorkEndpoints(this IEndpointRouteBuilder app)
    {
        var analyses = app.MapGroup("/api/v1/analyses").WithTags("Analyses")
            .WithMetadata(ParameterNote.AnalysisId, ParameterNote.ListPage, ParameterNote.ListPageSize, ParameterNote.ListTitle);
        analyses.MapGet("/", ListAnalyses).WithName("ListAnalyses").WithSummary("List stored analyses")
            .WithDescription("Id, title, date and key figures (flow m³/s per m, uplift force kN/m, exit gradient and factor, heave " +
                "factor, pass) of each stored analysis. " + ListDescription);
        analyses.MapPatch("/{id}", RenameAnalysis).WithName("RenameAnalysis").WithSummary("Rename a stored analysis")
            .WithDescription("Body { \"title\": \"…\" } (1 … 200 characters). Answers the result document with its new title; the " +
                "section as posted keeps its own.")
            .Accepts<RenameDto>("application/json").ProducesProblem(StatusCodes.Status404NotFound);
        analyses.MapDelete("/{id}", DeleteAnalysis).WithName("DeleteAnalysis").WithSummary("Delete a stored analysis")
            .WithDescription("Deletes the analysis with its field data and section; 204, or 404 when the id is unknown.")
            .Produces(StatusCodes.Status204NoContent).ProducesProblem(StatusCodes.Status404NotFound);
        var studies = app.MapGroup("/api/v1/studies").WithTags("Studies")
            .WithMetadata(ParameterNote.StudyId, ParameterNote.ListPage, ParameterNote.ListPageSize, ParameterNote.ListTitle);
        studies.MapGet("/", ListStudies).WithName("ListStudies").WithSummary("List stored studies")
            .WithDescription("Id, title, date, status and done/total of each stored study. " + ListDescription);
        studies.MapPatch("/{id}", RenameStudy).WithName("RenameStudy").WithSummary("Rename a stored study")
            .WithDescription("Body { \"title\": \"…\" } (1 … 200 characters). Answers the study with its new title.")
            .Accepts<RenameDto>("application/json").ProducesProblem(StatusCodes.Status404NotFound);
        studies.MapDelete("/{id}", DeleteStudy).WithName("DeleteStudy").WithSummary("Delete a stored study")
            .WithDescription("Deletes the study and its rows (the analyses of its alternatives stay until deleted themselves); 204, " +
                "or 404 when the id is unknown.")
            .Produces(StatusCodes.Status204NoContent).ProducesProblem(StatusCodes.Status404NotFound);
        return app;
    }

    public static async Task<Results<Ok<AnalysisListDto>, ValidationProblem>> ListAnalyses(string? page, string? pageSize, string? title,
        AnalysisService service, CancellationToken cancellation)
    {
        var errors = new Dictionary<string, string[]>();
        return ListParameters.Read(page, pageSize, title, errors) is { } query
            ? TypedResults.Ok(await service.ListAsync(query, cancellation)) : BadQuery(errors);
    }

    public static async Task<Results<Ok<StudyListDto>, ValidationProblem>> ListStudies(string? page, string? pageSize, string? title,
        StudyService service, CancellationToken cancellation)
    {
        var errors = new Dictionary<string, string[]>();
        return ListParameters.Read(page, pageSize, title, errors) is { } query
            ? TypedResults.Ok(await service.ListAsync(query, cancellation)) : BadQuery(errors);
    }

    public static async Task<Results<Ok<AnalysisResultDto>, ValidationProblem, ProblemHttpResult>> RenameAnalysis(string id, HttpRequest request,
        AnalysisService service, CancellationToken cancellation)
    {
        var errors = new Dictionary<string, string[]>();
        if (await ListParameters.ReadTitleAsync(request, errors, cancellation) is not { } title) return BadBody(errors);
        return await service.RenameAsync(id, title, cancellation) is { } dto ? TypedResults.Ok(dto) : NotFound("analysis", id);
    }

    public static async Task<Results<Ok<StudyDto>, ValidationProblem, ProblemHttpResult>> RenameStudy(string id, HttpRequest request,
        StudyService service, CancellationToken cancellation)
    {
        var errors = new Dictionary<string, string[]>();
        if (await ListParameters.ReadTitleAsync(request, errors, cancellation) is not { } title) return BadBody(errors);
        return await service.RenameAsync(id, title, cancellation) is { } dto ? TypedResults.Ok(dto) : NotFound("study", id);
    }

    public static async Task<Results<NoContent, ProblemHttpResult>> DeleteAnalysis(string id, AnalysisService service,
        CancellationToken cancellation) =>
        await service.DeleteAsync(id, cancellation) ? TypedResults.NoContent() : NotFound("analysis", id);

    public static async Task<Results<NoContent, ProblemHttpResult>> DeleteStudy(string id, StudyService service,
        CancellationToken cancellation) =>
        await service.DeleteAsync(id, cancellation) ? TypedResults.NoContent() : NotFound("study", id);

    private static ValidationProblem BadQuery(Dictionary<string, string[]> errors) =>
        ApiProblems.Invalid(errors, "The listing query has problems.", "Each problem is listed under the query parameter.");

    private static ValidationProblem BadBody(Dictionary<string, string[]> errors) =>
        ApiProblems.Invalid(errors, "The rename has problems.", "Each problem is listed under the JSON pointer concerned.");

    private static ProblemHttpResult NotFound(string kind, string id) => ApiProblems.NotFound(kind, id);
}
