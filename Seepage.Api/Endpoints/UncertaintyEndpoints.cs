using Microsoft.AspNetCore.Http.HttpResults;
using Seepage.Api.Contracts;
using Seepage.Api.Errors;
using Seepage.Api.OpenApi;
using Seepage.Api.Reports;
using Seepage.Api.Storage;

namespace Seepage.Api.Endpoints;

/// <summary>Uncertainty studies: Monte Carlo (Latin hypercube) over random conductivities and heads, with FOSM beside it.</summary>
public static class UncertaintyEndpoints
{
    public static IEndpointRouteBuilder MapUncertaintyEndpoints(this IEndpointRouteBuilder app)
    {
        var group = app.MapGroup("/api/v1/uncertainty-studies").WithTags("Uncertainty studies")
            .WithMetadata(ParameterNote.UncertaintyId, QueryChoice.RunInBackground, QueryChoice.ReportFormat);
        group.MapPost("/", Create).WithName("CreateUncertaintyStudy")
            .WithSummary("Run a Monte Carlo study of random conductivities and heads")
            .WithDescription("Takes { base: <section>, variables: [ { member: <JSON pointer>, distribution: lognormal (median + cov, or " +
                "range [5 %, 95 %]) | normal (mean + sd, or range) | uniform (range), keepAnisotropy } ], samples (default 1000), seed " +
                "(default 1), sampling (latinHypercube | random), correlations: [ { between: [member, member], rank } ] }. Answers " +
                $"201 when done for up to {UncertaintyService.WaitLimit} samples, else (or with ?background=true) 202 with Location; " +
                "GET shows done/total and the statistics so far.")
            .Accepts<UncertaintyRequestDto>("application/json")
            .Produces<UncertaintyStudyDto>(StatusCodes.Status201Created).Produces<UncertaintyStudyDto>(StatusCodes.Status202Accepted)
            .ProducesValidationProblem().ProducesProblem(StatusCodes.Status413PayloadTooLarge)
            .ProducesProblem(StatusCodes.Status415UnsupportedMediaType);
        group.MapGet("/{id}", Get).WithName("GetUncertaintyStudy").WithSummary("Read an uncertainty study, its progress and statistics")
            .WithDescription("status, done/total samples, figures (mean, sd, p05, p50, p95, histogram), checks (probabilityOfFailure, " +
                "standardError, beta), fosm and sensitivity over the samples finished so far.")
            .Produces<UncertaintyStudyDto>().ProducesProblem(StatusCodes.Status404NotFound);
        group.MapPost("/{id}/cancel", Cancel).WithName("CancelUncertaintyStudy").WithSummary("Stop a running uncertainty study")
            .WithDescription("Cancels the study if it runs in this process; the samples finished so far and their statistics stay.")
            .Produces<UncertaintyStudyDto>(StatusCodes.Status202Accepted).ProducesProblem(StatusCodes.Status404NotFound)
            .ProducesProblem(StatusCodes.Status409Conflict);
        group.MapGet("/{id}/samples.csv", SamplesCsv).WithName("GetUncertaintySamplesCsv").WithSummary("Every sample as CSV")
            .WithDescription("sample number, the value of each variable, flow (m³/s per m), uplift force (kN/m), max exit gradient, factors, " +
                "pass/fail of each check; written when the study ends.")
            .Produces(StatusCodes.Status200OK, contentType: "text/csv").ProducesProblem(StatusCodes.Status404NotFound);
        group.MapGet("/{id}/samples.xlsx", SamplesXlsx).WithName("GetUncertaintySamplesXlsx").WithSummary("Every sample as a workbook")
            .WithDescription("The same table as samples.csv on one sheet.")
            .Produces(StatusCodes.Status200OK, contentType: DesignTables.XlsxType).ProducesProblem(StatusCodes.Status404NotFound);
        group.MapGet("/{id}/report", Report).WithName("GetUncertaintyReport").WithSummary("Memo of an uncertainty study (HTML, or PDF with ?format=pdf)")
            .WithDescription("What was varied and how, histograms with the allowable lines, p_f and β of each check, FOSM beside Monte Carlo.")
            .Produces(StatusCodes.Status200OK, contentType: "text/html").Produces(StatusCodes.Status200OK, contentType: "application/pdf")
            .ProducesProblem(StatusCodes.Status400BadRequest).ProducesProblem(StatusCodes.Status404NotFound);
        return app;
    }

    public static async Task<Results<Created<UncertaintyStudyDto>, Accepted<UncertaintyStudyDto>, ValidationProblem>> Create(HttpRequest request,
        UncertaintyService service, string? background, CancellationToken cancellation)
    {
        var (inBackground, badBackground) = QueryChoice.RunInBackground.Read(background);
        if (badBackground is not null) return badBackground;
        var body = await UncertaintyBody.ReadAsync(request, cancellation);
        if (body.Study is null || body.Base is null || body.Model is null)
            return ApiProblems.Invalid(body.Errors, "The uncertainty study has problems.",
                "Each problem is listed under the JSON pointer of the member concerned.");
        bool later = inBackground == "true" || body.Study.Samples > UncertaintyService.WaitLimit;
        var study = await service.StartAsync(body.Base, body.Model, body.Study, body.Variables, body.Correlations, body.Sampling, later, cancellation);
        string location = $"/api/v1/uncertainty-studies/{study.Id}";
        return later ? TypedResults.Accepted(location, study) : TypedResults.Created(location, study);
    }

    public static async Task<Results<Ok<UncertaintyStudyDto>, ProblemHttpResult>> Get(string id, UncertaintyService service, CancellationToken cancellation) =>
        await service.GetAsync(id, cancellation) is { } s ? TypedResults.Ok(s) : NotFound(id);

    public static async Task<Results<Accepted<UncertaintyStudyDto>, ProblemHttpResult>> Cancel(string id, UncertaintyService service,
        RunningJobs jobs, CancellationToken cancellation)
    {
        if (await service.GetAsync(id, cancellation) is not { } s) return NotFound(id);
        if (!jobs.Cancel(id))
            return ApiProblems.Conflict("The uncertainty study is not running here.",
                $"Its status is '{s.Status}'.");
        return TypedResults.Accepted($"/api/v1/uncertainty-studies/{id}", s);
    }

    public static async Task<Results<ContentHttpResult, ProblemHttpResult>> SamplesCsv(string id, UncertaintyService service, CancellationToken cancellation) =>
        await Table(id, service, cancellation) is { } t ? TypedResults.Content(DesignTables.Csv(t), "text/csv; charset=utf-8") : NotFound(id);

    public static async Task<Results<FileContentHttpResult, ProblemHttpResult>> SamplesXlsx(string id, UncertaintyService service, CancellationToken cancellation) =>
        await Table(id, service, cancellation) is { } t
            ? TypedResults.File(DesignTables.Xlsx("samples", t), DesignTables.XlsxType, $"uncertainty-{id}.xlsx") : NotFound(id);

    public static async Task<Results<ContentHttpResult, FileContentHttpResult, ValidationProblem, ProblemHttpResult>> Report(
        string id, string? format,
        UncertaintyService service, CancellationToken cancellation)
    {
        var (chosen, bad) = QueryChoice.ReportFormat.Read(format);
        if (bad is not null) return bad;
        if (await service.GetAsync(id, cancellation) is not { } s) return NotFound(id);
        return ReportEndpoints.Render(UncertaintyReportBuilder.Build(s, DateTimeOffset.UtcNow), chosen, $"uncertainty-{id}.pdf");
    }

    private static async Task<List<IReadOnlyList<object?>>?> Table(string id, UncertaintyService service, CancellationToken cancellation) =>
        await service.GetAsync(id, cancellation) is { } s && await service.GetSamplesAsync(id, cancellation) is { } rows
            ? DesignTables.Samples(s, rows) : null;

    private static ProblemHttpResult NotFound(string id) => ApiProblems.NotFound("uncertainty study", id);
}
