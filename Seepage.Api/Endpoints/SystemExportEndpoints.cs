using System.Text;
using Microsoft.AspNetCore.Http.HttpResults;
using Seepage.Core;
using Seepage.Api.Errors;
using Seepage.Core.Solvers;

namespace Seepage.Api.Endpoints;

/// <summary>The assembled linear system of a section in Matrix Market form, for checking with other tools.</summary>
public static class SystemExportEndpoints
{
    public static IEndpointRouteBuilder MapSystemExportEndpoints(this IEndpointRouteBuilder app)
    {
        app.MapPost("/api/v1/sections/system", Export)
            .WithTags("Sections")
            .WithName("ExportSectionSystem")
            .WithSummary("Export the assembled system in Matrix Market form")
            .WithDescription("Meshes the posted section and assembles the condensed symmetric positive definite system " +
                "K_FF h_F = −K_FD h_D (fixed heads eliminated; conductivities in m/s, so K in m²/s per m). `part=matrix` " +
                "(default) gives K_FF as a Matrix Market coordinate file, `part=rhs` the right-hand side as an array file.")
            .Accepts<Seepage.Core.Sections.SectionDocument>("application/json")
            .Produces<string>(StatusCodes.Status200OK, "text/plain")
            .ProducesProblem(StatusCodes.Status413PayloadTooLarge)
            .ProducesProblem(StatusCodes.Status415UnsupportedMediaType)
            .ProducesProblem(StatusCodes.Status422UnprocessableEntity)
            .WithMetadata(QueryChoice.SystemPart);
        return app;
    }

    public static async Task<Results<ContentHttpResult, ValidationProblem, ProblemHttpResult>> Export(HttpRequest request,
        string? part, CancellationToken cancellation)
    {
        var (chosen, unknown) = QueryChoice.SystemPart.Read(part);
        if (unknown is not null) return unknown;
        var body = await SectionBody.ReadAsync(request, cancellation);
        if (body.Refusal is { } refused) return refused;
        if (body.Invalid is { } invalid) return invalid;
        var system = await Task.Run(() => Analysis.AssembleSystem(body.Model!, cancellation), cancellation);
        var text = new StringWriter(new StringBuilder(), System.Globalization.CultureInfo.InvariantCulture);
        if (chosen == "matrix") MatrixMarket.Write(system.Matrix, text); else MatrixMarket.WriteVector(system.Rhs, text);
        return TypedResults.Text(text.ToString(), "text/plain");
    }
}
