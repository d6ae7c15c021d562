using System.Text.Json.Nodes;
using Microsoft.OpenApi;

namespace Seepage.Api;

/// <summary>The OpenAPI document (Swashbuckle) at /swagger/v1/swagger.json and its UI at /swagger.</summary>
public static class OpenApiSetup
{
    public static IServiceCollection AddSeepageOpenApi(this IServiceCollection services)
    {
        services.AddEndpointsApiExplorer();
        services.AddSwaggerGen(o =>
        {
            o.SwaggerDoc("v1", new()
            {
                Title = "Seepage API",
                Version = "v1",
                Description = "Steady groundwater seepage under weirs, dams and sheet piles by the finite element method. " +
                    "Lengths in m, heads in m of total head, conductivity in m/s (or the section's conductivityUnit), pressures in kPa, " +
                    "forces in kN per m run of structure, flow in m³/s per m. Results need review by a licensed geotechnical engineer; " +
                    "local codes govern the required factors of safety.",
            });
            foreach (var name in new[] { "Seepage.Api.xml", "Seepage.Core.xml" })
            {
                string path = Path.Combine(AppContext.BaseDirectory, name);
                if (File.Exists(path)) o.IncludeXmlComments(path);
            }
            o.OperationFilter<OpenApi.SectionExampleFilter>();
            // A client generator must be able to trust the document: nullability from the C# annotations
            // (a nullable reference wraps its $ref in allOf), required lists, every response's content types,
            // every parameter described.
            o.SupportNonNullableReferenceTypes();
            o.UseAllOfToExtendReferenceSchemas();
            o.MapType<JsonNode>(() => new OpenApiSchema { Description = "Any JSON value." });
            o.MapType<JsonObject>(() => new OpenApiSchema { Type = JsonSchemaType.Object, Description = "A JSON object." });
            o.SchemaFilter<OpenApi.ContractSchemaFilter>();
            o.OperationFilter<OpenApi.ContentTypeFilter>();
            o.OperationFilter<OpenApi.ParameterFilter>();
            o.SchemaFilter<OpenApi.SectionEnumerationFilter>();
        });
        return services;
    }

    /// <summary>Configuration key: whether the Swagger UI is served at /swagger (default true, for the quick start; set
    /// <c>OpenApi__SwaggerUi=false</c> in production). The OpenAPI document itself is always served.</summary>
    public const string SwaggerUiKey = "OpenApi:SwaggerUi";

    public static void UseSeepageOpenApi(this WebApplication app)
    {
        app.UseSwagger();
        if (app.Configuration.GetValue(SwaggerUiKey, true)) app.UseSwaggerUI(o => o.DocumentTitle = "Seepage API");
    }
}
