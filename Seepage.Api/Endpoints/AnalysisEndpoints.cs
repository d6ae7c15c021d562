using Microsoft.AspNetCore.Http.HttpResults;
using Seepage.Api.Contracts;
using Seepage.Api.Storage;
using Seepage.Core.Meshing;
using Seepage.Core.Results;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;

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
            .ProducesProblem(StatusCodes.Status422UnprocessableEntity);
        group.MapGet("/{id}", Get)
            .WithName("GetAnalysis")
            .WithSummary("Read a stored analysis")
            .WithDescription("Returns the result document of an earlier analysis.")
            .ProducesProblem(StatusCodes.Status404NotFound);
        group.MapGet("/{id}/field", GetField)
            .WithName("GetAnalysisField")
            .WithSummary("Read the field data of an analysis")
            .WithDescription("Node coordinates (m), triangles, zone per triangle, total head per node (m), equipotentials at equal head " +
                "drops, flow lines bounding equal-flow channels, flow-net counts and the wall polylines, for drawing.")
            .ProducesProblem(StatusCodes.Status404NotFound);
        group.MapGet("/{id}/section", GetSection)
            .WithName("GetAnalysisSection")
            .WithSummary("Read the section an analysis was run on")
            .WithDescription("Returns the section document exactly as it was posted.")
            .Produces<SectionDocument>(StatusCodes.Status200OK, "application/json")
            .ProducesProblem(StatusCodes.Status404NotFound);
        return app;
    }

    public static async Task<Results<Created<AnalysisResultDto>, ValidationProblem, ProblemHttpResult>> Create(
        HttpRequest request, AnalysisService service, CancellationToken cancellation)
    {
        var body = await SectionBody.ReadAsync(request, cancellation);
        if (body.TooLarge) return SectionProblems.TooLarge();
        if (body.Model is null || body.Problems.Count > 0) return SectionProblems.Invalid(body);
        try
        {
            var dto = await service.RunAsync(body.Model, body.Json!, cancellation);
            return TypedResults.Created($"/api/v1/analyses/{dto.Id}", dto);
        }
        catch (MeshingException ex)
        {
            return TypedResults.ValidationProblem(new Dictionary<string, string[]> { [""] = [ex.Message] },
                title: "The section could not be meshed.", detail: ex.Message);
        }
        catch (SolverNotConvergedException ex)
        {
            return AnalysisProblems.NotConverged(ex);
        }
        catch (NonFiniteResultException ex)
        {
            return AnalysisProblems.NonFinite(ex);
        }
    }

    public static async Task<Results<Ok<AnalysisResultDto>, ProblemHttpResult>> Get(string id, AnalysisService service,
        CancellationToken cancellation) =>
        await service.GetAsync<AnalysisResultDto>(id, AnalysisPart.Result, cancellation) is { } dto
            ? TypedResults.Ok(dto) : NotFound(id);

    public static async Task<Results<Ok<FieldDto>, ProblemHttpResult>> GetField(string id, AnalysisService service,
        CancellationToken cancellation) =>
        await service.GetAsync<FieldDto>(id, AnalysisPart.Field, cancellation) is { } dto
            ? TypedResults.Ok(dto) : NotFound(id);

    public static async Task<Results<ContentHttpResult, ProblemHttpResult>> GetSection(string id, AnalysisStore store,
        CancellationToken cancellation) =>
        await store.GetJsonAsync(id, AnalysisPart.Section, cancellation) is { } json
            ? TypedResults.Content(json, "application/json") : NotFound(id);

    private static ProblemHttpResult NotFound(string id) =>
        TypedResults.Problem(statusCode: StatusCodes.Status404NotFound, title: "No such analysis.", detail: $"No analysis has the id '{id}'.");
}
