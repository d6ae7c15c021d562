using Microsoft.Extensions.Options;
using Seepage.Api.Admission;
using Microsoft.AspNetCore.Http.HttpResults;
using Seepage.Api.Application;
using Seepage.Api.Contracts;
using Seepage.Api.Storage;
using Seepage.Api.Errors;
using Seepage.Api.OpenApi;
using Seepage.Core.Sections;

namespace Seepage.Api.Endpoints;

/// <summary>Analyses: post a section and get the result document; read stored results and their field data.</summary>
public static class AnalysisEndpoints
{
    public static IEndpointRouteBuilder MapAnalysisEndpoints(this IEndpointRouteBuilder app)
    {
        var group = app.MapGroup("/api/v1/analyses").WithTags("Analyses");
        group.MapPost("/", Create)
            .WithName("CreateAnalysis")
            .WithSummary("Analyse a section")
            .WithDescription("Meshes the posted section document, solves the steady seepage problem by the finite element method and " +
                "returns the result document: flow per metre (m³/s per m), uplift under each structure (kPa, kN/m), exit gradient " +
                "and factor against piping, heave factors at cutoffs, creep ratios, mesh and solver statistics, warnings and the caution. " +
                "The result is stored; its field data for drawing is at /api/v1/analyses/{id}/field.")
            .Accepts<SectionDocument>("application/json")
            .ProducesProblem(StatusCodes.Status413PayloadTooLarge)
            .ProducesProblem(StatusCodes.Status415UnsupportedMediaType)
            .ProducesProblem(StatusCodes.Status422UnprocessableEntity)
            .ProducesProblem(StatusCodes.Status429TooManyRequests);
        group.MapGet("/{id}", Get)
            .WithName("GetAnalysis")
            .WithSummary("Read a stored analysis")
            .WithDescription("Returns the result document of an earlier analysis.")
            .ProducesProblem(StatusCodes.Status404NotFound)
            .WithMetadata(ParameterNote.AnalysisId);
        group.MapGet("/{id}/field", GetField)
            .WithName("GetAnalysisField")
            .WithSummary("Read the field data of an analysis")
            .WithDescription("Node coordinates (m), triangles, zone per triangle, total head per node (m), equipotentials at equal head " +
                "drops, flow lines bounding equal-flow channels, flow-net counts and the wall polylines, for drawing.")
            .ProducesProblem(StatusCodes.Status404NotFound)
            .WithMetadata(ParameterNote.AnalysisId);
        group.MapGet("/{id}/section", GetSection)
            .WithName("GetAnalysisSection")
            .WithSummary("Read the section an analysis was run on")
            .WithDescription("Returns the section document exactly as it was posted.")
            .Produces<SectionDocument>(StatusCodes.Status200OK, "application/json")
            .ProducesProblem(StatusCodes.Status404NotFound)
            .WithMetadata(ParameterNote.AnalysisId);
        return app;
    }

    public static async Task<Results<Created<AnalysisResultDto>, ValidationProblem, ProblemHttpResult>> Create(
        HttpRequest request, AnalysisService service, AnalysisGate gate, IOptions<ServiceLimits> limits, CancellationToken cancellation)
    {
        var body = await SectionBody.ReadAsync(request, cancellation);
        if (body.Refusal is { } refused) return refused;
        if (body.Invalid is { } invalid) return invalid;
        using var ticket = await gate.EnterAsync(body.Model!, cancellation);
        if (ticket is null)
            return AdmissionSetup.TooBusy(request.HttpContext, limits.Value.RetryAfterSeconds,
                $"{gate.Admitted} large analyses are running or waiting, the most this server takes; " +
                $"retry after {limits.Value.RetryAfterSeconds} s.");
        // A section that cannot be meshed or solved escapes to the one exception handler (ProblemExceptionHandler).
        var dto = await service.RunAsync(body.Model!, body.Json!, cancellation);
        return TypedResults.Created($"/api/v1/analyses/{dto.Id}", dto);
    }

    public static async Task<Results<Ok<AnalysisResultDto>, ProblemHttpResult>> Get(string id, AnalysisService service,
        CancellationToken cancellation) =>
        await service.GetResultAsync(id, cancellation) is { } dto
            ? TypedResults.Ok(dto) : NotFound(id);

    public static async Task<Results<Ok<FieldDto>, ProblemHttpResult>> GetField(string id, AnalysisService service,
        CancellationToken cancellation) =>
        await service.GetFieldAsync(id, cancellation) is { } dto
            ? TypedResults.Ok(dto) : NotFound(id);

    public static async Task<Results<ContentHttpResult, ProblemHttpResult>> GetSection(string id, IAnalysisStore store,
        CancellationToken cancellation) =>
        await store.GetJsonAsync(id, AnalysisPart.Section, cancellation) is { } json
            ? TypedResults.Content(json, "application/json") : NotFound(id);

    private static ProblemHttpResult NotFound(string id) => ApiProblems.NotFound("analysis", id);
}
