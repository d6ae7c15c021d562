using Microsoft.AspNetCore.Http.HttpResults;
using Seepage.Api.Contracts;
using Seepage.Core.Sections;

namespace Seepage.Api.Endpoints;

/// <summary>Section documents: check one without analysing it.</summary>
public static class SectionEndpoints
{
    public static IEndpointRouteBuilder MapSectionEndpoints(this IEndpointRouteBuilder app)
    {
        var group = app.MapGroup("/api/v1/sections").WithTags("Sections");
        group.MapPost("/validate", Validate)
            .WithName("ValidateSection")
            .WithSummary("Check a section document")
            .WithDescription("Parses and validates the posted section document without meshing or solving it. Answers 200 with any " +
                "warnings and an estimate of the analysis size (triangles, unknowns, the largest solve), or 400 problem details listing every problem under the JSON pointer of the member concerned.")
            .Accepts<SectionDocument>("application/json")
            .ProducesProblem(StatusCodes.Status413PayloadTooLarge)
            .ProducesProblem(StatusCodes.Status415UnsupportedMediaType);
        return app;
    }

    public static async Task<Results<Ok<SectionCheckDto>, ValidationProblem, ProblemHttpResult>> Validate(HttpRequest request,
        CancellationToken cancellation)
    {
        var body = await SectionBody.ReadAsync(request, cancellation);
        if (body.Refusal is { } refused) return refused;
        if (body.Invalid is { } invalid) return invalid;
        var e = SizeEstimate.Of(body.Model!);
        return TypedResults.Ok(new SectionCheckDto(true, body.Model!.Warnings,
            new SizeEstimateDto(e.Triangles, e.Unknowns, e.Order, e.ConvergenceCheck, e.LargestSolveUnknowns,
                Math.Round(e.Multiplier, 2))));
    }
}
