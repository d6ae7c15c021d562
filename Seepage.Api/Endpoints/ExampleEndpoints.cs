using Microsoft.AspNetCore.Http.HttpResults;
using Seepage.Api.Contracts;
using Seepage.Api.OpenApi;
using Seepage.Core.Sections;

namespace Seepage.Api.Endpoints;

/// <summary>The demo sections: invented scenarios to start from.</summary>
public static class ExampleEndpoints
{
    public static IEndpointRouteBuilder MapExampleEndpoints(this IEndpointRouteBuilder app)
    {
        var group = app.MapGroup("/api/v1/examples").WithTags("Examples");
        group.MapGet("/", List)
            .WithName("ListExamples")
            .WithSummary("List the example sections")
            .WithDescription("Names, titles and descriptions of the example sections shipped with the service (invented scenarios).");
        group.MapGet("/{name}", Get)
            .WithName("GetExample")
            .WithSummary("Read one example section")
            .WithDescription("Returns the section document of the named example, ready to post to /api/v1/analyses.")
            .Produces<SectionDocument>(StatusCodes.Status200OK, "application/json")
            .ProducesProblem(StatusCodes.Status404NotFound)
            .WithMetadata(ParameterNote.ExampleName);
        return app;
    }

    public static Ok<List<ExampleDto>> List(ExampleCatalog catalog) =>
        TypedResults.Ok(catalog.Names.Select(n =>
        {
            var doc = catalog.Document(n);
            return new ExampleDto(n, doc.Title ?? n, doc.Description ?? "", n == ExampleCatalog.DefaultName);
        }).ToList());

    public static Results<ContentHttpResult, ProblemHttpResult> Get(string name, ExampleCatalog catalog) =>
        catalog.Json(name) is { } json
            ? TypedResults.Content(json, "application/json")
            : TypedResults.Problem(statusCode: StatusCodes.Status404NotFound, title: "No such example.", detail: $"No example is named '{name}'.");
}
