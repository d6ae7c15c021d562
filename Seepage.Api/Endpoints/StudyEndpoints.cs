using Microsoft.AspNetCore.Http.HttpResults;
using Seepage.Api.Application;
using Seepage.Api.Contracts;
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
            .Accepts<StudyRequestDto>("application/json", "text/csv")
            .Produces<StudyDto>(StatusCodes.Status201Created)
            .Produces<StudyDto>(StatusCodes.Status202Accepted)
            .ProducesProblem(StatusCodes.Status413PayloadTooLarge);
        group.MapGet("/{id}", Get)
            .WithName("GetStudy")
            .WithSummary("Read a study and its progress")
            .WithDescription("Returns the study: status (running, done, cancelled), done/total and the rows finished so far; " +
                "as CSV with Accept: text/csv or ?format=csv.")
            .Produces<StudyDto>(StatusCodes.Status200OK)
            .Produces(StatusCodes.Status200OK, contentType: "text/csv")
            .ProducesProblem(StatusCodes.Status404NotFound);
        return app;
    }

    public static async Task<Results<Created<StudyDto>, Accepted<StudyDto>, ContentHttpResult, ValidationProblem, ProblemHttpResult>> Create(
        HttpRequest request, StudyService service, IAnalysisStore store, ExampleCatalog catalog, string? @base, bool? background,
        string? format, CancellationToken cancellation)
    {
        var body = await StudyBody.ReadAsync(request, @base, store, catalog, cancellation);
        if (body.TooLarge)
            return TypedResults.Problem(statusCode: StatusCodes.Status413PayloadTooLarge, title: "The body is too large.",
                detail: $"Studies are limited to {SectionBody.MaxBytes / (1024 * 1024)} MiB.");
        if (body.Errors.Count > 0 || body.Base is null)
            return TypedResults.ValidationProblem(body.Errors, title: "The study has problems.",
                detail: "Each problem is listed under the JSON pointer (or spreadsheet cell) concerned.");
        bool later = background == true || body.Alternatives.Count > StudyService.WaitLimit;
        var study = await service.StartAsync(body.Base, body.Alternatives, later, cancellation);
        string location = $"/api/v1/studies/{study.Id}";
        if (later) return TypedResults.Accepted(location, study);
        if (WantsCsv(request, format))
        {
            request.HttpContext.Response.Headers.Location = location;
            return TypedResults.Content(StudyCsvWriter.Write(study), "text/csv; charset=utf-8", statusCode: StatusCodes.Status201Created);
        }
        return TypedResults.Created(location, study);
    }

    public static async Task<Results<Ok<StudyDto>, ContentHttpResult, ProblemHttpResult>> Get(string id, string? format, HttpRequest request,
        StudyService service, CancellationToken cancellation)
    {
        if (await service.GetAsync(id, cancellation) is not { } study)
            return TypedResults.Problem(statusCode: StatusCodes.Status404NotFound, title: "No such study.", detail: $"No study has the id '{id}'.");
        return WantsCsv(request, format) ? TypedResults.Content(StudyCsvWriter.Write(study), "text/csv; charset=utf-8") : TypedResults.Ok(study);
    }

    /// <summary>CSV when ?format=csv or the Accept header asks for text/csv.</summary>
    public static bool WantsCsv(HttpRequest request, string? format) =>
        string.Equals(format, "csv", StringComparison.OrdinalIgnoreCase) ||
        request.Headers.Accept.Any(a => a?.Contains("text/csv", StringComparison.OrdinalIgnoreCase) == true);
}
