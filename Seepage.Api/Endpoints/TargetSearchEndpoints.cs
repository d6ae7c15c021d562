using Microsoft.AspNetCore.Http.HttpResults;
using Seepage.Api.Contracts;
using Seepage.Api.Errors;
using Seepage.Api.OpenApi;
using Seepage.Api.Reports;
using Seepage.Api.Storage;

namespace Seepage.Api.Endpoints;

/// <summary>Target searches: the least-cost value of one section member that meets every requirement.</summary>
public static class TargetSearchEndpoints
{
    public static IEndpointRouteBuilder MapTargetSearchEndpoints(this IEndpointRouteBuilder app)
    {
        var group = app.MapGroup("/api/v1/target-searches").WithTags("Target searches")
            .WithMetadata(ParameterNote.TargetSearchId, QueryChoice.RunInBackground, QueryChoice.ReportFormat);
        group.MapPost("/", Create).WithName("CreateTargetSearch")
            .WithSummary("Find the least-cost member value that meets every requirement")
            .WithDescription("Takes { base: <section>, member: <JSON pointer>, range: [least-cost end, other end], require: { exitFactor, " +
                "heaveFactor, maxFlow (m³/s per m), maxUpliftForce (kN/m) } (any subset; default the section's own required factors), " +
                "tolerance (default 0.05 or 1 % of the range, whichever is smaller), scanPoints (default 9) }. A coarse scan, then " +
                "bisection on the governing margin to the tolerance; every feasible interval when the response is not monotone; a " +
                "clear infeasible answer with the best margin reached. 201 when done; 202 with Location when ?background=true.")
            .Accepts<TargetSearchRequestDto>("application/json")
            .Produces<TargetSearchDto>(StatusCodes.Status201Created).Produces<TargetSearchDto>(StatusCodes.Status202Accepted)
            .ProducesValidationProblem().ProducesProblem(StatusCodes.Status413PayloadTooLarge)
            .ProducesProblem(StatusCodes.Status415UnsupportedMediaType);
        group.MapGet("/{id}", Get).WithName("GetTargetSearch").WithSummary("Read a target search, its progress and answer")
            .WithDescription("status (running, done, failed, cancelled, interrupted), done/total points, the answer and every point so far.")
            .Produces<TargetSearchDto>().ProducesProblem(StatusCodes.Status404NotFound);
        group.MapPost("/{id}/cancel", Cancel).WithName("CancelTargetSearch").WithSummary("Stop a running target search")
            .WithDescription("Cancels the search if it runs in this process; the points finished so far stay.")
            .Produces<TargetSearchDto>(StatusCodes.Status202Accepted).ProducesProblem(StatusCodes.Status404NotFound)
            .ProducesProblem(StatusCodes.Status409Conflict);
        group.MapGet("/{id}/points.csv", PointsCsv).WithName("GetTargetSearchPointsCsv").WithSummary("Every point of a target search as CSV")
            .WithDescription("member value, flow (m³/s per m), uplift force (kN/m), max exit gradient, factors, margins, pass, analysis id.")
            .Produces(StatusCodes.Status200OK, contentType: "text/csv").ProducesProblem(StatusCodes.Status404NotFound);
        group.MapGet("/{id}/points.xlsx", PointsXlsx).WithName("GetTargetSearchPointsXlsx").WithSummary("Every point of a target search as a workbook")
            .WithDescription("The same table as points.csv on one sheet.")
            .Produces(StatusCodes.Status200OK, contentType: DesignTables.XlsxType).ProducesProblem(StatusCodes.Status404NotFound);
        group.MapGet("/{id}/report", Report).WithName("GetTargetSearchReport").WithSummary("Memo of a target search (HTML, or PDF with ?format=pdf)")
            .WithDescription("What was varied and required, the answer and governing check, each figure against the member with the requirement lines.")
            .Produces(StatusCodes.Status200OK, contentType: "text/html").Produces(StatusCodes.Status200OK, contentType: "application/pdf")
            .ProducesProblem(StatusCodes.Status400BadRequest).ProducesProblem(StatusCodes.Status404NotFound);
        return app;
    }

    public static async Task<Results<Created<TargetSearchDto>, Accepted<TargetSearchDto>, ValidationProblem>> Create(HttpRequest request,
        TargetSearchService service, string? background, CancellationToken cancellation)
    {
        var (inBackground, badBackground) = QueryChoice.RunInBackground.Read(background);
        if (badBackground is not null) return badBackground;
        var body = await TargetSearchBody.ReadAsync(request, cancellation);
        if (body.Search is null || body.Base is null)
            return ApiProblems.Invalid(body.Errors, "The target search has problems.",
                "Each problem is listed under the JSON pointer of the member concerned.");
        var search = await service.StartAsync(body.Base, body.Search, inBackground == "true", cancellation);
        string location = $"/api/v1/target-searches/{search.Id}";
        return inBackground == "true" ? TypedResults.Accepted(location, search) : TypedResults.Created(location, search);
    }

    public static async Task<Results<Ok<TargetSearchDto>, ProblemHttpResult>> Get(string id, TargetSearchService service, CancellationToken cancellation) =>
        await service.GetAsync(id, cancellation) is { } s ? TypedResults.Ok(s) : NotFound(id);

    public static async Task<Results<Accepted<TargetSearchDto>, ProblemHttpResult>> Cancel(string id, TargetSearchService service,
        RunningJobs jobs, CancellationToken cancellation)
    {
        if (await service.GetAsync(id, cancellation) is not { } s) return NotFound(id);
        if (!jobs.Cancel(id))
            return ApiProblems.Conflict("The target search is not running here.",
                $"Its status is '{s.Status}'.");
        return TypedResults.Accepted($"/api/v1/target-searches/{id}", s);
    }

    public static async Task<Results<ContentHttpResult, ProblemHttpResult>> PointsCsv(string id, TargetSearchService service, CancellationToken cancellation) =>
        await service.GetAsync(id, cancellation) is { } s
            ? TypedResults.Content(DesignTables.Csv(DesignTables.Points(s)), "text/csv; charset=utf-8") : NotFound(id);

    public static async Task<Results<FileContentHttpResult, ProblemHttpResult>> PointsXlsx(string id, TargetSearchService service, CancellationToken cancellation) =>
        await service.GetAsync(id, cancellation) is { } s
            ? TypedResults.File(DesignTables.Xlsx("points", DesignTables.Points(s)), DesignTables.XlsxType, $"target-search-{id}.xlsx") : NotFound(id);

    public static async Task<Results<ContentHttpResult, FileContentHttpResult, ValidationProblem, ProblemHttpResult>> Report(
        string id, string? format,
        TargetSearchService service, CancellationToken cancellation)
    {
        var (chosen, bad) = QueryChoice.ReportFormat.Read(format);
        if (bad is not null) return bad;
        if (await service.GetAsync(id, cancellation) is not { } s) return NotFound(id);
        return ReportEndpoints.Render(TargetSearchReportBuilder.Build(s, DateTimeOffset.UtcNow), chosen, $"target-search-{id}.pdf");
    }

    private static ProblemHttpResult NotFound(string id) => ApiProblems.NotFound("target search", id);
}
