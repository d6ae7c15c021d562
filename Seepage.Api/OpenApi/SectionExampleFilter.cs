using System.Text.Json.Nodes;
using Microsoft.OpenApi;
using Seepage.Api.Endpoints;
using Swashbuckle.AspNetCore.SwaggerGen;

namespace Seepage.Api.OpenApi;

/// <summary>Puts the default example section into the OpenAPI document as the example body of every operation
/// that takes a section document.</summary>
public sealed class SectionExampleFilter(ExampleCatalog catalog) : IOperationFilter
{
    public void Apply(OpenApiOperation operation, OperationFilterContext context)
    {
        if (operation.RequestBody?.Content is null) return;
        if (!operation.RequestBody.Content.TryGetValue("application/json", out var media)) return;
        if (media is OpenApiMediaType concrete && catalog.Json(ExampleCatalog.DefaultName) is { } json)
            concrete.Example = JsonNode.Parse(json);
    }
}
