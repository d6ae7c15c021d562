using Seepage.Api.Errors;

namespace Seepage.Api;

/// <summary>Exceptions that escape an endpoint become RFC 9457 problem details (<see cref="ProblemExceptionHandler"/>);
/// bare status codes (405, a route that does not exist) get a problem body too.</summary>
public static class ErrorHandling
{
    public static IServiceCollection AddSeepageErrorHandling(this IServiceCollection services)
    {
        services.AddProblemDetails(o => o.CustomizeProblemDetails = c =>
        {
            // Routing refuses a body type an operation does not declare before any endpoint runs; say which type.
            if (c.ProblemDetails.Status == StatusCodes.Status415UnsupportedMediaType && c.ProblemDetails.Detail is null)
                c.ProblemDetails.Detail = $"'{RequestBody.MediaType(c.HttpContext.Request.ContentType)}' is not a type " +
                    "this endpoint reads; the OpenAPI document (/swagger/v1/swagger.json) lists each operation's types.";
        });
        services.AddExceptionHandler<ProblemExceptionHandler>();
        return services;
    }

    public static void UseSeepageErrorHandling(this WebApplication app)
    {
        app.UseExceptionHandler();
        app.UseStatusCodePages();
    }
}
