using System.Reflection;

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
            o.OperationFilter<SectionExampleFilter>();
            o.SchemaFilter<SectionEnumerationFilter>();
        });
        return services;
    }

    public static void UseSeepageOpenApi(this WebApplication app)
    {
        app.UseSwagger();
        app.UseSwaggerUI(o => o.DocumentTitle = "Seepage API");
    }
}
